using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class DistanceNotationTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Theory]
    // Exact unit definitions: 1 in = 25.4 mm, 1 ft = 304.8 mm (international inch and foot, 1959). Tolerance ±1e-9 m.
    [InlineData("40 cm", 0.40)]
    [InlineData("40cm", 0.40)]
    [InlineData("40 CM", 0.40)]
    [InlineData("0.4 m", 0.40)]
    [InlineData("0,4 m", 0.40)]
    [InlineData(".4m", 0.40)]
    [InlineData("400 mm", 0.40)]
    [InlineData("16 in", 0.4064)]
    [InlineData("16\"", 0.4064)]
    [InlineData("16\u2033", 0.4064)]
    [InlineData("16 inches", 0.4064)]
    [InlineData("2 ft", 0.6096)]
    [InlineData("33.3 centimetres", 0.333)]
    [InlineData("1 metre", 1.0)]
    [InlineData("25\u00a0cm", 0.25)]
    public void Reads_a_distance_in_each_unit(string text, double metres) =>
        Tolerance.Within(metres, DistanceNotation.Parse(text, Invariant).Value.Metres, 1e-9, text);

    [Theory]
    [InlineData(null, ParseMessages.DistanceExpected)]
    [InlineData("", ParseMessages.DistanceExpected)]
    [InlineData("near", ParseMessages.DistanceExpected)]
    [InlineData("40 furlongs", ParseMessages.DistanceExpected)]
    [InlineData("-40 cm", ParseMessages.DistanceExpected)]
    [InlineData("0 cm", ParseMessages.DistanceOutOfRange)]
    [InlineData("0.5 mm", ParseMessages.DistanceOutOfRange)]
    [InlineData("101 m", ParseMessages.DistanceOutOfRange)]
    [InlineData("1e9 m", ParseMessages.DistanceOutOfRange)]
    [InlineData("1e999 m", ParseMessages.NumberTooLong)]
    public void Refuses_each_invalid_distance_with_its_message(string? text, string message) =>
        Assert.Equal(message, DistanceNotation.Parse(text, Invariant).Error);

    [Fact]
    public void A_number_without_a_unit_asks_for_the_unit()
    {
        Assert.Equal(ParseMessages.DistanceNeedsUnit("40"), DistanceNotation.Parse("40", Invariant).Error);
    }

    [Fact]
    public void One_thousand_with_a_separator_is_refused_as_ambiguous()
    {
        Assert.Equal(ParseMessages.AmbiguousThousands("1,000"), DistanceNotation.Parse("1,000 mm", Invariant).Error);
        Tolerance.Within(0.001, DistanceNotation.Parse("1,000 mm", CultureInfo.GetCultureInfo("de-DE")).Value.Metres, 1e-12);
    }

    [Theory]
    [InlineData("40 cm", null, "40 cm")]
    [InlineData("33.3 cm", null, "33.3 cm")]
    [InlineData("16 in", "in", "16 in")]
    [InlineData("400 mm", "mm", "400 mm")]
    [InlineData("40 cm", "m", "0.4 m")]
    [InlineData("33 cm", "m", "0.33 m")]
    public void Formats_for_display(string text, string? format, string expected) =>
        Assert.Equal(expected, DistanceNotation.Format(DistanceNotation.Parse(text, Invariant).Value, Invariant, format));

    [Fact]
    public void The_canonical_form_reads_back_exactly()
    {
        var distance = DistanceNotation.Parse("16 in", Invariant).Value;
        Assert.Equal("0.4064 m", DistanceNotation.FormatCanonical(distance));
        Assert.Equal(distance, DistanceNotation.Parse(DistanceNotation.FormatCanonical(distance), CultureInfo.GetCultureInfo("fr-FR")).Value);
    }
}
