using CsCheck;
using LowVisionAid.Optics.Accommodation;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Accommodation;

public class AccommodationProfileTests
{
    [Theory]
    // Hofstetter 1950 (methods §10.1): minimum 15 − 0.25 × age; age 25 → 8.75 D, age 40 → 5.00 D (derived check
    // values given in methods.md). Mean 18.5 − 0.3 × age and maximum 25 − 0.4 × age: 11.0 / 15.0 D at 25,
    // 6.5 / 9.0 D at 40 (derived from the formulas). Exact (±1e-9).
    [InlineData(25, 8.75, 11.0, 15.0)]
    [InlineData(40, 5.00, 6.5, 9.0)]
    public void Hofstetter_gives_minimum_mean_and_maximum_amplitudes_by_age(double age, double minimum, double mean, double maximum)
    {
        Tolerance.Within(minimum, Hofstetter.MinimumAmplitude(age).Dioptres, 1e-9);
        Tolerance.Within(mean, Hofstetter.MeanAmplitude(age).Dioptres, 1e-9);
        Tolerance.Within(maximum, Hofstetter.MaximumAmplitude(age).Dioptres, 1e-9);
    }

    [Theory]
    // Clamp at 0 D (methods §10.1): minimum reaches 0 at 60, mean at 61.7, maximum at 62.5 (derived).
    [InlineData(60)]
    [InlineData(75)]
    public void Hofstetter_amplitudes_are_clamped_at_zero_in_old_age(double age)
    {
        Assert.Equal(0.0, Hofstetter.MinimumAmplitude(age).Dioptres);
        Assert.Equal(0.0, Hofstetter.MeanAmplitude(age + 1.7).Dioptres);
        Assert.Equal(0.0, Hofstetter.MaximumAmplitude(age + 2.5).Dioptres);
    }

    [Fact]
    public void Age_profile_uses_half_the_minimum_amplitude_for_sustained_work_by_default()
    {
        // Hofstetter minimum at 40 = 5.00 D; half kept in reserve for sustained work (common practice) → 2.50 D.
        var profile = AccommodationProfile.FromAge(40);

        Assert.Equal(AmplitudeSource.HofstetterMinimum, profile.Source);
        Assert.Equal(40.0, profile.AgeYears);
        Tolerance.Within(5.0, profile.Amplitude.Dioptres, 1e-9);
        Tolerance.Within(2.5, profile.UsableSustained.Dioptres, 1e-9);
        Assert.Equal("0.00 D", profile.BuiltInAddFromMyopia.ToString());
        Assert.True(profile.IsEstimate);
        Assert.NotNull(profile.EstimateCaution);
    }

    [Fact]
    public void Uncorrected_myopia_of_minus_3_acts_as_a_built_in_add_of_plus_3()
    {
        // Methods §3.2 (Ryan and Margrain 2006): an uncorrected myope of −K D behaves as if wearing +K D.
        // Measured 4 D amplitude, 2/3 usable → 2.67 D; plus 3 D gives 5.67 D (derived). Tolerance ±1e-9.
        var profile = AccommodationProfile.FromMeasuredAmplitude(Power.FromDioptres(4), 2.0 / 3.0, Power.FromDioptres(-3));

        Assert.Equal(AmplitudeSource.Measured, profile.Source);
        Assert.Null(profile.AgeYears);
        Assert.Null(profile.EstimateCaution);
        Tolerance.Within(3.0, profile.BuiltInAddFromMyopia.Dioptres, 1e-9);
        Tolerance.Within(4.0 * 2.0 / 3.0 + 3.0, profile.SustainedNearFocus.Dioptres, 1e-9);
    }

    [Fact]
    public void Mean_estimate_can_be_chosen_instead_of_the_minimum()
    {
        // Hofstetter mean at 25 = 18.5 − 7.5 = 11.0 D (derived); half = 5.5 D.
        var profile = AccommodationProfile.FromAge(25, AmplitudeSource.HofstetterMean);

        Tolerance.Within(11.0, profile.Amplitude.Dioptres, 1e-9);
        Tolerance.Within(5.5, profile.UsableSustained.Dioptres, 1e-9);
    }

    [Fact]
    public void A_presbyope_profile_supplies_nothing()
    {
        Assert.Equal(Power.Zero, AccommodationProfile.None.SustainedNearFocus);
        Assert.Equal(Power.Zero, AccommodationProfile.FromAge(70).SustainedNearFocus);
    }

    [Fact]
    public void A_plus_power_for_myopia_is_refused_with_what_to_enter()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => AccommodationProfile.FromAge(30, uncorrectedMyopia: Power.FromDioptres(2)));

        Assert.StartsWith("Enter the uncorrected myopia as 0 or a minus power down to -30 D, such as -3.00 D.", error.Message, StringComparison.Ordinal);
        Assert.Equal("uncorrectedMyopia", error.ParamName);
    }

    [Fact]
    public void An_impossible_age_is_refused_with_an_example()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => AccommodationProfile.FromAge(-4));

        Assert.StartsWith("Enter an age in years from 0 to 120, such as 45.", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_sustained_fraction_above_one_is_refused_with_an_example()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => AccommodationProfile.FromMeasuredAmplitude(Power.FromDioptres(4), 1.5));

        Assert.StartsWith("Enter the part of the amplitude usable for sustained work as a fraction above 0 and at most 1, such as 0.5 for half.", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Asking_Hofstetter_for_a_measured_amplitude_is_refused()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => Hofstetter.Amplitude(30, AmplitudeSource.Measured));

        Assert.Contains("AccommodationProfile.FromMeasuredAmplitude", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Hofstetter_lines_stay_ordered_non_negative_and_fall_with_age() =>
        // From the three formulas with the 0 D clamp (derived): min ≤ mean ≤ max for every age, none rise with age.
        Gen.Double[0.0, 119.0].Sample(age =>
        {
            var min = Hofstetter.MinimumAmplitude(age);
            var mean = Hofstetter.MeanAmplitude(age);
            var max = Hofstetter.MaximumAmplitude(age);
            Assert.True(min.Dioptres >= 0 && min <= mean && mean <= max, $"age {age}: {min} {mean} {max}");
            Assert.True(Hofstetter.MinimumAmplitude(age + 1) <= min && Hofstetter.MaximumAmplitude(age + 1) <= max);
        });

    [Fact]
    public void Usable_sustained_amount_is_the_amplitude_times_the_fraction() =>
        // Usable = amplitude × fraction (common practice, methods §10.1). Relative tolerance 1e-12.
        Gen.Select(Gen.Double[0.0, 30.0], Gen.Double[0.01, 1.0], Gen.Double[-30.0, 0.0]).Sample((amplitude, fraction, myopia) =>
        {
            var profile = AccommodationProfile.FromMeasuredAmplitude(Power.FromDioptres(amplitude), fraction, Power.FromDioptres(myopia));
            Tolerance.Within(amplitude * fraction, profile.UsableSustained.Dioptres, 1e-12);
            Tolerance.Within(amplitude * fraction - myopia, profile.SustainedNearFocus.Dioptres, 1e-9);
        });
}
