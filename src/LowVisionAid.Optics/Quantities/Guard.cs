namespace LowVisionAid.Optics.Quantities;

/// <summary>
/// Checks at the public edge of the value types; inside the core, values are trusted. Each message says what is
/// wrong and, given an example, what to enter instead.
/// </summary>
internal static class Guard
{
    public static double Finite(double value, string paramName, string what, string? example = null) =>
        double.IsFinite(value)
            ? value
            : throw new ArgumentOutOfRangeException(paramName, value, $"{what} must be a finite number{Example(example)}.");

    public static double Positive(double value, string paramName, string what, string? example = null) =>
        double.IsFinite(value) && value > 0
            ? value
            : throw new ArgumentOutOfRangeException(paramName, value, $"{what} must be a finite number greater than zero{Example(example)}.");

    private static string Example(string? example) => example is null ? string.Empty : "; enter one such as " + example;
}
