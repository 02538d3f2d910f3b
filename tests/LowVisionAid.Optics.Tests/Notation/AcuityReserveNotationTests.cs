using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class AcuityReserveNotationTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Theory]
    // Whittaker and Lovie-Kitchin 1993: an acuity reserve is written as a ratio of print size to threshold, 2:1 for
    // fluent and 3:1 for high-speed reading; the first number is the ratio. Tolerance ±1e-12.
    [InlineData("2:1", 2.0)]
    [InlineData("3 : 1", 3.0)]
    [InlineData("2", 2.0)]
    [InlineData("2.5:1", 2.5)]
    [InlineData("2,5 : 1", 2.5)]
    [InlineData("1:1", 1.0)]
    [InlineData("10:1", 10.0)]
    public void Reads_a_reserve_written_as_a_ratio(string text, double ratio) =>
        Tolerance.Within(ratio, AcuityReserveNotation.Parse(text, Invariant).Value.Ratio, 1e-12, text);

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("0.5:1")]
    [InlineData("11:1")]
    [InlineData("2:2")]
    [InlineData("fluent")]
    [InlineData("-2")]
    public void Refuses_anything_else_with_the_reserve_message(string? text) =>
        Assert.Equal(ParseMessages.AcuityReserveExpected, AcuityReserveNotation.Parse(text, Invariant).Error);

    [Fact]
    public void The_largest_ratio_accepted_is_the_reserve_types_own_limit() =>
        Assert.Equal(AcuityReserve.MaximumRatio, AcuityReserveNotation.Parse("10", Invariant).Value.Ratio);
}
