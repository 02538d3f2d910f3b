using System.Collections.Immutable;
using System.Globalization;
using LowVisionAid.Optics.Options;
using Microsoft.EntityFrameworkCore.ChangeTracking;
using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace LowVisionAid.Data.Conversions;

/// <summary>
/// Stores a clinic's cost classes as one text column, "HandMagnifier=2;VideoMagnifier=1" (option kind name, cost class
/// number, in kind order). An entry whose kind or class this version does not know is skipped on reading, so the
/// core's default stands for it.
/// </summary>
public sealed class CostClassesConverter() : ValueConverter<IReadOnlyDictionary<OptionKind, CostClass>, string>(
    classes => Write(classes),
    text => Read(text))
{
    /// <summary>Two sets of cost classes are equal when they store the same text.</summary>
    public static ValueComparer<IReadOnlyDictionary<OptionKind, CostClass>> Comparer { get; } = new(
        (a, b) => Write(a) == Write(b),
        c => Write(c).GetHashCode(StringComparison.Ordinal),
        c => Read(Write(c)));

    public static string Write(IReadOnlyDictionary<OptionKind, CostClass>? classes) =>
        classes is null ? "" : string.Join(';', classes.OrderBy(c => c.Key).Select(c => string.Create(CultureInfo.InvariantCulture, $"{c.Key}={(int)c.Value}")));

    public static IReadOnlyDictionary<OptionKind, CostClass> Read(string? text)
    {
        var classes = ImmutableDictionary.CreateBuilder<OptionKind, CostClass>();
        foreach (var entry in (text ?? "").Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            var parts = entry.Split('=');
            if (parts.Length == 2 && Enum.TryParse<OptionKind>(parts[0], out var kind) && Enum.IsDefined(kind)
                && int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out var number) && Enum.IsDefined((CostClass)number))
            {
                classes[kind] = (CostClass)number;
            }
        }

        return classes.ToImmutable();
    }
}
