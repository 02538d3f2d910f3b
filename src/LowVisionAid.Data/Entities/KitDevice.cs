using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Data.Entities;

/// <summary>A device in the clinic's own trial kit.</summary>
public sealed class KitDevice : IVersioned
{
    public int Id { get; set; }

    /// <summary>The clinic's stock code for the device.</summary>
    public required string Code { get; set; }

    public required string Name { get; set; }

    public DeviceKind Kind { get; set; }

    /// <summary>Equivalent power of the lens (or the add), when known.</summary>
    public Power? Power { get; set; }

    /// <summary>The "×" on the label, read only with its convention (a "×" alone is never a power).</summary>
    public double? LabelTimes { get; set; }

    public LabelConvention? LabelConvention { get; set; }

    /// <summary>Clear lens aperture.</summary>
    public Distance? Aperture { get; set; }

    /// <summary>Stand magnifier: page-to-lens height.</summary>
    public Distance? StandHeight { get; set; }

    /// <summary>Stand magnifier: image position below the lens (with the enlargement ratio).</summary>
    public Distance? ImageBelowLens { get; set; }

    public double? EnlargementRatio { get; set; }

    /// <summary>Telescopes and video magnifiers: magnification (for a video magnifier, its largest).</summary>
    public double? Magnification { get; set; }

    /// <summary>Near telescope: reading cap power.</summary>
    public Power? ReadingCap { get; set; }

    /// <summary>Telescope: angular field.</summary>
    public VisualAngle? Field { get; set; }

    /// <summary>Distance telescope: nearest focus.</summary>
    public Distance? FocusNearest { get; set; }

    public bool Illuminated { get; set; }

    public int InStock { get; set; }

    public string? Notes { get; set; }

    public bool IsDemo { get; set; }

    public Guid Version { get; set; }

    public DateTime CreatedUtc { get; set; }

    public DateTime UpdatedUtc { get; set; }
}
