using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class ContrastSensitivityNotationTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Theory]
    // Pelli, Robson and Wilkins 1988 (Pelli-Robson chart): log contrast sensitivity is scored in 0.05 log-unit
    // steps from 0.00 to 2.25, and 1.05 is written "1.05 logCS"; the number typed is the value. Tolerance ±1e-12.
    [InlineData("1.05", 1.05)]
    [InlineData("1.05 logCS", 1.05)]
    [InlineData("1.05logcs", 1.05)]
    [InlineData("1,05 log CS", 1.05)]
    [InlineData("0", 0.0)]
    [InlineData("2.25", 2.25)]
    [InlineData("2.4", 2.4)]
    public void Reads_log_contrast_sensitivity_with_or_without_its_unit(string text, double logCs) =>
        Tolerance.Within(logCs, ContrastSensitivityNotation.Parse(text, Invariant).Value, 1e-12, text);

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("good")]
    [InlineData("-0.15")]
    [InlineData("2.45")]
    [InlineData("10%")]
    [InlineData("1.05 logMAR")]
    public void Refuses_anything_else_with_the_contrast_message(string? text) =>
        Assert.Equal(ParseMessages.ContrastSensitivityExpected, ContrastSensitivityNotation.Parse(text, Invariant).Error);

    [Fact]
    public void A_comma_culture_reads_the_same_value() =>
        Tolerance.Within(1.05, ContrastSensitivityNotation.Parse("1,05", CultureInfo.GetCultureInfo("fr-FR")).Value, 1e-12);
}
