using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

public class RelativeMagnificationTests
{
    [Theory]
    // CV-24: Ryan and Margrain 2006: 40 → 10 cm gives 4×; TV at 3 m instead of 6 m gives 2×. Exact (±1e-9).
    [InlineData(0.40, 0.10, 4.0)]
    [InlineData(6.0, 3.0, 2.0)]
    public void Moving_closer_magnifies_by_the_ratio_of_the_distances(double fromMetres, double toMetres, double times) =>
        Tolerance.Within(times, RelativeMagnification.FromDistanceChange(Distance.FromMetres(fromMetres), Distance.FromMetres(toMetres)), 1e-9);

    [Fact]
    public void Reading_at_10_cm_needs_10_D_of_focus_and_at_40_cm_2_5_D()
    {
        // Ryan and Margrain 2006: relative distance needs accommodation or an add of 1 / new distance: 10 D at 10 cm,
        // 2.5 D at 40 cm (derived). Exact (±1e-9).
        Tolerance.Within(10.0, RelativeMagnification.FocusNeededAt(Distance.FromCentimetres(10)).Dioptres, 1e-9);
        Tolerance.Within(2.5, RelativeMagnification.FocusNeededAt(Distance.FromCentimetres(40)).Dioptres, 1e-9);
    }

    [Fact]
    public void Doubling_print_from_1M_to_2M_is_2x_and_within_the_large_print_limit()
    {
        // Relative size M = new ÷ old; practical limit of large print ≈ 2–2.5× (Ryan and Margrain 2006). Exact.
        var times = RelativeMagnification.FromSizeChange(PrintSize.FromM(1), PrintSize.FromM(2));

        Tolerance.Within(2.0, times, 1e-9);
        Assert.False(RelativeMagnification.IsBeyondLargePrintLimit(times));
        Assert.True(RelativeMagnification.IsBeyondLargePrintLimit(RelativeMagnification.FromSizeChange(PrintSize.FromM(1), PrintSize.FromM(3))));
    }

    [Fact]
    public void A_zero_new_distance_is_refused_with_an_example()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() =>
            RelativeMagnification.FromDistanceChange(Distance.FromCentimetres(40), Distance.Zero));

        Assert.StartsWith("Enter the new viewing distance as a distance greater than zero, such as 40 cm.", error.Message, StringComparison.Ordinal);
    }
}
