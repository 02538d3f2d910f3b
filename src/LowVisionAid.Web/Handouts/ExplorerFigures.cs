using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Web.Handouts;

/// <summary>
/// The teaching explorer's figures for a hand magnifier used with the distance correction: every number comes
/// from the optics core (working distance 1/F, field D/(z·F), letters in view y/(k·h)).
/// </summary>
public sealed record ExplorerFigures(double PowerDioptres, double EyeToLensCm, double WorkingDistanceCm, double FieldMm, double LettersInView)
{
    public const double ApertureMm = 50;
    public const double TargetM = 1.0;
    public const double CharacterPitch = 1.1;

    /// <summary>The figures, or null when power or eye distance is outside 1–80 D or 1–100 cm.</summary>
    public static ExplorerFigures? For(double powerDioptres, double eyeToLensCm)
    {
        if (!(powerDioptres is >= 1 and <= 80) || !(eyeToLensCm is >= 1 and <= 100))
        {
            return null;
        }

        var lens = Power.FromDioptres(powerDioptres);
        var view = HandMagnifier.WithDistanceCorrection(lens, Distance.FromCentimetres(eyeToLensCm));
        var field = FieldOfView.LinearField(Distance.FromMillimetres(ApertureMm), view.EyeToLens + FieldOfView.EntrancePupilBehindSpectacles, view.EquivalentPower);
        var letters = FieldOfView.CharactersInView(field, PrintSize.FromM(TargetM), CharacterPitch);
        return new ExplorerFigures(powerDioptres, eyeToLensCm, view.LensToPage.Centimetres, field.Millimetres, letters);
    }
}
