using System.Collections.Immutable;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Tests.Planning;

/// <summary>
/// An invented scenario (fictional clinic "Harbour Lane Low Vision Clinic", fictional client). Invented data is never a
/// check value on its own: the figures the tests expect are derived by hand from the cited formulas.
/// </summary>
public static class InventedClinic
{
    /// <summary>
    /// Client "H. Marlow" (invented): sustained reading of 1M newsprint at a preferred 40 cm; required equivalent power
    /// +10 D; no usable accommodation; distance refraction +1.00 D; wears a +2.50 add; two useful eyes; PD 64 mm;
    /// logCS 1.20; no tremor; no stated wish for hands-free use.
    /// </summary>
    public static PlanRequest SustainedReadingRequest(ImmutableArray<KitDevice> kit) => new()
    {
        RequiredPower = Power.FromDioptres(10),
        TargetPrint = PrintSize.FromM(1),
        PreferredDistance = Distance.FromCentimetres(40),
        Task = ReadingTask.SustainedReading,
        Constraints = new ClientConstraints
        {
            UsableAccommodation = Power.Zero,
            DistanceRefraction = Power.FromDioptres(1),
            AddWorn = Power.FromDioptres(2.5),
            UsefulEyes = 2,
            LogContrastSensitivity = 1.20,
            InterpupillaryDistance = Distance.FromMillimetres(64),
        },
        Kit = kit,
    };

    /// <summary>The clinic's ten devices (invented).</summary>
    public static ImmutableArray<KitDevice> TenDevices { get; } =
    [
        new() { Id = "SA-10", Name = "Reading spectacles +10 D", Kind = DeviceKind.SpectacleAdd, Power = Power.FromDioptres(10) },
        new() { Id = "SA-6", Name = "Reading spectacles +6 D", Kind = DeviceKind.SpectacleAdd, Power = Power.FromDioptres(6) },
        new() { Id = "H-12", Name = "Hand lens 12 D, 50 mm", Kind = DeviceKind.HandMagnifier, Power = Power.FromDioptres(12), Aperture = Distance.FromMillimetres(50) },
        new() { Id = "H-8", Name = "Hand lens labelled 3× (trade)", Kind = DeviceKind.HandMagnifier, Label = new KitLabel(3, LabelConvention.Trade), Aperture = Distance.FromMillimetres(70) },
        new() { Id = "S-20", Name = "Stand 20 D, image 10 cm", Kind = DeviceKind.StandMagnifier, ImageBelowLens = Distance.FromCentimetres(10), EnlargementRatio = 3, Aperture = Distance.FromMillimetres(45) },
        new() { Id = "S-12", Name = "Illuminated stand 12 D", Kind = DeviceKind.StandMagnifier, Power = Power.FromDioptres(12), StandHeight = Distance.FromCentimetres(6.25), Aperture = Distance.FromMillimetres(50), Illuminated = true },
        new() { Id = "T-4", Name = "Near telescope 4× with +2.50 cap", Kind = DeviceKind.NearTelescope, Magnification = 4, ReadingCap = Power.FromDioptres(2.5) },
        new() { Id = "T-3", Name = "Near telescope 3× with +4.00 cap", Kind = DeviceKind.NearTelescope, Magnification = 3, ReadingCap = Power.FromDioptres(4) },
        new() { Id = "V-1", Name = "Desktop video magnifier up to 40×", Kind = DeviceKind.VideoMagnifier, Magnification = 40 },
        new() { Id = "D-4", Name = "Distance telescope 4×", Kind = DeviceKind.DistanceTelescope, Magnification = 4 },
    ];
}
