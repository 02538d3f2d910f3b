using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>How a hand magnifier is being used and what it gives.</summary>
/// <param name="EquivalentPower">The equivalent power of magnifier and add (or distance correction).</param>
/// <param name="LensToPage">Where the page must be for a clear image, measured from the lens.</param>
/// <param name="Add">The add (or accommodation) in use; 0 D with the distance correction.</param>
/// <param name="EyeToLens">The assumed distance from the add (spectacle plane) to the lens.</param>
public readonly record struct HandMagnifierView(Power EquivalentPower, Distance LensToPage, Power Add, Distance EyeToLens);

/// <summary>Hand magnifier optics (methods §3.1, §3.3).</summary>
public static class HandMagnifier
{
    /// <summary>
    /// With the distance correction and the page at the focal point: image at infinity, F_eq = F_M for any eye
    /// distance, no accommodation needed (Schwartz; Entokey textbook reproduction, Fig 7.1).
    /// </summary>
    public static HandMagnifierView WithDistanceCorrection(Power lens, Distance eyeToLens)
    {
        var f = Positive(lens);
        return new(lens, Distance.FromMetres(1.0 / f), Power.Zero, eyeToLens.Abs());
    }

    /// <summary>
    /// With an add (or accommodation) A at eye–lens distance z: F_eq = F_M + A − z·F_M·A (Gullstrand), and the page sits
    /// where the object vergence is L = −A/(1 − zA) − F_M (derived from the vergence equation; methods §3.3).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The lens is not a plus lens, or no real page position gives a clear image.</exception>
    public static HandMagnifierView WithAdd(Power lens, Power add, Distance eyeToLens)
    {
        var f = Positive(lens);
        var a = add.Dioptres;
        var z = eyeToLens.Abs().Metres;
        var denominator = 1.0 - (z * a);
        if (denominator == 0)
        {
            throw new ArgumentOutOfRangeException(nameof(eyeToLens), z, "The lens is exactly one add focal length from the eye, so no page position is clear; hold it nearer or farther.");
        }

        // Light must leave the magnifier with L′ = −A/(1 − zA); the page vergence is L = L′ − F (vergence equation, methods §3.3)
        var pageVergence = (-a / denominator) - f;
        if (pageVergence >= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(eyeToLens), z, "At this eye distance no real page position gives a clear image; bring the lens nearer the eye.");
        }

        return new(Gullstrand.EquivalentPower(lens, add, eyeToLens), Distance.FromMetres(-1.0 / pageVergence), add, eyeToLens.Abs());
    }

    private static double Positive(Power lens) => lens.Dioptres > 0
        ? lens.Dioptres
        : throw new ArgumentOutOfRangeException(nameof(lens), lens.Dioptres, "A magnifier must be a plus lens; enter its power in dioptres, e.g. 12.");
}
