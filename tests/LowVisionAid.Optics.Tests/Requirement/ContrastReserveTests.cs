using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

public class ContrastReserveTests
{
    [Fact]
    public void LogCS_1_05_gives_a_threshold_of_8_9_percent_and_a_reserve_of_about_10_to_1()
    {
        // Methods §2.4 (derived helper, threshold = 10^−logCS, 90 % print): 8.9 %, ≈ 10:1, matching the 9 % cut-off
        // of Whittaker and Lovie-Kitchin 1994. Tolerance ±0.001 (threshold), ±0.2 (reserve).
        var assessment = ContrastReserve.Assess(1.05);

        Tolerance.Within(0.089, assessment.ThresholdContrast, 0.001);
        Tolerance.Within(10.0, assessment.Reserve, 0.2);
        Assert.Equal(ContrastThresholdLevel.WithinUsualRange, assessment.ThresholdLevel);
        Assert.Equal(ContrastReserveLevel.Sufficient, assessment.ReserveLevel);
    }

    [Fact]
    public void LogCS_0_6_gives_a_threshold_of_25_percent_and_a_reserve_of_about_3_6_to_1()
    {
        // Methods §2.4 (derived helper): 25 %, ≈ 3.6:1; below 4× seriously impairs reading and above 25 % is very
        // poor (Whittaker and Lovie-Kitchin 1994). Tolerance ±0.005 (threshold), ±0.05 (reserve).
        var assessment = ContrastReserve.Assess(0.6);

        Tolerance.Within(0.25, assessment.ThresholdContrast, 0.005);
        Tolerance.Within(3.6, assessment.Reserve, 0.05);
        Assert.Equal(ContrastReserveLevel.SeriouslyImpairsReading, assessment.ReserveLevel);
        Assert.Equal(ContrastThresholdLevel.VeryPoor, assessment.ThresholdLevel);
        Assert.Contains(assessment.Advice, a => a.Contains("video magnifier", StringComparison.Ordinal) && a.Contains("non-visual", StringComparison.Ordinal));
    }

    [Fact]
    public void A_threshold_between_9_and_25_percent_is_poor_and_slows_reading()
    {
        // Whittaker and Lovie-Kitchin 1994: > 9 % poor (lighting, magnification or video magnifier); reserve 4–10×
        // slows reading. logCS 0.9 → 12.6 %, reserve 7.1 (derived). Tolerance ±0.001, ±0.05.
        var assessment = ContrastReserve.Assess(0.9);

        Tolerance.Within(0.126, assessment.ThresholdContrast, 0.001);
        Tolerance.Within(7.14, assessment.Reserve, 0.05);
        Assert.Equal(ContrastThresholdLevel.Poor, assessment.ThresholdLevel);
        Assert.Equal(ContrastReserveLevel.SlowsReading, assessment.ReserveLevel);
        Assert.Contains(assessment.Advice, a => a.Contains("lighting", StringComparison.Ordinal));
    }

    [Fact]
    public void Low_contrast_print_lowers_the_reserve_in_proportion()
    {
        // Contrast reserve = print contrast ÷ threshold (Whittaker and Lovie-Kitchin 1993): logCS 1.5 → 3.16 %;
        // 30 % print → 9.5:1 (derived). Tolerance ±0.05.
        var assessment = ContrastReserve.Assess(1.5, printContrast: 0.3);

        Tolerance.Within(9.49, assessment.Reserve, 0.05);
        Assert.Equal(ContrastReserveLevel.SlowsReading, assessment.ReserveLevel);
        Assert.Contains(assessment.Advice, a => a.Contains("Latham and Tabrett 2012", StringComparison.Ordinal) && a.Contains("better than 1.05", StringComparison.Ordinal));
    }

    [Fact]
    public void A_print_contrast_above_one_is_refused_with_an_example()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => ContrastReserve.Assess(1.2, 90));

        Assert.StartsWith("Enter the print contrast as a fraction greater than 0 and at most 1, such as 0.9", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_negative_log_contrast_sensitivity_is_refused_with_an_example()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => ContrastReserve.Assess(-0.1));

        Assert.StartsWith("Enter the letter contrast sensitivity in log units from 0 to 2.5, such as 1.05.", error.Message, StringComparison.Ordinal);
    }
}
