using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Accommodation;

/// <summary>
/// Hofstetter's age–amplitude formulas (Hofstetter HW 1950, "Useful age-amplitude formula", Optometry World
/// 38:42–45), clamped at 0 D. They come from early surveys with considerable error (children often measure below
/// them): treat them as estimates and prefer a measured amplitude.
/// </summary>
public static class Hofstetter
{
    /// <summary>Youngest age accepted, in years.</summary>
    public const double MinimumAge = 0;

    /// <summary>Oldest age accepted, in years.</summary>
    public const double MaximumAge = 120;

    /// <summary>Minimum expected amplitude: 15 − 0.25 × age (D), at least 0. Age 25 → 8.75 D; age 40 → 5.00 D.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The age is not from 0 to 120 years.</exception>
    public static Power MinimumAmplitude(double ageYears) =>
        // Hofstetter 1950: minimum = 15 − 0.25 × age.
        Clamped(15.0 - 0.25 * Age(ageYears));

    /// <summary>Average expected amplitude: 18.5 − 0.3 × age (D), at least 0.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The age is not from 0 to 120 years.</exception>
    public static Power MeanAmplitude(double ageYears) =>
        // Hofstetter 1950: average = 18.5 − 0.3 × age.
        Clamped(18.5 - 0.3 * Age(ageYears));

    /// <summary>Maximum expected amplitude: 25 − 0.4 × age (D), at least 0.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The age is not from 0 to 120 years.</exception>
    public static Power MaximumAmplitude(double ageYears) =>
        // Hofstetter 1950: maximum = 25 − 0.4 × age.
        Clamped(25.0 - 0.4 * Age(ageYears));

    /// <summary>The amplitude for an age by the chosen formula.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The age is out of range, or <paramref name="estimate"/> is <see cref="AmplitudeSource.Measured"/>.</exception>
    public static Power Amplitude(double ageYears, AmplitudeSource estimate) => estimate switch
    {
        AmplitudeSource.HofstetterMinimum => MinimumAmplitude(ageYears),
        AmplitudeSource.HofstetterMean => MeanAmplitude(ageYears),
        AmplitudeSource.HofstetterMaximum => MaximumAmplitude(ageYears),
        _ => throw new ArgumentOutOfRangeException(nameof(estimate), estimate,
            "Choose the minimum, mean or maximum Hofstetter estimate; for a measured amplitude use AccommodationProfile.FromMeasuredAmplitude."),
    };

    private static double Age(double ageYears) =>
        double.IsFinite(ageYears) && ageYears is >= MinimumAge and <= MaximumAge
            ? ageYears
            : throw new ArgumentOutOfRangeException(nameof(ageYears), ageYears, "Enter an age in years from 0 to 120, such as 45.");

    private static Power Clamped(double dioptres) => Power.FromDioptres(Math.Max(0.0, dioptres));
}
