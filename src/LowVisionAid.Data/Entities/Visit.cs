using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Data.Entities;

/// <summary>
/// One assessment. Every measurement keeps what the clinician typed (<c>…Text</c>) beside the value the optics
/// core read from it, so the record shows the original notation and calculations use the invariant value.
/// </summary>
public sealed class Visit : IVersioned
{
    public int Id { get; set; }

    public int ClientId { get; set; }

    public Client? Client { get; set; }

    public DateOnly VisitDate { get; set; }

    public string? Practitioner { get; set; }

    public string? DistanceRightText { get; set; }

    public Acuity? DistanceRight { get; set; }

    public string? DistanceLeftText { get; set; }

    public Acuity? DistanceLeft { get; set; }

    public string? DistanceBothText { get; set; }

    public Acuity? DistanceBoth { get; set; }

    /// <summary>The smallest print read at near, as typed (e.g. "2.5M", "N20").</summary>
    public string? NearThresholdText { get; set; }

    public PrintSize? NearThreshold { get; set; }

    public string? NearTestDistanceText { get; set; }

    public Distance? NearTestDistance { get; set; }

    /// <summary>Contrast sensitivity as typed (e.g. "1.05 logCS").</summary>
    public string? ContrastSensitivityText { get; set; }

    /// <summary>Letter contrast sensitivity in log units (Pelli-Robson style), when one was typed.</summary>
    public double? ContrastLogCs { get; set; }

    /// <summary>The refraction the client wears, free text as written in the notes.</summary>
    public string? RefractionWorn { get; set; }

    public string? AddWornText { get; set; }

    public Power? AddWorn { get; set; }

    public string? AccommodationText { get; set; }

    /// <summary>Measured amplitude of accommodation; null when it should be estimated from age.</summary>
    public Power? AccommodationMeasured { get; set; }

    public string? WorkingDistanceText { get; set; }

    public Distance? WorkingDistance { get; set; }

    public bool NeedsHandsFree { get; set; }

    public bool HasTremor { get; set; }

    public UsefulEyes UsefulEyes { get; set; }

    public HomeLighting HomeLighting { get; set; }

    public string? Notes { get; set; }

    public List<VisitGoal> Goals { get; } = [];

    public List<ReadingSpeed> ReadingSpeeds { get; } = [];

    public List<Plan> Plans { get; } = [];

    public Guid Version { get; set; }

    public DateTime CreatedUtc { get; set; }

    public DateTime UpdatedUtc { get; set; }
}

/// <summary>Which eyes are useful for the task.</summary>
public enum UsefulEyes
{
    Both,
    RightOnly,
    LeftOnly,
}

/// <summary>The client's account of the lighting where they will use the device.</summary>
public enum HomeLighting
{
    NotAsked,
    Good,
    Dim,
    Poor,
}
