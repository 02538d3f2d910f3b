using CsCheck;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Tests.Devices;

public class DevicePropertyTests
{
    private static readonly Gen<(double F, double HeightFraction, double EyeCm)> StandGeometry =
        Gen.Select(Gen.Double[2, 60], Gen.Double[0.05, 0.95], Gen.Double[0, 40]);

    [Fact]
    public void For_stand_magnifiers_Gullstrand_equals_enlargement_ratio_times_add()
    {
        // Derived identity (methods §3.4): Feq = ER × A equals Gullstrand with F₁ = F, F₂ = A, separation z. Relative 1e-9.
        StandGeometry.Sample(g =>
        {
            var stand = StandMagnifier.FromLensAndHeight(Power.FromDioptres(g.F), Distance.FromMetres(g.HeightFraction / g.F));
            var view = stand.ViewFrom(Distance.FromCentimetres(g.EyeCm));
            var gullstrand = Gullstrand.EquivalentPower(stand.LensPower, view.AddNeeded, view.EyeToLens);
            return Math.Abs(gullstrand.Dioptres - view.EquivalentPower.Dioptres) <= 1e-9 * view.EquivalentPower.Dioptres;
        });
    }

    [Fact]
    public void The_field_shrinks_as_the_eye_moves_away()
    {
        // y = D/(z·Feq) (methods §4.1): strictly decreasing in z, for the page at focus and for stand magnifiers.
        Gen.Select(Gen.Double[2, 60], Gen.Double[10, 100], Gen.Double[0.5, 40], Gen.Double[0.1, 20]).Sample((f, apertureMm, zCm, stepCm) =>
        {
            var near = FieldOfView.LinearField(Distance.FromMillimetres(apertureMm), Distance.FromCentimetres(zCm), Power.FromDioptres(f));
            var far = FieldOfView.LinearField(Distance.FromMillimetres(apertureMm), Distance.FromCentimetres(zCm + stepCm), Power.FromDioptres(f));
            var stand = StandMagnifier.FromImagePosition(Distance.FromCentimetres(10), 3.0);
            var standNear = FieldOfView.LinearField(Distance.FromMillimetres(apertureMm), Distance.FromCentimetres(zCm), stand.ViewFrom(Distance.FromCentimetres(zCm)).EquivalentPower);
            var standFar = FieldOfView.LinearField(Distance.FromMillimetres(apertureMm), Distance.FromCentimetres(zCm + stepCm), stand.ViewFrom(Distance.FromCentimetres(zCm + stepCm)).EquivalentPower);
            return far < near && standFar < standNear;
        });
    }

    [Fact]
    public void Depth_of_field_falls_as_one_over_F_squared()
    {
        // OVS 1994 (methods §4.4): DOF ∝ 1/Feq². The exact form times F² tends to ΔF; within 1 % whenever ΔF ≤ F/6
        // (derived: F²·Δl = ΔF/(1 − (ΔF/2F)²) ≤ 1.007·ΔF), and doubling F quarters the depth within 1 %.
        Gen.Select(Gen.Double[2, 60], Gen.Double[0.1, 1.5]).Where((f, blur) => blur <= f / 6).Sample((f, blur) =>
        {
            var one = DepthOfField.Exact(Power.FromDioptres(f), Power.FromDioptres(blur)).Metres;
            var two = DepthOfField.Exact(Power.FromDioptres(2 * f), Power.FromDioptres(blur)).Metres;
            return Math.Abs((one * f * f / blur) - 1) <= 0.01 && Math.Abs((one / two / 4) - 1) <= 0.01;
        });
    }
}
