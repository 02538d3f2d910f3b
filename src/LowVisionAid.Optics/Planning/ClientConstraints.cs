using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Planning;

/// <summary>
/// What limits the choice of device for this client. All numbers, no text. Immutable. The default instance is a
/// client with two useful eyes, no tremor, no wish for hands-free use, no usable accommodation, emmetropic, no add.
/// </summary>
public sealed record ClientConstraints
{
    /// <summary>A client with no stated constraints (see the type's summary).</summary>
    public static ClientConstraints None { get; } = new();

    /// <summary>The client wants both hands free.</summary>
    public bool HandsFreeWanted { get; init; }

    /// <summary>The client has a tremor or cannot hold a lens steady.</summary>
    public bool Tremor { get; init; }

    /// <summary>Number of eyes with useful vision: 1 or 2. Binocular options need 2.</summary>
    public int UsefulEyes { get; init; } = 2;

    /// <summary>
    /// Accommodation the client can sustain for near work (already the usable part, about half the amplitude),
    /// or null to estimate it from <see cref="AgeYears"/>. A measured value is preferred.
    /// </summary>
    public Power? UsableAccommodation { get; init; }

    /// <summary>Age in whole years, used only when <see cref="UsableAccommodation"/> is not given.</summary>
    public int? AgeYears { get; init; }

    /// <summary>Distance refraction as a spherical equivalent (negative for myopia). Default 0 D.</summary>
    public Power DistanceRefraction { get; init; }

    /// <summary>The reading add in the client's present spectacles, or null if none.</summary>
    public Power? AddWorn { get; init; }

    /// <summary>Letter contrast sensitivity in logCS (Pelli-Robson style), or null if not measured.</summary>
    public double? LogContrastSensitivity { get; init; }

    /// <summary>
    /// The client's home lighting for the task is dim or poor (asked at the visit). Illuminated devices and video
    /// magnifiers then rank higher (methods §7.6, §11; common practice). Default false.
    /// </summary>
    public bool DimLighting { get; init; }

    /// <summary>Distance interpupillary distance. Default 64 mm.</summary>
    public Distance InterpupillaryDistance { get; init; } = Distance.FromMillimetres(64);
}
