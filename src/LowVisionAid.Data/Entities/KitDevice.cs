using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Data.Entities;

/// <summary>A device in the clinic's own trial kit.</summary>
public sealed class KitDevice : IVersioned
{
    public int Id { get; set; }

    /// <summary>The clinic's stock code for the device.</summary>
    public required string Code { get; set; }

    public required string Name { get; set; }

    public KitDeviceKind Kind { get; set; }

    /// <summary>Equivalent power of the lens, when it has one.</summary>
    public Power? Power { get; set; }

    /// <summary>Lens diameter (or screen width for a video magnifier).</summary>
    public Distance? Aperture { get; set; }

    /// <summary>For a video magnifier: its magnification range as typed (e.g. "3–20×").</summary>
    public string? MagnificationRange { get; set; }

    public bool Illuminated { get; set; }

    public int InStock { get; set; }

    public string? Notes { get; set; }

    public bool IsDemo { get; set; }

    public Guid Version { get; set; }

    public DateTime CreatedUtc { get; set; }

    public DateTime UpdatedUtc { get; set; }
}

/// <summary>The kinds of device a kit holds.</summary>
public enum KitDeviceKind
{
    SpectacleAdd,
    HandMagnifier,
    StandMagnifier,
    NearTelescope,
    DistanceTelescope,
    VideoMagnifier,
    Other,
}
