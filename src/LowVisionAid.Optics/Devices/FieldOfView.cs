using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>Linear field on the page and the characters of the target print it holds (methods §4.1, §4.2).</summary>
public static class FieldOfView
{
    /// <summary>
    /// The entrance pupil lies about 1.5 cm behind the spectacle plane; the field's z runs to it, while the add and
    /// F_eq use z to the add (methods §4.1).
    /// </summary>
    public static Distance EntrancePupilBehindSpectacles { get; } = Distance.FromMillimetres(15);

    /// <summary>
    /// Linear field on the page y = D / (z × F_eq), with D the clear aperture and z the entrance-pupil-to-lens distance.
    /// Holds with the page at the focal point (F_eq = F) and, for an image at a finite distance, as
    /// D(z + |l′|)/(z·ER) = D/(z·F_eq) (derived by similar triangles, methods §4.1).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">A distance or the power is not positive.</exception>
    public static Distance LinearField(Distance aperture, Distance pupilToLens, Power equivalentPower)
    {
        var z = pupilToLens.Metres;
        var f = equivalentPower.Dioptres;
        if (!(z > 0) || !(f > 0) || !(aperture.Metres > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(pupilToLens), z, "Aperture, eye distance and equivalent power must all be greater than zero.");
        }

        // y = D/(z·F) (derived; low-vision course notes, methods §4.1)
        return Distance.FromMetres(aperture.Metres / (z * f));
    }

    /// <summary>
    /// Characters of the target print in a field: N ≈ y / (k × h_x), k the character pitch as a multiple of
    /// x-height (default 1.1; methods §4.2, from memory).
    /// </summary>
    public static double CharactersInView(Distance field, PrintSize print, double characterPitch) =>
        field.Millimetres / (characterPitch * print.XHeightMillimetres);

    /// <summary>The linear field on the page covered by an angular field at a distance: 2·w·tan(θ/2).</summary>
    public static Distance LinearFieldOfAngle(VisualAngle angularField, Distance distance) =>
        Distance.FromMetres(2.0 * distance.Abs().Metres * Math.Tan(angularField.Radians / 2.0));
}

/// <summary>Depth of field (focus tolerance) of a magnifier (methods §4.4).</summary>
public static class DepthOfField
{
    /// <summary>
    /// Exact range for a thin lens with the page at its focal point: Δl = 1/(F − ΔF/2) − 1/(F + ΔF/2), where ΔF is the
    /// total blur tolerance (not ±). Used for every option at its equivalent power (the 1994 OVS paper: DOF is equal
    /// at equal F_eq for plus lenses and reading telescopes).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">ΔF is not positive or not smaller than 2F.</exception>
    public static Distance Exact(Power equivalentPower, Power blurTolerance)
    {
        var f = equivalentPower.Dioptres;
        var half = blurTolerance.Dioptres / 2.0;
        if (!(half > 0) || !(f > half))
        {
            throw new ArgumentOutOfRangeException(nameof(blurTolerance), blurTolerance.Dioptres, "The blur tolerance must be greater than 0 D and less than twice the equivalent power (e.g. 0.5 D).");
        }

        // Δl = 1/(F − ΔF/2) − 1/(F + ΔF/2) (derived from vergence, methods §4.4)
        return Distance.FromMetres((1.0 / (f - half)) - (1.0 / (f + half)));
    }

    /// <summary>Approximation Δl ≈ ΔF / F_eq² (Newton's equation; the 1994 OVS paper's 1/F² law).</summary>
    public static Distance Approximate(Power equivalentPower, Power blurTolerance) =>
        Distance.FromMetres(blurTolerance.Dioptres / (equivalentPower.Dioptres * equivalentPower.Dioptres));
}

/// <summary>Prismatic effect and colour fringes in strong plus lenses (methods §10.2).</summary>
public static class Prentice
{
    /// <summary>Abbe number of crown glass, ≈ 58 (methods §10.2; from memory).</summary>
    public const double CrownGlassAbbe = 58;

    /// <summary>Abbe number of polycarbonate, ≈ 30 (methods §10.2; from memory).</summary>
    public const double PolycarbonateAbbe = 30;

    /// <summary>Prismatic effect P (Δ) = c (cm) × F (D), c the distance from the optical centre (Prentice's rule).</summary>
    public static double PrismaticEffect(Distance fromOpticalCentre, Power power) =>
        // Prentice: P = c(cm) × F (Jalie, Principles of Ophthalmic Lenses)
        fromOpticalCentre.Abs().Centimetres * Math.Abs(power.Dioptres);

    /// <summary>Transverse chromatic aberration (Δ) ≈ P / V, V the Abbe number of the material (methods §10.2).</summary>
    public static double ColourFringe(double prismDioptres, double abbeNumber) =>
        double.IsFinite(abbeNumber) && abbeNumber > 0
            ? prismDioptres / abbeNumber
            : throw new ArgumentOutOfRangeException(nameof(abbeNumber), abbeNumber, "An Abbe number must be greater than zero, e.g. 58 for crown glass.");
}
