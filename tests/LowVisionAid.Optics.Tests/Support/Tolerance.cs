namespace LowVisionAid.Optics.Tests.Support;

/// <summary>Tolerance asserts for computed doubles. Each check states its tolerance beside its source.</summary>
public static class Tolerance
{
    /// <summary>Asserts |actual − expected| ≤ absolute.</summary>
    public static void Within(double expected, double actual, double absolute, string? what = null)
    {
        if (!(Math.Abs(actual - expected) <= absolute))
        {
            Assert.Fail($"{what ?? "value"}: expected {expected.ToString("R", CultureInfo.InvariantCulture)} ± {absolute.ToString(CultureInfo.InvariantCulture)}, got {actual.ToString("R", CultureInfo.InvariantCulture)}");
        }
    }

    /// <summary>Asserts |actual − expected| ≤ fraction × |expected|.</summary>
    public static void WithinRelative(double expected, double actual, double fraction, string? what = null) =>
        Within(expected, actual, Math.Abs(expected) * fraction, what);
}
