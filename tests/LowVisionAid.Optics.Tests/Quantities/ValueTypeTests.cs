using System.Reflection;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Quantities;

/// <summary>
/// The laws every value type of the core keeps (STYLE.md §2 and §5): immutable, documented defaults, NaN and
/// infinity refused at the public edge, and equality and ordering that behave (one shared helper, <see cref="ValueTypeLaws"/>).
/// </summary>
public class ValueTypeTests
{
    // Samples include values made two ways (so equal values from different factories meet), −0 and 0, and extremes.
    private static readonly double[] Numbers = [-1e6, -2.5, -0.0, 0.0, 0.25, 0.25, 1.0 / 3.0, 4.0, 1e6];

    public static TheoryData<Type> ValueTypes => new()
    {
        typeof(Power), typeof(Distance), typeof(PrintSize), typeof(VisualAngle), typeof(Acuity),
        typeof(AcuityReserve), typeof(XHeightRatio), typeof(NearAcuity), typeof(NonChartVision), typeof(ReadingPoint),
    };

    [Theory]
    [MemberData(nameof(ValueTypes))]
    public void Every_value_type_is_an_immutable_struct(Type type)
    {
        Assert.True(type.IsValueType, type.Name);
        var fields = type.GetFields(BindingFlags.Instance | BindingFlags.Public | BindingFlags.NonPublic);
        Assert.NotEmpty(fields);
        Assert.All(fields, f => Assert.True(f.IsInitOnly, $"{type.Name}.{f.Name} is read-only"));
    }

    [Fact]
    public void Power_keeps_the_equality_and_ordering_laws() =>
        ValueTypeLaws.Ordering(
            [.. Numbers.Select(Power.FromDioptres), Power.FromFocalLength(Distance.FromCentimetres(25)), Power.Zero, default],
            (a, b) => a == b, (a, b) => a != b, (a, b) => a < b, (a, b) => a <= b, (a, b) => a > b, (a, b) => a >= b);

    [Fact]
    public void Distance_keeps_the_equality_and_ordering_laws() =>
        ValueTypeLaws.Ordering(
            [.. Numbers.Select(Distance.FromMetres), Distance.FromCentimetres(25), Distance.FromInches(10), Distance.Zero, default],
            (a, b) => a == b, (a, b) => a != b, (a, b) => a < b, (a, b) => a <= b, (a, b) => a > b, (a, b) => a >= b);

    [Fact]
    public void Print_size_keeps_the_equality_and_ordering_laws() =>
        ValueTypeLaws.Ordering(
            [.. Numbers.Where(n => n > 0).Select(PrintSize.FromM), PrintSize.FromXHeightMillimetres(1.4544), PrintSize.FromM(1), default],
            (a, b) => a == b, (a, b) => a != b, (a, b) => a < b, (a, b) => a <= b, (a, b) => a > b, (a, b) => a >= b);

    [Fact]
    public void Visual_angle_keeps_the_equality_and_ordering_laws() =>
        ValueTypeLaws.Ordering(
            [.. Numbers.Where(n => n >= 0).Select(VisualAngle.FromArcminutes), VisualAngle.FromDegrees(1), VisualAngle.FromArcminutes(60), default],
            (a, b) => a == b, (a, b) => a != b, (a, b) => a < b, (a, b) => a <= b, (a, b) => a > b, (a, b) => a >= b);

    [Fact]
    public void Acuity_keeps_the_equality_and_ordering_laws() =>
        ValueTypeLaws.Ordering(
            [Acuity.FromLogMar(-0.5), Acuity.FromLogMar(-0.0), Acuity.FromLogMar(0.0), Acuity.FromLogMar(1), Acuity.FromSnellen(6, 60), Acuity.FromDecimal(0.1), Acuity.FromLogMar(3), default],
            (a, b) => a == b, (a, b) => a != b, (a, b) => a < b, (a, b) => a <= b, (a, b) => a > b, (a, b) => a >= b);

    [Fact]
    public void Reserve_and_x_height_ratio_keep_the_equality_laws()
    {
        ValueTypeLaws.Equality([AcuityReserve.Spot, AcuityReserve.FromRatio(1), AcuityReserve.Fluent, AcuityReserve.FromRatio(2), AcuityReserve.Sustained, default], (a, b) => a == b, (a, b) => a != b);
        ValueTypeLaws.Equality([XHeightRatio.Conventional, XHeightRatio.FromRatio(0.5), XHeightRatio.FromRatio(0.447), XHeightRatio.FromRatio(0.8), default], (a, b) => a == b, (a, b) => a != b);
    }

