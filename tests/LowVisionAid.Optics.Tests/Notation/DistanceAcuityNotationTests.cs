using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class DistanceAcuityNotationTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    private static Acuity Read(string text) => DistanceAcuityNotation.Parse(text, Invariant).Value;

    [Fact]
    public void Six_sixty_is_decimal_0_1_MAR_10_logMAR_1_20_200_VAS_50_and_35_letters()
    {
        // CV-01 (methods §6): 6/60 → decimal 0.100; MAR 10′; logMAR 1.000; 20/200; VAS 50; ETDRS letters 35.
        // Sources: Bailey & Lovie 1976; DICOM PS3.17 RR.2.2 (VAS); letters from memory. "Exact": ±0.001.
        var acuity = Read("6/60");
        Tolerance.Within(0.100, acuity.DecimalValue, 0.001);
        Tolerance.Within(10.0, acuity.MarArcminutes, 0.001);
        Tolerance.Within(1.000, acuity.LogMar, 0.001);
        Assert.Equal("20/200", DistanceAcuityNotation.Format(acuity, AcuityNotation.SnellenFeet, Invariant));
        Assert.Equal("VAS 50", DistanceAcuityNotation.Format(acuity, AcuityNotation.VisualAcuityScore, Invariant));
        Assert.Equal("35 letters", DistanceAcuityNotation.Format(acuity, AcuityNotation.EtdrsLetters, Invariant));
        Tolerance.Within(50, acuity.VisualAcuityScore, 0.001);
        Tolerance.Within(35, acuity.EtdrsLetters, 0.001);
    }

    [Fact]
    public void Twenty_forty_is_decimal_0_5_MAR_2_logMAR_0_301_and_VAS_84_9()
    {
        // CV-02 (methods §6): 20/40 → decimal 0.5; MAR 2′; logMAR 0.301 (charts print 0.3); VAS 84.9 (≈85).
        // Source: derived / DICOM RR table rows. Tolerance ±0.01 logMAR (and ±0.05 VAS, half a letter's 0.1 of a point).
        var acuity = Read("20/40");
        Tolerance.Within(0.5, acuity.DecimalValue, 0.001);
        Tolerance.Within(2.0, acuity.MarArcminutes, 0.001);
        Tolerance.Within(0.301, acuity.LogMar, 0.01);
        Tolerance.Within(84.9, acuity.VisualAcuityScore, 0.05);
        Assert.Equal("VAS 85", DistanceAcuityNotation.Format(acuity, AcuityNotation.VisualAcuityScore, Invariant));
        Assert.Equal("0.30 logMAR", DistanceAcuityNotation.Format(acuity, AcuityNotation.LogMar, Invariant));
        Assert.Equal("6/12", DistanceAcuityNotation.Format(acuity, AcuityNotation.SnellenMetres, Invariant));
    }

    // Methods §1.1 standard-lines table (derived: rows are exact 0.1 logMAR steps; labels are the usual rounded chart
    // labels). Columns: logMAR, metric label, feet label, decimal (exact, 3 dp), MAR (′, 2 dp), VAS.
    public static TheoryData<double, string, string, double, double, double> ChartLines => new()
    {
        { 0.0, "6/6", "20/20", 1.000, 1.00, 100 },
        { 0.1, "6/7.5", "20/25", 0.794, 1.26, 95 },
        { 0.2, "6/9.5", "20/32", 0.631, 1.58, 90 },
        { 0.3, "6/12", "20/40", 0.501, 2.00, 85 },
        { 0.4, "6/15", "20/50", 0.398, 2.51, 80 },
        { 0.5, "6/19", "20/63", 0.316, 3.16, 75 },
        { 0.6, "6/24", "20/80", 0.251, 3.98, 70 },
        { 0.7, "6/30", "20/100", 0.200, 5.01, 65 },
        { 0.8, "6/38", "20/125", 0.158, 6.31, 60 },
        { 0.9, "6/48", "20/160", 0.126, 7.94, 55 },
        { 1.0, "6/60", "20/200", 0.100, 10.00, 50 },
        { 1.3, "6/120", "20/400", 0.050, 19.95, 35 },
    };

    [Theory]
    [MemberData(nameof(ChartLines))]
    public void Each_standard_line_formats_with_its_chart_labels_and_values(double logMar, string metric, string feet, double decimalValue, double mar, double vas)
    {
        // Methods §1.1 table. Tolerances (§6): decimal ±0.0005 (the table's 3 dp), MAR ±0.005 (2 dp), VAS exact ±0.001.
        var acuity = Read("logMAR " + logMar.ToString(Invariant));
        Assert.Equal(metric, DistanceAcuityNotation.Format(acuity, AcuityNotation.SnellenMetres, Invariant));
        Assert.Equal(feet, DistanceAcuityNotation.Format(acuity, AcuityNotation.SnellenFeet, Invariant));
        Tolerance.Within(decimalValue, acuity.DecimalValue, 0.0005, "decimal");
        Tolerance.Within(mar, acuity.MarArcminutes, 0.005, "MAR");
        Tolerance.Within(vas, acuity.VisualAcuityScore, 0.001, "VAS");
        Assert.Equal("VAS " + vas.ToString(Invariant), DistanceAcuityNotation.Format(acuity, AcuityNotation.VisualAcuityScore, Invariant));
        // The decimal display is rounded to 2 dp (or 2 significant figures below 0.1): within ±0.005 of the table.
        var shown = DistanceAcuityNotation.Parse(DistanceAcuityNotation.Format(acuity, AcuityNotation.DecimalAcuity, Invariant), Invariant).Value;
        Tolerance.Within(decimalValue, shown.DecimalValue, 0.005, "decimal shown");
    }

    [Theory]
    [MemberData(nameof(ChartLines))]
    public void Each_chart_label_reads_back_to_its_line_within_the_labels_rounding(double logMar, string metric, string feet, double decimalValue, double mar, double vas)
    {
        // Methods §1.1: labels such as 6/38 are rounded (exact 6/37.9 is logMAR 0.80); §6 allows ±0.005 logMAR for
        // exact conversions, which covers every label's rounding (the largest is 6/7.5, 0.003 from 0.1).
        _ = (decimalValue, mar, vas);
        Tolerance.Within(logMar, Read(metric).LogMar, 0.005, metric);
        Tolerance.Within(logMar, Read(feet).LogMar, 0.005, feet);
    }

    [Theory]
    // Valid forms and their logMAR. Values derived from logMAR = −log₁₀(decimal) (Bailey & Lovie 1976),
    // VAS = 100 − 50 logMAR (DICOM RR.2.2) and letters = 85 − 50 logMAR (from memory). Tolerance ±0.0005.
    [InlineData("6/60", 1.0)]
    [InlineData("20/200", 1.0)]
    [InlineData("4/40", 1.0)]
    [InlineData("1/60", 1.7781513)]
    [InlineData("3/60", 1.3010300)]
    [InlineData("6/7.5", 0.0969100)]
    [InlineData("6/9.5", 0.1995723)]
    [InlineData("6/7,5", 0.0969100)]
    [InlineData(" 6 / 60 ", 1.0)]
    [InlineData("6\u204460", 1.0)]
    [InlineData("\uFF16/\uFF16\uFF10", 1.0)]
    [InlineData("dec 0.5", 0.3010300)]
    [InlineData("DEC 0,5", 0.3010300)]
    [InlineData("decimal 0.1", 1.0)]
    [InlineData("0.5 dec", 0.3010300)]
    [InlineData("0.50 decimal", 0.3010300)]
    [InlineData("logMAR 0.30", 0.30)]
    [InlineData("0.30 logMAR", 0.30)]
    [InlineData("LogMAR: 1.0", 1.0)]
    [InlineData("logmar -0.1", -0.1)]
    [InlineData("logMAR \u22120.1", -0.1)]
    [InlineData("logMAR +0.2", 0.2)]
    [InlineData("VAS 85", 0.30)]
    [InlineData("vas 50", 1.0)]
    [InlineData("85 VAS", 0.30)]
    [InlineData("ETDRS 35", 1.0)]
    [InlineData("35 letters", 1.0)]
    [InlineData("85 ETDRS letters", 0.0)]
    public void Reads_each_accepted_form(string text, double logMar) =>
        Tolerance.Within(logMar, Read(text).LogMar, 0.0005, text);

    [Theory]
    // Invalid entries, each with the exact message (all from ParseMessages).
    [InlineData(null, ParseMessages.DistanceAcuityExpected)]
    [InlineData("", ParseMessages.DistanceAcuityExpected)]
    [InlineData("   ", ParseMessages.DistanceAcuityExpected)]
    [InlineData("good", ParseMessages.DistanceAcuityExpected)]
    [InlineData("6/", ParseMessages.SnellenExpected)]
    [InlineData("6/60/2", ParseMessages.SnellenExpected)]
    [InlineData("six/sixty", ParseMessages.SnellenExpected)]
    [InlineData("6/0", ParseMessages.SnellenZero)]
    [InlineData("0/60", ParseMessages.SnellenZero)]
    [InlineData("60/6", ParseMessages.SnellenOutOfRange)]
    [InlineData("6/99999", ParseMessages.SnellenOutOfRange)]
    [InlineData("dec 0", ParseMessages.DecimalOutOfRange)]
    [InlineData("dec 5", ParseMessages.DecimalOutOfRange)]
    [InlineData("logMAR 3.5", ParseMessages.LogMarOutOfRange)]
    [InlineData("logMAR -1", ParseMessages.LogMarOutOfRange)]
    [InlineData("VAS 130", ParseMessages.VasOutOfRange)]
    [InlineData("200 letters", ParseMessages.EtdrsOutOfRange)]
    [InlineData("6/1e400", ParseMessages.NumberTooLong)]
    [InlineData("6/123456789012345678901234567890", ParseMessages.NumberTooLong)]
    [InlineData("top 1.0, 0 letters", ParseMessages.LettersCorrectOutOfRange)]
    [InlineData("top 4.0, 5 letters", ParseMessages.TopLineOutOfRange)]
    [InlineData("top 0.0, 40 letters", ParseMessages.LetterScoreOutOfRange)]
    public void Refuses_each_invalid_entry_with_its_message(string? text, string message) =>
        Assert.Equal(message, DistanceAcuityNotation.Parse(text, Invariant).Error);

    [Fact]
    public void Refuses_an_entry_longer_than_any_notation_needs()
    {
        var result = DistanceAcuityNotation.Parse(new string('6', 200), Invariant);
        Assert.Equal(ParseMessages.TooLong(ParseMessages.DistanceAcuityExpected), result.Error);
    }

    [Fact]
    public void Refuses_a_broken_surrogate_with_the_accepted_forms()
    {
        Assert.Equal(ParseMessages.DistanceAcuityExpected, DistanceAcuityNotation.Parse("6/6\uD800", Invariant).Error);
    }

    [Fact]
    public void A_bare_number_is_refused_by_default_with_both_readings_shown()
    {
        // Decision: "0.5" could be decimal (6/12) or logMAR (6/19), so by default the clinician is asked for the word.
        var result = DistanceAcuityNotation.Parse("0.5", Invariant);
        Assert.Equal(ParseMessages.BareNumberIsAmbiguous("0.5", "6/12, 20/40", "6/19, 20/63"), result.Error);
    }

    [Fact]
    public void A_bare_negative_number_can_only_be_logMAR_and_the_message_says_so()
    {
        var result = DistanceAcuityNotation.Parse("-0.1", Invariant);
        Assert.Equal(ParseMessages.BareNumberIsAmbiguous("-0.1", null, "6/4.8, 20/16"), result.Error);
    }

    [Theory]
    [InlineData("60")]
    [InlineData("6,60")]
    [InlineData("20,200")]
    [InlineData("6.60")]
    public void A_fraction_typed_without_its_slash_is_refused_with_the_slash_example(string text) =>
        Assert.Equal(ParseMessages.BareNumberNotAnAcuity(text), DistanceAcuityNotation.Parse(text, Invariant).Error);

    [Fact]
    public void A_clinic_that_reads_bare_numbers_as_logMAR_gets_the_reading_shown_as_a_warning()
    {
        var options = new DistanceAcuityOptions { BareNumbers = BareNumberReading.LogMar };
        var result = DistanceAcuityNotation.Parse("0.5", Invariant, options);
        Tolerance.Within(0.5, result.Value.LogMar, 1e-12);
        Assert.Equal(ParseMessages.BareNumberReadAsLogMar("0.5", "6/19, 20/63"), result.Warning);
    }

    [Fact]
    public void A_clinic_that_reads_bare_numbers_as_decimal_gets_the_reading_shown_as_a_warning()
    {
        var options = new DistanceAcuityOptions { BareNumbers = BareNumberReading.DecimalAcuity };
        var result = DistanceAcuityNotation.Parse("0.5", Invariant, options);
        Tolerance.Within(0.5, result.Value.DecimalValue, 1e-12);
        Assert.Equal(ParseMessages.BareNumberReadAsDecimal("0.5", "6/12, 20/40"), result.Warning);
    }

    [Fact]
    public void A_clinic_that_reads_bare_numbers_as_logMAR_still_refuses_one_out_of_range()
    {
        var options = new DistanceAcuityOptions { BareNumbers = BareNumberReading.LogMar };
        Assert.Equal(ParseMessages.LogMarOutOfRange, DistanceAcuityNotation.Parse("3.1", Invariant, options).Error);
    }

    [Fact]
    public void Named_notations_carry_no_warning()
    {
        Assert.Null(DistanceAcuityNotation.Parse("6/60", Invariant).Warning);
        Assert.Null(DistanceAcuityNotation.Parse("logMAR 1.0", Invariant).Warning);
    }

    [Theory]
    // A comma followed by three digits is refused when the culture uses it for thousands (decision, see docs/formulas.md).
    [InlineData("6/7,500", "en-GB", "7,500")]
    [InlineData("6/7.500", "de-DE", "7.500")]
    public void A_mark_that_could_be_a_thousands_separator_is_refused(string text, string culture, string token) =>
        Assert.Equal(ParseMessages.AmbiguousThousands(token), DistanceAcuityNotation.Parse(text, CultureInfo.GetCultureInfo(culture)).Error);

    [Theory]
    [InlineData("6/7,500", "de-DE", 0.0969100)]
    [InlineData("6/7.500", "en-GB", 0.0969100)]
    [InlineData("logMAR 0,300", "en-GB", 0.3)]
    public void A_mark_that_cannot_be_a_thousands_separator_is_a_decimal_mark(string text, string culture, double logMar) =>
        Tolerance.Within(logMar, DistanceAcuityNotation.Parse(text, CultureInfo.GetCultureInfo(culture)).Value.LogMar, 0.0005);

    [Theory]
    // Formatting off the standard lines: exact denominators rounded (whole from 10 up, one decimal below), derived
    // from den = num × 10^logMAR (methods §1.1).
    [InlineData("6/36", AcuityNotation.SnellenMetres, "6/36")]
    [InlineData("6/36", AcuityNotation.SnellenFeet, "20/120")]
    [InlineData("20/70", AcuityNotation.SnellenFeet, "20/70")]
    [InlineData("20/70", AcuityNotation.SnellenMetres, "6/21")]
    [InlineData("6/9", AcuityNotation.SnellenMetres, "6/9")]
    [InlineData("6/9", AcuityNotation.SnellenFeet, "20/30")]
    [InlineData("logMAR 3.0", AcuityNotation.SnellenMetres, "6/6000")]
    [InlineData("logMAR -0.1", AcuityNotation.SnellenMetres, "6/4.8")]
    [InlineData("logMAR 0.004", AcuityNotation.LogMar, "0.00 logMAR")]
    [InlineData("logMAR -0.004", AcuityNotation.LogMar, "0.00 logMAR")]
    [InlineData("6/60", AcuityNotation.DecimalAcuity, "0.10 decimal")]
    [InlineData("6/120", AcuityNotation.DecimalAcuity, "0.050 decimal")]
    [InlineData("logMAR 2.2", AcuityNotation.DecimalAcuity, "0.0063 decimal")]
    [InlineData("6/6", AcuityNotation.EtdrsLetters, "85 letters")]
    public void Formats_off_line_and_rounded_values_sensibly(string text, AcuityNotation notation, string expected) =>
        Assert.Equal(expected, DistanceAcuityNotation.Format(Read(text), notation, Invariant));

    [Fact]
    public void Formats_with_the_callers_decimal_mark()
    {
        var german = CultureInfo.GetCultureInfo("de-DE");
        var acuity = Read("6/7.5");
        Assert.Equal("6/7,5", DistanceAcuityNotation.Format(acuity, AcuityNotation.SnellenMetres, german));
        Assert.Equal("0,10 logMAR", DistanceAcuityNotation.Format(acuity, AcuityNotation.LogMar, german));
    }

    [Fact]
    public void The_canonical_form_is_invariant_and_reads_back_exactly()
    {
        var acuity = Read("20/40");
        var canonical = DistanceAcuityNotation.FormatCanonical(acuity);
        Assert.Equal("logMAR " + acuity.LogMar.ToString("R", Invariant), canonical);
        Assert.Equal(acuity, DistanceAcuityNotation.Parse(canonical, CultureInfo.GetCultureInfo("de-DE")).Value);
    }

    [Fact]
    public void TryParse_gives_the_value_or_false()
    {
        Assert.True(DistanceAcuityNotation.TryParse("6/60", Invariant, out var acuity));
        Tolerance.Within(1.0, acuity.LogMar, 1e-12);
        Assert.False(DistanceAcuityNotation.TryParse("6/0", Invariant, out _));
    }
}
