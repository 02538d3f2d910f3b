using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// Relative distance and relative size magnification (Ryan and Margrain 2006, Optician, "A course in low vision
/// practice, Part 5").
/// </summary>
public static class RelativeMagnification
{
    /// <summary>The practical upper limit of large print, about 2 to 2.5× (Ryan and Margrain 2006); this is the 2.5 end.</summary>
    public const double LargePrintPracticalLimit = 2.5;

    /// <summary>
    /// Relative distance magnification: M = old distance ÷ new distance. 40 → 10 cm gives 4×; 6 → 3 m gives 2× (CV-24).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">A distance is not greater than zero.</exception>
    public static double FromDistanceChange(Distance originalDistance, Distance newDistance) =>
        // Relative distance: M = old distance / new distance (Ryan and Margrain 2006).
        MethodInputGuards.ViewingDistance(originalDistance, nameof(originalDistance), "original viewing distance")
        / MethodInputGuards.ViewingDistance(newDistance, nameof(newDistance), "new viewing distance");

    /// <summary>
    /// The accommodation or add needed to see clearly at a viewing distance: 1 / distance (Ryan and Margrain 2006;
    /// an uncorrected myope can use their myopia as a built-in add).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The distance is not greater than zero.</exception>
    public static Power FocusNeededAt(Distance viewingDistance) =>
        MethodInputGuards.ViewingDistance(viewingDistance, nameof(viewingDistance), "viewing distance").Inverse();

    /// <summary>Relative size magnification: M = new size ÷ old size (large print, enlarged documents).</summary>
    /// <exception cref="ArgumentOutOfRangeException">A print size is not greater than zero.</exception>
    public static double FromSizeChange(PrintSize originalSize, PrintSize newSize) =>
        // Relative size: M = new object size / old object size (Ryan and Margrain 2006).
        MethodInputGuards.Print(newSize, nameof(newSize), "new print size") / MethodInputGuards.Print(originalSize, nameof(originalSize), "original print size");

    /// <summary>True when an enlargement is beyond what large print can practically give (above 2.5×).</summary>
    public static bool IsBeyondLargePrintLimit(double magnification) => magnification > LargePrintPracticalLimit;
}