    [Fact]
    public void Near_acuity_reading_point_and_non_chart_vision_keep_the_equality_laws()
    {
        ValueTypeLaws.Equality(
            [NearAcuity.Create(PrintSize.FromM(1), Distance.FromCentimetres(40)), NearAcuity.Create(PrintSize.FromM(1), Distance.FromMetres(0.4)), NearAcuity.Create(PrintSize.FromM(4), Distance.FromCentimetres(40)), default],
            (a, b) => a == b, (a, b) => a != b);
        ValueTypeLaws.Equality(
            [new ReadingPoint(PrintSize.FromM(1), 80), new ReadingPoint(PrintSize.FromM(1), 80), new ReadingPoint(PrintSize.FromM(1), 0), default],
            (a, b) => a == b, (a, b) => a != b);
        ValueTypeLaws.Equality(
            [new NonChartVision(NonChartVisionLevel.CountingFingers, null), new NonChartVision(NonChartVisionLevel.CountingFingers, Distance.FromMetres(1)), new NonChartVision(NonChartVisionLevel.HandMovements, null), default],
            (a, b) => a == b, (a, b) => a != b);
    }

    [Fact]
    public void Default_values_are_the_documented_ones()
    {
        // Each type's XML summary states its default value.
        Assert.Equal(0.0, default(Power).Dioptres);
        Assert.Equal(Power.Zero, default);
        Assert.Equal(0.0, default(Distance).Metres);
        Assert.Equal(Distance.Zero, default);
        Assert.Equal(0.0, default(VisualAngle).Arcminutes);
        Assert.Equal(0.0, default(Acuity).LogMar);
        Assert.Equal(1.0, default(Acuity).DecimalValue);
        Assert.False(default(PrintSize).IsValid);
        Assert.Equal(1.0, default(AcuityReserve).Ratio);
        Assert.Equal(AcuityReserve.Spot, default);
        Assert.Equal(0.5, default(XHeightRatio).Value);
        Assert.False(default(NearAcuity).Threshold.IsValid);
        Assert.Equal(NonChartVisionLevel.CountingFingers, default(NonChartVision).Level);
        Assert.Null(default(NonChartVision).TestDistance);
    }

    public static TheoryData<string, Func<double, object>> Factories => new()
    {
        { "Power.FromDioptres", v => Power.FromDioptres(v) },
        { "Distance.FromMetres", v => Distance.FromMetres(v) },
        { "Distance.FromCentimetres", v => Distance.FromCentimetres(v) },
        { "Distance.FromMillimetres", v => Distance.FromMillimetres(v) },
        { "Distance.FromInches", v => Distance.FromInches(v) },
        { "Distance.FromFeet", v => Distance.FromFeet(v) },
        { "PrintSize.FromM", v => PrintSize.FromM(v) },
        { "PrintSize.FromXHeightMillimetres", v => PrintSize.FromXHeightMillimetres(v) },
        { "PrintSize.FromPoints", v => PrintSize.FromPoints(v, XHeightRatio.Conventional) },
        { "VisualAngle.FromArcminutes", v => VisualAngle.FromArcminutes(v) },
        { "VisualAngle.FromDegrees", v => VisualAngle.FromDegrees(v) },
        { "VisualAngle.FromRadians", v => VisualAngle.FromRadians(v) },
        { "Acuity.FromLogMar", v => Acuity.FromLogMar(v) },
        { "Acuity.FromDecimal", v => Acuity.FromDecimal(v) },
        { "Acuity.FromMarArcminutes", v => Acuity.FromMarArcminutes(v) },
        { "Acuity.FromSnellen (denominator)", v => Acuity.FromSnellen(6, v) },
        { "Acuity.FromVisualAcuityScore", v => Acuity.FromVisualAcuityScore(v) },
        { "Acuity.FromEtdrsLetters", v => Acuity.FromEtdrsLetters(v) },
        { "AcuityReserve.FromRatio", v => AcuityReserve.FromRatio(v) },
        { "XHeightRatio.FromRatio", v => XHeightRatio.FromRatio(v) },
    };

    [Theory]
    [MemberData(nameof(Factories))]
    public void Every_factory_refuses_NaN_and_infinity(string factory, Func<double, object> create)
    {
        foreach (var bad in new[] { double.NaN, double.PositiveInfinity, double.NegativeInfinity })
        {
            var error = Assert.Throws<ArgumentOutOfRangeException>(() => create(bad));
            Assert.False(string.IsNullOrWhiteSpace(error.Message), factory);
        }
    }

    [Fact]
    public void A_focal_length_too_short_for_a_finite_power_is_refused()
    {
        // 1 / 5e-324 m overflows to infinity: the factory must refuse it rather than hold an infinite power.
        Assert.Throws<ArgumentOutOfRangeException>(() => Power.FromFocalLength(Distance.FromMetres(double.Epsilon)));
        Assert.Throws<ArgumentOutOfRangeException>(() => Distance.FromMetres(double.Epsilon).Inverse());
    }

    [Fact]
    public void Arithmetic_that_overflows_is_refused_rather_than_giving_infinity()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Power.FromDioptres(double.MaxValue) * 2);
        Assert.Throws<ArgumentOutOfRangeException>(() => Distance.FromMetres(double.MaxValue) + Distance.FromMetres(double.MaxValue));
        Assert.Throws<ArgumentOutOfRangeException>(() => Distance.FromMetres(1) / 0.0);
    }
}
