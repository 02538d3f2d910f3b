using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class NonChartVisionNotationTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Theory]
    [InlineData("CF", NonChartVisionLevel.CountingFingers)]
    [InlineData("cf at 1 m", NonChartVisionLevel.CountingFingers)]
    [InlineData("CF @ 50cm", NonChartVisionLevel.CountingFingers)]
    [InlineData("counting fingers", NonChartVisionLevel.CountingFingers)]
    [InlineData("Count fingers 2 ft", NonChartVisionLevel.CountingFingers)]
    [InlineData("HM", NonChartVisionLevel.HandMovements)]
    [InlineData("hand movements at 1 m", NonChartVisionLevel.HandMovements)]
    [InlineData("hand motion", NonChartVisionLevel.HandMovements)]
    [InlineData("LP", NonChartVisionLevel.LightPerception)]
    [InlineData("PL", NonChartVisionLevel.LightPerception)]
    [InlineData("PL+", NonChartVisionLevel.LightPerception)]
    [InlineData("light perception", NonChartVisionLevel.LightPerception)]
    [InlineData("NLP", NonChartVisionLevel.NoLightPerception)]
    [InlineData("NPL", NonChartVisionLevel.NoLightPerception)]
    [InlineData("no light perception", NonChartVisionLevel.NoLightPerception)]
    public void Recognises_each_level_and_refuses_it_for_calculation(string text, NonChartVisionLevel level)
    {
        Assert.Equal(level, NonChartVisionNotation.Parse(text, Invariant).Value.Level);
        Assert.Equal(ParseMessages.NotChartAcuity(level), DistanceAcuityNotation.Parse(text, Invariant).Error);
    }

    [Fact]
    public void Keeps_the_distance_written_with_the_level()
    {
        var vision = NonChartVisionNotation.Parse("CF at 1 m", Invariant).Value;
        Tolerance.Within(1.0, vision.TestDistance!.Value.Metres, 1e-12);
        Assert.Equal("CF at 1.0 m", NonChartVisionNotation.Format(vision, Invariant));
        Assert.Equal("HM", NonChartVisionNotation.Format(new NonChartVision(NonChartVisionLevel.HandMovements, null), Invariant));
    }

    [Fact]
    public void A_level_with_an_unreadable_distance_is_still_refused_for_calculation_as_that_level()
    {
        Assert.Equal(ParseMessages.NotChartAcuity(NonChartVisionLevel.CountingFingers), DistanceAcuityNotation.Parse("CF at arm's length", Invariant).Error);
        Assert.Equal(ParseMessages.DistanceOutOfRange, NonChartVisionNotation.Parse("CF at 500 m", Invariant).Error);
    }

    [Fact]
    public void The_counting_fingers_message_says_what_to_measure_instead()
    {
        // SAFETY.md, "Inputs the tool refuses": measure on a chart at a closer distance; 6/60 read at 1 m is written 1/60.
        Assert.Contains("1/60", ParseMessages.NotChartAcuity(NonChartVisionLevel.CountingFingers), StringComparison.Ordinal);
        Assert.Contains("chart", ParseMessages.NotChartAcuity(NonChartVisionLevel.HandMovements), StringComparison.Ordinal);
    }

    [Fact]
    public void A_recorded_vision_is_a_chart_acuity_with_its_value_or_a_level_with_none()
    {
        // logMAR = log₁₀(60/6) = 1.0 for 6/60 (derived from the Snellen fraction's definition). Tolerance ±1e-9.
        Tolerance.Within(1.0, DistanceAcuityNotation.ParseRecordedVision("6/60", Invariant).Value!.Value.LogMar, 1e-9);

        var countingFingers = DistanceAcuityNotation.ParseRecordedVision("CF at 1 m", Invariant);
        Assert.True(countingFingers.Success);
        Assert.Null(countingFingers.Value);

        Assert.Equal(ParseMessages.DistanceAcuityExpected, DistanceAcuityNotation.ParseRecordedVision("blurry", Invariant).Error);
        Assert.Equal(ParseMessages.SnellenZero, DistanceAcuityNotation.ParseRecordedVision("6/0", Invariant).Error);
    }

    [Fact]
    public void A_chart_acuity_is_not_a_non_chart_level()
    {
        Assert.Equal(ParseMessages.DistanceAcuityExpected, NonChartVisionNotation.Parse("6/60", Invariant).Error);
    }
}
