using System.Collections.Immutable;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Data.Entities;

/// <summary>The clinic's settings: one row, <see cref="SingletonId"/>.</summary>
public sealed class ClinicSettings : IVersioned
{
    public const int SingletonId = 1;

    public int Id { get; set; } = SingletonId;

    public required string ClinicName { get; set; }

    /// <summary>Address, phone or e-mail printed on handouts.</summary>
    public string? ClinicContact { get; set; }

    public UnitSystem Units { get; set; }

    public SnellenUnit SnellenIn { get; set; }

    public AcuityReserve SpotReserve { get; set; }

    public AcuityReserve FluentReserve { get; set; }

    public AcuityReserve SustainedReserve { get; set; }

    /// <summary>Mean character pitch ÷ x-height of the print, k (about 1.0–1.2 for serif text; 1.1 by default).</summary>
    public double CharacterPitch { get; set; }

    public PrintSize HandoutPrintSize { get; set; }

    /// <summary>
    /// The clinic's cost class for each kind of option where it differs from the optics core's default
    /// (<see cref="DeviceRanges.Costs"/>); empty when the clinic keeps every default.
    /// </summary>
    public IReadOnlyDictionary<OptionKind, CostClass> CostClasses { get; set; } = ImmutableDictionary<OptionKind, CostClass>.Empty;

    /// <summary>True while the invented demo clinic's records are loaded.</summary>
    public bool HasDemoData { get; set; }

    public Guid Version { get; set; }

    public DateTime CreatedUtc { get; set; }

    public DateTime UpdatedUtc { get; set; }
}

/// <summary>How distances are shown.</summary>
public enum UnitSystem
{
    Metric,
    Imperial,
}

/// <summary>How Snellen fractions are written: 6/x (metres) or 20/x (feet).</summary>
public enum SnellenUnit
{
    Metres,
    Feet,
}
