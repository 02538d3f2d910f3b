using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

/// <summary>
/// The plain-words texts of the estimates are formatted when shown, in the caller's culture. These tests check
/// the formatting only; the powers behind them are checked against their sources in the method tests.
/// </summary>
public class EstimateTextTests
{
    private static readonly CultureInfo German = CultureInfo.GetCultureInfo("de-DE");

    // Bailey's example (methods §2.2): 4M read at 32 cm, target 0.8M, no reserve → EVD 6.4 cm.
    private static PowerEstimate BaileyExample() =>
        NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(32), PrintSize.FromM(0.8), AcuityReserve.Spot);

    [Fact]
    public void Near_method_assumptions_use_the_callers_decimal_separator()
    {
        var estimate = BaileyExample();

        var german = estimate.FormatAssumptions(German);
        var invariant = estimate.FormatAssumptions(CultureInfo.InvariantCulture);

        Assert.Equal("Near acuity: smallest print read 4,0M at 32 cm.", german[0]);
        Assert.StartsWith("Target print 0,8M with an acuity reserve of 1:1", german[1], StringComparison.Ordinal);
        Assert.Equal("Near acuity: smallest print read 4.0M at 32 cm.", invariant[0]);
        Assert.StartsWith("Target print 0.8M with an acuity reserve of 1:1", invariant[1], StringComparison.Ordinal);
        Assert.Equal(3, german.Length);
    }

    [Fact]
    public void The_assumptions_property_follows_the_current_culture()
    {
        var estimate = KestenbaumRule.WithReserve(Acuity.FromSnellen(6, 60), PrintSize.FromM(0.8), AcuityReserve.FromRatio(2.5));

        using (new CultureScope("de-DE"))
        {
            Assert.Contains(estimate.Assumptions, a => a == "Target print 0,8M with an acuity reserve of 2,5:1.");
        }

        using (new CultureScope("en-GB"))
        {
            Assert.Contains(estimate.Assumptions, a => a == "Target print 0.8M with an acuity reserve of 2.5:1.");
        }
    }

    [Fact]
    public void The_reference_note_uses_the_callers_culture()
    {
        // Re-based to the EVD of Bailey's example, 6.4 cm, so that the note has a decimal.
        var estimate = BaileyExample().WithReference(Distance.FromCentimetres(6.4));

        Assert.Equal("Magnification is stated relative to 6,4 cm (M = Feq × 6,4 cm).", estimate.FormatReferenceNote(German));
        Assert.Equal("Magnification is stated relative to 6.4 cm (M = Feq × 6.4 cm).", estimate.FormatReferenceNote(CultureInfo.InvariantCulture));
        using (new CultureScope("de-DE"))
        {
            Assert.Equal("Magnification is stated relative to 6,4 cm (M = Feq × 6,4 cm).", estimate.ReferenceNote);
        }
    }

    [Fact]
    public void Re_basing_the_magnification_keeps_the_test_distance_in_the_assumptions()
    {
        var rebased = BaileyExample().WithReference(Distance.FromCentimetres(25));

        Assert.Equal("Near acuity: smallest print read 4.0M at 32 cm.", rebased.FormatAssumptions(CultureInfo.InvariantCulture)[0]);
        Assert.Equal("Magnification is stated relative to 25 cm (M = Feq × 25 cm).", rebased.FormatReferenceNote(CultureInfo.InvariantCulture));
    }

    [Fact]
    public void The_reserve_reason_of_a_disagreement_uses_the_callers_culture()
    {
        // CV-08's near test (4M at 40 cm, target 1M) with 1:1 and with 2.5:1: log10(2.5) = 0.398 > 0.2 (derived), flagged.
        var spot = NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(40), PrintSize.FromM(1), AcuityReserve.Spot);
        var larger = NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(40), PrintSize.FromM(1), AcuityReserve.FromRatio(2.5));

        var flagged = Assert.Single(EstimateReconciliation.Compare([larger, spot]).Disagreements);

        Assert.Contains(flagged.FormatPossibleReasons(German), r => r.Contains("different acuity reserves (1:1 and 2,5:1)", StringComparison.Ordinal));
        Assert.Contains(flagged.FormatPossibleReasons(CultureInfo.InvariantCulture), r => r.Contains("different acuity reserves (1:1 and 2.5:1)", StringComparison.Ordinal));
        using (new CultureScope("de-DE"))
        {
            Assert.Contains(flagged.PossibleReasons, r => r.Contains("(1:1 and 2,5:1)", StringComparison.Ordinal));
        }
    }

    [Fact]
    public void A_reading_curve_estimate_states_its_maximum_speed_in_the_callers_culture_and_keeps_the_order_of_notes()
    {
        // Speeds at 8, 6.3, 5 and 4M all 100 wpm, then 50 wpm at 3.2M (a curve of the MNREAD kind): CPS 4M, MRS 100 wpm.
        var curve = ReadingCurve.Analyse(Distance.FromCentimetres(40),
        [
            new ReadingPoint(PrintSize.FromM(8), 100),
            new ReadingPoint(PrintSize.FromM(6.3), 100),
            new ReadingPoint(PrintSize.FromM(5), 100),
            new ReadingPoint(PrintSize.FromM(4), 100),
            new ReadingPoint(PrintSize.FromM(3.2), 50),
        ]);
        Assert.True(curve.IsUsable, curve.Refusal);

        var notes = CriticalPrintSizeMethod.Estimate(curve, PrintSize.FromM(1)).FormatAssumptions(German);

        Assert.StartsWith("Reading curve: critical print size 4,0M at 40 cm", notes[0], StringComparison.Ordinal);
        Assert.StartsWith("Maximum reading speed 100 words per minute", notes[1], StringComparison.Ordinal);
        Assert.StartsWith("Target print 1,0M is made to look as large", notes[2], StringComparison.Ordinal);
        Assert.Equal(4, notes.Length);
    }

    [Fact]
    public void A_comparison_keeps_its_own_copy_of_the_estimates()
    {
        // CV-06 (6/60 → 10 D) and CV-08 (4M at 40 cm, 1M, 2:1 → 20 D).
        var kestenbaum = KestenbaumRule.Classic(Acuity.FromSnellen(6, 60));
        var near = NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(40), PrintSize.FromM(1), AcuityReserve.Fluent);
        var given = new[] { kestenbaum, near };

        var comparison = EstimateReconciliation.Compare(given);
        given[0] = near;

        Assert.Same(kestenbaum, comparison.Estimates[0]);
        Assert.Same(kestenbaum, Assert.Single(comparison.Disagreements).Lower);
    }

    [Fact]
    public void A_null_estimate_is_refused_with_what_to_do_instead()
    {
        var kestenbaum = KestenbaumRule.Classic(Acuity.FromSnellen(6, 60));

        var error = Assert.Throws<ArgumentNullException>(() => EstimateReconciliation.Compare([kestenbaum, null!]));

        Assert.Contains("Leave out an estimate", error.Message, StringComparison.Ordinal);
    }
}
