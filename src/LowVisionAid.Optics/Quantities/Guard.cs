namespace LowVisionAid.Optics.Quantities;

/// <summary>Checks at the public edge of the value types; inside the core, values are trusted.</summary>
internal static class Guard
{
    public static double Finite(double value, string paramName, string what) =>
        double.IsFinite(value)
            ? value
            : throw new ArgumentOutOfRangeException(paramName, value, $"{what} must be a finite number.");

    public static double Positive(double value, string paramName, string what) =>
        double.IsFinite(value) && value > 0
            ? value
            : throw new ArgumentOutOfRangeException(paramName, value, $"{what} must be a finite number greater than zero.");
}
