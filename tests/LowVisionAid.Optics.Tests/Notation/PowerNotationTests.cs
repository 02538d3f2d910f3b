using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class PowerNotationTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Theory]
    // Common practice: a lens power is written signed, in dioptres, in 0.25 D steps, with or without "D"
    // ("+2.50", "+4 D", "-1.25D"); the number typed is the power. Tolerance ±1e-12 D.
    [InlineData("+2.50", 2.5)]
    [InlineData("+4 D", 4.0)]
    [InlineData("-1.25D", -1.25)]
    [InlineData("3 dioptres", 3.0)]
    [InlineData("3 diopters", 3.0)]
    [InlineData("+2,50 d", 2.5)]
    [InlineData("  +10  D ", 10.0)]
    [InlineData("\u22121.00", -1.0)]
    [InlineData("0", 0.0)]
    public void Reads_a_signed_power_with_or_without_its_unit(string text, double dioptres) =>
        Tolerance.Within(dioptres, PowerNotation.Parse(text, Invariant).Value.Dioptres, 1e-12, text);

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("strong")]
    [InlineData("+4 x")]
    [InlineData("4 cm")]
    [InlineData("++4")]
    [InlineData("1e3")]
    [InlineData("+80.25 D")]
    [InlineData("-40.25")]
    public void Refuses_anything_else_with_the_power_message(string? text) =>
        Assert.Equal(ParseMessages.PowerExpected, PowerNotation.Parse(text, Invariant).Error);

    [Fact]
    public void The_range_ends_are_accepted()
    {
        Assert.Equal(PowerNotation.MinimumDioptres, PowerNotation.Parse("-40", Invariant).Value.Dioptres);
        Assert.Equal(PowerNotation.MaximumDioptres, PowerNotation.Parse("+80 D", Invariant).Value.Dioptres);
    }

    [Fact]
    public void A_comma_culture_reads_the_same_power()
    {
        // Same value as the invariant table: +2.50 D written with a decimal comma.
        Assert.True(PowerNotation.TryParse("+2,50 D", CultureInfo.GetCultureInfo("de-DE"), out var power));
        Tolerance.Within(2.5, power.Dioptres, 1e-12);
    }

    [Fact]
    public void A_very_long_entry_is_refused_as_too_long() =>
        Assert.Equal(ParseMessages.TooLong(ParseMessages.PowerExpected), PowerNotation.Parse(new string('4', 81), Invariant).Error);
}
