using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class PrintSizeNotationTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Theory]
    // M units are exact; mm via 1M = 1.4544 mm (Sloan 1959, CV-03); N and pt via M = pt × 0.35278 × 0.50 / 1.4544
    // (methods §1.3, derived, r_x 0.50). Tolerance ±0.0005 M.
    [InlineData("1M", 1.0)]
    [InlineData("1.0 M", 1.0)]
    [InlineData("1,6m", 1.6)]
    [InlineData("1.4544 mm", 1.0)]
    [InlineData("1.5 mm", 1.0313)]
    [InlineData("1.5 mm x-height", 1.0313)]
    [InlineData("N8", 0.9701)]
    [InlineData("n 12", 1.4551)]
    [InlineData("8.25 pt", 1.0005)]
    [InlineData("12 pt", 1.4551)]
    [InlineData("12pt", 1.4551)]
    [InlineData("12 points", 1.4551)]
    public void Reads_each_print_size_form(string text, double m) =>
        Tolerance.Within(m, PrintSizeNotation.Parse(text, Invariant).Value.M, 0.0005, text);

    [Fact]
    public void One_M_is_8_25_points_at_the_conventional_ratio()
    {
        // CV-30 (methods §6): 1M with r_x 0.50 → 8.25 pt; Times New Roman r_x 0.447 → 9.22 pt. Derived; r_x from memory. ±0.05.
        // 1.4544 / (0.35278 × 0.50) = 8.245 pt: methods rounds it to 8.25, the one-decimal display shows 8.2.
        Assert.Equal("8.2 pt", PrintSizeNotation.Format(PrintSize.FromM(1), PrintSizeUnit.Points, Invariant));
        Tolerance.Within(8.25, PrintSizeNotation.Parse("8.25 pt", Invariant).Value.ToPoints(default), 0.05);
        Tolerance.Within(1.0, PrintSizeNotation.Parse("9.22 pt", Invariant, XHeightRatio.FromRatio(0.447)).Value.M, 0.05 / 8.25);
    }

    [Fact]
    public void Points_and_N_carry_a_warning_that_names_the_ratio()
    {
        Assert.Equal(ParseMessages.ApproximateFromPoints("12 pt", "1.5M", "0.50"), PrintSizeNotation.Parse("12 pt", Invariant).Warning);
        Assert.Equal(ParseMessages.ApproximateFromPoints("N8", "0.87M", "0.45"), PrintSizeNotation.Parse("N8", Invariant, XHeightRatio.FromRatio(0.45)).Warning);
        Assert.Null(PrintSizeNotation.Parse("1M", Invariant).Warning);
        Assert.Null(PrintSizeNotation.Parse("1.5 mm", Invariant).Warning);
    }

    [Theory]
    [InlineData(null, ParseMessages.PrintSizeExpected)]
    [InlineData("", ParseMessages.PrintSizeExpected)]
    [InlineData("big", ParseMessages.PrintSizeExpected)]
    [InlineData("-1M", ParseMessages.PrintSizeExpected)]
    [InlineData("0M", ParseMessages.PrintSizeOutOfRange)]
    [InlineData("0.01M", ParseMessages.PrintSizeOutOfRange)]
    [InlineData("101M", ParseMessages.PrintSizeOutOfRange)]
    [InlineData("N0", ParseMessages.PrintSizeOutOfRange)]
    [InlineData("0 pt", ParseMessages.PrintSizeOutOfRange)]
    [InlineData("0 mm", ParseMessages.PrintSizeOutOfRange)]
    [InlineData("1e999M", ParseMessages.NumberTooLong)]
    public void Refuses_each_invalid_print_size_with_its_message(string? text, string message) =>
        Assert.Equal(message, PrintSizeNotation.Parse(text, Invariant).Error);

    [Fact]
    public void A_number_without_a_unit_asks_for_the_unit()
    {
        Assert.Equal(ParseMessages.PrintSizeNeedsUnit("8"), PrintSizeNotation.Parse("8", Invariant).Error);
    }

    [Theory]
    // Display forms of 1M (1.4544 mm; 8.245 pt at r_x 0.50, methods §1.3).
    [InlineData(PrintSizeUnit.MUnits, "1.0M")]
    [InlineData(PrintSizeUnit.NNotation, "N8.2")]
    [InlineData(PrintSizeUnit.Points, "8.2 pt")]
    [InlineData(PrintSizeUnit.XHeightMillimetres, "1.45 mm")]
    public void Formats_1M_in_each_unit(PrintSizeUnit unit, string expected) =>
        Assert.Equal(expected, PrintSizeNotation.Format(PrintSize.FromM(1), unit, Invariant));

    [Fact]
    public void Formats_small_sizes_with_two_decimals_and_the_callers_mark()
    {
        Assert.Equal("0,87M", PrintSizeNotation.Format(PrintSize.FromM(0.87), PrintSizeUnit.MUnits, CultureInfo.GetCultureInfo("de-DE")));
    }

    [Fact]
    public void The_canonical_form_reads_back_exactly()
    {
        var size = PrintSizeNotation.Parse("N8", Invariant).Value;
        Assert.Equal(size, PrintSizeNotation.Parse(PrintSizeNotation.FormatCanonical(size), CultureInfo.GetCultureInfo("de-DE")).Value);
        Assert.Equal("1M", PrintSizeNotation.FormatCanonical(PrintSize.FromM(1)));
    }

    [Fact]
    public void TryParse_gives_the_value_or_false()
    {
        Assert.True(PrintSizeNotation.TryParse("1M", Invariant, out var size, out var none));
        Tolerance.Within(1.0, size.M, 1e-12);
        Assert.Null(none);
        Assert.False(PrintSizeNotation.TryParse("1", Invariant, out _, out _));
    }

    [Fact]
    public void TryParse_hands_back_the_warning_so_an_approximate_size_is_never_silent()
    {
        Assert.True(PrintSizeNotation.TryParse("J5", Invariant, out _, out var jaeger));
        Assert.Equal(ParseMessages.JaegerApproximate("J5", "1.0M", "20/50", assumedDistance: false), jaeger);
        Assert.True(PrintSizeNotation.TryParse("12 pt", Invariant, out _, out var points));
        Assert.Equal(ParseMessages.ApproximateFromPoints("12 pt", "1.5M", "0.50"), points);
    }
}
