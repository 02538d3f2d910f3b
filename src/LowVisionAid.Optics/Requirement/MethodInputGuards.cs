using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// Checks on the inputs of the required-power methods. Each message says what to enter instead, because the
/// web app shows it beside the field.
/// </summary>
internal static class MethodInputGuards
{
    public static Distance TestDistance(Distance distance, string paramName) =>
        distance.Metres > 0
            ? distance
            : throw new ArgumentOutOfRangeException(paramName, distance.Metres,
                "Enter a test distance greater than zero, such as 40 cm.");

    public static Distance ReferenceDistance(Distance distance, string paramName) =>
        distance.Metres > 0
            ? distance
            : throw new ArgumentOutOfRangeException(paramName, distance.Metres,
                "Enter a reference distance greater than zero, such as 25 cm or the test distance.");

    public static Distance ViewingDistance(Distance distance, string paramName, string what) =>
        distance.Metres > 0
            ? distance
            : throw new ArgumentOutOfRangeException(paramName, distance.Metres,
                $"Enter the {what} as a distance greater than zero, such as 40 cm.");

    public static PrintSize Print(PrintSize size, string paramName, string what) =>
        size.IsValid
            ? size
            : throw new ArgumentOutOfRangeException(paramName, size.M,
                $"Enter the {what} as a print size greater than zero, such as 1.0M.");
}
