using System.Globalization;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Accommodation;

/// <summary>
/// What the reader's own eye can contribute to near focus, for the device options: the amplitude of
/// accommodation (estimated from age or measured), the part of it usable for sustained work, and the built-in add
/// that uncorrected myopia gives. Immutable.
/// </summary>
/// <remarks>
/// A young reader can supply part of the equivalent power by accommodating (relative distance magnification); a
/// presbyopic reader cannot (methods §10.1, §3.2). Sustained work is usually kept to about half the amplitude
/// (common practice). An uncorrected myope of −K D has a far point at 1/K m and behaves as if wearing an add of +K
/// (methods §3.2; Ryan and Margrain 2006).
/// </remarks>
public sealed record AccommodationProfile
{
    /// <summary>The part of the amplitude usable for sustained near work in common practice: one half.</summary>
    public const double CommonSustainedFraction = 0.5;

    private AccommodationProfile(Power amplitude, AmplitudeSource source, double? ageYears, double sustainedFraction, Power uncorrectedMyopia)
    {
        Amplitude = amplitude;
        Source = source;
        AgeYears = ageYears;
        SustainedFraction = sustainedFraction;
        UncorrectedMyopia = uncorrectedMyopia;
    }

    /// <summary>The amplitude of accommodation (0 D or more).</summary>
    public Power Amplitude { get; }

    /// <summary>Whether the amplitude was measured or estimated from age, and by which formula.</summary>
    public AmplitudeSource Source { get; }

    /// <summary>The age the amplitude was estimated from, or null when it was measured.</summary>
    public double? AgeYears { get; }

    /// <summary>The fraction of the amplitude taken as usable for sustained work (0 to 1; usually 0.5).</summary>
    public double SustainedFraction { get; }

    /// <summary>The accommodation usable for sustained work: amplitude × sustained fraction.</summary>
    public Power UsableSustained =>
        // usable = amplitude × fraction, half by default (common practice; methods §10.1).
        Amplitude * SustainedFraction;

    /// <summary>The uncorrected myopia (0 D or a minus power) the reader has when reading without the distance correction.</summary>
    public Power UncorrectedMyopia { get; }

    /// <summary>The built-in add from uncorrected myopia: a myope of −K D acts as if wearing +K D (methods §3.2).</summary>
    public Power BuiltInAddFromMyopia =>
        // an uncorrected myope of −K D acts as if wearing +K D (methods §3.2; Ryan and Margrain 2006).
        Power.FromDioptres(0.0 - UncorrectedMyopia.Dioptres);

    /// <summary>
    /// The near focus the eye supplies for sustained work without any device: usable accommodation plus the
    /// built-in add from myopia. Feq ≈ add + accommodation in use (methods §3.2; thin lens, vertex distance ignored).
    /// </summary>
    public Power SustainedNearFocus =>
        // Feq ≈ add + accommodation in use (methods §3.2; thin lens, vertex distance ignored).
        UsableSustained + BuiltInAddFromMyopia;

    /// <summary>True when the amplitude is an age estimate rather than a measurement.</summary>
    public bool IsEstimate => Source != AmplitudeSource.Measured;

    /// <summary>The caution to show with an age estimate; null for a measured amplitude.</summary>
    public string? EstimateCaution => IsEstimate
        ? "Estimated from age by Hofstetter's formula: the amplitude varies widely between people of the same age, and children often measure lower. Measure it when it matters."
        : null;

    /// <summary>A profile with no accommodation and no uncorrected myopia (a fully corrected presbyope); its source is <see cref="AmplitudeSource.Measured"/> at 0 D.</summary>
    public static AccommodationProfile None => new(Power.Zero, AmplitudeSource.Measured, null, CommonSustainedFraction, Power.Zero);

    /// <summary>A profile whose amplitude is estimated from age by Hofstetter's formula (clamped at 0 D).</summary>
    /// <param name="ageYears">Age in years, 0 to 120.</param>
    /// <param name="estimate">Which Hofstetter line to use; the minimum is the cautious default.</param>
    /// <param name="sustainedFraction">The part of the amplitude usable for sustained work, above 0 and at most 1 (common practice 0.5).</param>
    /// <param name="uncorrectedMyopia">Uncorrected myopia when reading without the distance correction: 0 or a minus power.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range; the message says what to enter.</exception>
    public static AccommodationProfile FromAge(
        double ageYears,
        AmplitudeSource estimate = AmplitudeSource.HofstetterMinimum,
        double sustainedFraction = CommonSustainedFraction,
        Power uncorrectedMyopia = default) =>
        new(Hofstetter.Amplitude(ageYears, estimate), estimate, ageYears, Fraction(sustainedFraction), Myopia(uncorrectedMyopia));

    /// <summary>A profile from a measured amplitude of accommodation.</summary>
    /// <param name="amplitude">The measured amplitude, 0 D or more (at most 30 D).</param>
    /// <param name="sustainedFraction">The part of the amplitude usable for sustained work, above 0 and at most 1 (common practice 0.5).</param>
    /// <param name="uncorrectedMyopia">Uncorrected myopia when reading without the distance correction: 0 or a minus power.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range; the message says what to enter.</exception>
    public static AccommodationProfile FromMeasuredAmplitude(
        Power amplitude,
        double sustainedFraction = CommonSustainedFraction,
        Power uncorrectedMyopia = default) =>
        amplitude.Dioptres is >= 0 and <= MaximumAmplitudeDioptres
            ? new(amplitude, AmplitudeSource.Measured, null, Fraction(sustainedFraction), Myopia(uncorrectedMyopia))
            : throw new ArgumentOutOfRangeException(nameof(amplitude), amplitude.Dioptres,
                "Enter the measured amplitude of accommodation from 0 to 30 D, such as 4.00 D.");

    private const double MaximumAmplitudeDioptres = 30;
    private const double MaximumMyopiaDioptres = 30;

    private static double Fraction(double sustainedFraction) =>
        double.IsFinite(sustainedFraction) && sustainedFraction is > 0 and <= 1
            ? sustainedFraction
            : throw new ArgumentOutOfRangeException(nameof(sustainedFraction), sustainedFraction,
                string.Create(CultureInfo.InvariantCulture, $"Enter the part of the amplitude usable for sustained work as a fraction above 0 and at most 1, such as {CommonSustainedFraction} for half."));

    private static Power Myopia(Power uncorrectedMyopia) =>
        uncorrectedMyopia.Dioptres is <= 0 and >= -MaximumMyopiaDioptres
            ? Power.FromDioptres(uncorrectedMyopia.Dioptres + 0.0) // + 0.0 turns −0 into 0
            : throw new ArgumentOutOfRangeException(nameof(uncorrectedMyopia), uncorrectedMyopia.Dioptres,
                "Enter the uncorrected myopia as 0 or a minus power down to -30 D, such as -3.00 D. Uncorrected hyperopia is not a built-in add: enter 0 and include the hyperopia in the near lens.");
}
