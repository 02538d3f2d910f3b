using System.Reflection;
using System.Text.Json;
using System.Text.Json.Serialization;
using System.Text.Json.Serialization.Metadata;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Web.Plans;

/// <summary>
/// The one way plans are written to and read from their JSON columns. The core's value types are stored as plain
/// numbers in their invariant units (Power in dioptres, Distance in metres, PrintSize in M, Acuity in logMAR,
/// AcuityReserve as a ratio, VisualAngle in arcminutes), enums by name, and the core's option records as they are,
/// with their class named in a <c>$kind</c> property.
/// </summary>
/// <remarks>
/// Implementation note: System.Text.Json is part of the base library, so the converters could live in the optics
/// core without a package; they live here instead because how a plan is stored is the app's decision, and the core
/// stays free of storage concerns. Every concrete <see cref="MagnifierOption"/> in the core is registered by
/// reflection, so a new class of option is stored and read back with no change here; computed properties (those
/// with no setter and no constructor parameter, such as a reason's text) are not written.
/// </remarks>
public static class PlanJson
{
    public static JsonSerializerOptions Options { get; } = Create();

    public static string Write<T>(T value) => JsonSerializer.Serialize(value, Options);

    public static T Read<T>(string json) => JsonSerializer.Deserialize<T>(json, Options)
        ?? throw new InvalidOperationException("A saved plan could not be read.");

    private static JsonSerializerOptions Create()
    {
        var options = new JsonSerializerOptions
        {
            WriteIndented = false,
            NumberHandling = JsonNumberHandling.AllowNamedFloatingPointLiterals,
            TypeInfoResolver = new DefaultJsonTypeInfoResolver { Modifiers = { OptionClasses, SkipComputed } },
            Converters =
            {
                new JsonStringEnumConverter(),
                new NumberConverter<Power>(p => p.Dioptres, Power.FromDioptres),
                new NumberConverter<Distance>(d => d.Metres, Distance.FromMetres),
                new NumberConverter<PrintSize>(p => p.M, PrintSize.FromM),
                new NumberConverter<Acuity>(a => a.LogMar, Acuity.FromLogMar),
                new NumberConverter<AcuityReserve>(r => r.Ratio, AcuityReserve.FromRatio),
                new NumberConverter<VisualAngle>(a => a.Arcminutes, VisualAngle.FromArcminutes),
                new CautionConverter(),
                new StandConverter(),
            },
        };
        options.MakeReadOnly(populateMissingResolver: false);
        return options;
    }

    private static readonly Type[] OptionTypes =
        [.. typeof(MagnifierOption).Assembly.GetTypes().Where(t => t.IsSubclassOf(typeof(MagnifierOption)) && !t.IsAbstract).OrderBy(t => t.Name, StringComparer.Ordinal)];

    private static void OptionClasses(JsonTypeInfo info)
    {
        if (info.Type != typeof(MagnifierOption))
        {
            return;
        }

        info.PolymorphismOptions = new JsonPolymorphismOptions { TypeDiscriminatorPropertyName = "$kind" };
        foreach (var type in OptionTypes)
        {
            info.PolymorphismOptions.DerivedTypes.Add(new JsonDerivedType(type, type.Name));
        }
    }

    private static void SkipComputed(JsonTypeInfo info)
    {
        if (info.Kind != JsonTypeInfoKind.Object)
        {
            return;
        }

        for (var i = info.Properties.Count - 1; i >= 0; i--)
        {
            var property = info.Properties[i];
            if (property.Set is null && property.AssociatedParameter is null)
            {
                info.Properties.RemoveAt(i);
            }
        }
    }

    /// <summary>A core value type stored as one number in its invariant unit.</summary>
    private sealed class NumberConverter<T>(Func<T, double> toNumber, Func<double, T> fromNumber) : JsonConverter<T>
        where T : struct
    {
        public override T Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
        {
            var number = reader.TokenType == JsonTokenType.Number
                ? reader.GetDouble()
                : throw new JsonException($"A saved {typeof(T).Name} must be a number.");
            try
            {
                return fromNumber(number);
            }
            catch (ArgumentException e)
            {
                throw new JsonException($"A saved {typeof(T).Name} is out of range.", e);
            }
        }

        public override void Write(Utf8JsonWriter writer, T value, JsonSerializerOptions options) =>
            writer.WriteNumberValue(toNumber(value));
    }

    /// <summary>
    /// A stand magnifier stored by its image position and enlargement ratio, the two figures a maker states; its
    /// lens power and stand height are derived again on reading (equal to the stored ones within rounding).
    /// </summary>
    private sealed class StandConverter : JsonConverter<StandMagnifier>
    {
        public override StandMagnifier Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
        {
            var stored = JsonSerializer.Deserialize<StoredStand>(ref reader, options)
                ?? throw new JsonException("A saved stand magnifier is missing.");
            try
            {
                return StandMagnifier.FromImagePosition(stored.ImageBelowLens, stored.EnlargementRatio);
            }
            catch (ArgumentException e)
            {
                throw new JsonException("A saved stand magnifier is out of range.", e);
            }
        }

        public override void Write(Utf8JsonWriter writer, StandMagnifier value, JsonSerializerOptions options) =>
            JsonSerializer.Serialize(writer, new StoredStand(value.ImageBelowLens, value.EnlargementRatio), options);
    }

    private sealed record StoredStand(Distance ImageBelowLens, double EnlargementRatio);

    /// <summary>A caution stored by its stable identifier and read back as the core's caution of that identifier.</summary>
    private sealed class CautionConverter : JsonConverter<Caution>
    {
        private static readonly Dictionary<string, Caution> ById = typeof(Caution)
            .GetProperties(BindingFlags.Public | BindingFlags.Static)
            .Where(p => p.PropertyType == typeof(Caution))
            .Select(p => (Caution)p.GetValue(null)!)
            .ToDictionary(c => c.Id, StringComparer.Ordinal);

        public override Caution Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
            reader.GetString() is { } id && ById.TryGetValue(id, out var caution)
                ? caution
                : throw new JsonException("A saved plan names a caution this version does not know.");

        public override void Write(Utf8JsonWriter writer, Caution value, JsonSerializerOptions options) =>
            writer.WriteStringValue(value.Id);
    }
}
