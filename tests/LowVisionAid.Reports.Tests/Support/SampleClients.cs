using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Handouts;

namespace LowVisionAid.Reports.Tests.Support;

/// <summary>
/// Four invented clients with different print needs, each with the handout a clinic would give them. Inputs only:
/// the tests check what is printed against the client's need through cited formulas, never against these values.
/// </summary>
internal static class SampleClients
{
    /// <summary>A client, the print she needs at the handout's distance (worked by hand), and her handout.</summary>
    /// <param name="Name">A short label for test output.</param>
    /// <param name="NeededM">The print needed at the reading distance, derived by hand in the comment beside each client.</param>
    /// <param name="Handout">The handout.</param>
    public sealed record Client(string Name, double NeededM, ClientHandout Handout)
    {
        public override string ToString() => Name;
    }

    public static IReadOnlyList<Client> All { get; } = [Ada, Bryn, Cerys, Dai, Elin, Fflur];

    public static TheoryData<string> Names => [.. All.Select(c => c.Name)];

    public static Client Named(string name) => All.Single(c => c.Name == name);

    // 0.8M read at 40 cm with reading glasses; fluent reserve 2:1 (methods.md §2.3) gives 1.6M at 40 cm, read at
    // 40 cm: 1.6M. Strong reading glasses for her letters, a wide field (the plan counted 225 letters).
    private static Client Ada => new("Ada", 1.6, Base("AD-0101", "Ada Pengelly") with
    {
        Devices =
        [
            new HandoutDevice(
                "Reading glasses, +4.00 D", DeviceWording.WhatItIs(OptionKind.SpectacleAdd), "Reading letters from the bank",
                DeviceWording.HowToUse(OptionKind.SpectacleAdd),
                [new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.SpectacleAdd), Distance.FromCentimetres(25))],
                View: new HandoutView(Distance.FromCentimetres(28.8), 225, PrintSize.FromM(1.0)),
                Kind: OptionKind.SpectacleAdd, ReadingAdd: Power.FromDioptres(4)),
        ],
        Reader = new HandoutReader(Distance.FromCentimetres(40), Distance.FromCentimetres(40), Threshold: PrintSize.FromM(0.8)),
    });

    // Critical print size 2.5M at 25 cm (reading curve), handout read at 25 cm: 2.5M. A stand magnifier used with a
    // +3.00 D add; the hand magnifier she tried was declined.
    private static Client Bryn => new("Bryn", 2.5, Base("BR-0202", "Bryn Trelawny") with
    {
        Devices =
        [
            new HandoutDevice(
                "Hand magnifier, +10 D", DeviceWording.WhatItIs(OptionKind.HandMagnifier), "Reading recipes",
                DeviceWording.HowToUse(OptionKind.HandMagnifier),
                [new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.HandMagnifier), Distance.FromCentimetres(10))],
                Kind: OptionKind.HandMagnifier, TrialDeclined: true),
            new HandoutDevice(
                "Stand magnifier, +16 D", DeviceWording.WhatItIs(OptionKind.StandMagnifier), "Reading the parish newsletter",
                DeviceWording.HowToUse(OptionKind.StandMagnifier),
                [
                    new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.StandMagnifier), Distance.FromCentimetres(4.5)),
                    new HandoutDistance(DeviceWording.EyeToLens, Distance.FromCentimetres(20)),
                ],
                View: new HandoutView(Distance.FromMillimetres(30), 12, PrintSize.FromM(1.0)),
                Kind: OptionKind.StandMagnifier, ReadingAdd: Power.FromDioptres(3)),
        ],
        Reader = new HandoutReader(Distance.FromCentimetres(25), Distance.FromCentimetres(25), CriticalPrint: PrintSize.FromM(2.5)),
        TargetPrint = PrintSize.FromM(1.0),
    });

    // Critical print size 8M at 25 cm, handout read at 25 cm: 8M, about 66 pt in this face: more than paper holds.
    // A desktop video magnifier at 25 cm with a +4.00 D add (1/0.25 m; methods.md §1.2, Colenbrander's D).
    private static Client Cerys => new("Cerys", 8, Base("CE-0303", "Cerys Hocking") with
    {
        Devices =
        [
            new HandoutDevice(
                "Desktop video magnifier", DeviceWording.WhatItIs(OptionKind.VideoMagnifier), "Reading letters and bills",
                DeviceWording.HowToUse(OptionKind.VideoMagnifier),
                [new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.VideoMagnifier), Distance.FromCentimetres(25))],
                HasLightOrBattery: true, Kind: OptionKind.VideoMagnifier, ReadingAdd: Power.FromDioptres(4)),
        ],
        Care = [],
        Reader = new HandoutReader(Distance.FromCentimetres(25), Distance.FromCentimetres(25), CriticalPrint: PrintSize.FromM(8)),
        TargetPrint = PrintSize.FromM(1.6),
    });

    // 2.0M read at 40 cm; reserve 2:1 gives 4.0M at 40 cm; the handout is read at 25 cm: 4.0 × 25/40 = 2.5M.
    // A hand magnifier with the distance glasses (22 letters in view) and a telescope for the television; Letter paper.
    private static Client Dai => new("Dai", 2.5, Base("DA-0404", "Dai Rowe") with
    {
        Devices =
        [
            new HandoutDevice(
                "Hand magnifier with a light, +12 D", DeviceWording.WhatItIs(OptionKind.HandMagnifier), "Reading medicine labels",
                DeviceWording.HowToUse(OptionKind.HandMagnifier),
                [
                    new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.HandMagnifier), Distance.FromCentimetres(8.3)),
                    new HandoutDistance(DeviceWording.EyeToLens, Distance.FromCentimetres(25)),
                ],
                HasLightOrBattery: true,
                View: new HandoutView(Distance.FromMillimetres(35.4), 22, PrintSize.FromM(1.0)),
                Kind: OptionKind.HandMagnifier),
            new HandoutDevice(
                "Telescope, 4×", DeviceWording.WhatItIs(OptionKind.DistanceTelescope), "Watching the television",
                DeviceWording.HowToUse(OptionKind.DistanceTelescope),
                [new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.DistanceTelescope), Distance.FromMetres(2.5))],
                Kind: OptionKind.DistanceTelescope),
        ],
        Reader = new HandoutReader(Distance.FromCentimetres(40), Distance.FromCentimetres(25), Threshold: PrintSize.FromM(2.0)),
        Paper = PaperSize.Letter,
    });

    // 4.0M read at 40 cm; reserve 2:1 gives 8.0M at 40 cm, read at 40 cm: 8M, about 66 pt: more than paper holds,
    // so the short version. Two hand magnifiers (a newspaper and medicine labels), as a clinic often gives an older
    // reader with macular degeneration; the shape of the demo clinic's first plan, whose handout ran to 38 pages.
    private static Client Elin => new("Elin", 8, Base("EL-0505", "Elin Penrose") with
    {
        Devices =
        [
            new HandoutDevice(
                "Hand magnifier, +20 D, 45 mm", DeviceWording.WhatItIs(OptionKind.HandMagnifier), "Reading the local weekly paper",
                DeviceWording.HowToUse(OptionKind.HandMagnifier),
                [
                    new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.HandMagnifier), Distance.FromCentimetres(5)),
                    new HandoutDistance(DeviceWording.EyeToLens, Distance.FromCentimetres(25)),
                ],
                View: new HandoutView(Distance.FromMillimetres(8), 5, PrintSize.FromM(1.0)),
                Kind: OptionKind.HandMagnifier),
            new HandoutDevice(
                "Hand magnifier with a light, +12 D, 60 mm", DeviceWording.WhatItIs(OptionKind.HandMagnifier), "Reading medicine labels",
                DeviceWording.HowToUse(OptionKind.HandMagnifier),
                [
                    new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.HandMagnifier), Distance.FromCentimetres(8.3)),
                    new HandoutDistance(DeviceWording.EyeToLens, Distance.FromCentimetres(25)),
                ],
                HasLightOrBattery: true,
                Kind: OptionKind.HandMagnifier),
        ],
        Reader = new HandoutReader(Distance.FromCentimetres(40), Distance.FromCentimetres(40), Threshold: PrintSize.FromM(4.0)),
    });

    // Critical print size 3.2M at 40 cm, handout read at 40 cm: 3.2M, about 27 pt. The two classes issue 10 added:
    // telescope glasses for the television and the tablet's own text size, 250 % with light letters on dark (her
    // contrast is poor), at 40 cm with a +2.50 D add (1/0.40 m; methods.md §1.2).
    private static Client Fflur => new("Fflur", 3.2, Base("FF-0606", "Fflur Angove") with
    {
        Devices =
        [
            new HandoutDevice(
                "Telescope glasses, 3×", DeviceWording.WhatItIs(OptionKind.SpectacleTelescope), "Watching the television",
                DeviceWording.HowToUse(OptionKind.SpectacleTelescope),
                [new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.SpectacleTelescope), Distance.FromMetres(3))],
                Kind: OptionKind.SpectacleTelescope),
            new HandoutDevice(
                "Tablet text size and zoom", DeviceWording.WhatItIs(OptionKind.ScreenMagnification), "Reading messages on the tablet",
                DeviceWording.HowToUse(OptionKind.ScreenMagnification, Screen),
                [new HandoutDistance(DeviceWording.DistanceWhat(OptionKind.ScreenMagnification), Distance.FromCentimetres(40))],
                Kind: OptionKind.ScreenMagnification, ReadingAdd: Power.FromDioptres(2.5), Screen: Screen),
        ],
        Reader = new HandoutReader(Distance.FromCentimetres(40), Distance.FromCentimetres(40), CriticalPrint: PrintSize.FromM(3.2)),
    });

    /// <summary>Fflur's tablet setting: 250 % with light letters on dark.</summary>
    public static HandoutScreen Screen => new(250, ReversedPolarity: true);

    private static ClientHandout Base(string code, string name) => SampleModels.Handout() with
    {
        ClientCode = code,
        ClientName = name,
        Care = [],
        Light = ["Use a good lamp that shines on the page, not into your eyes.", "Avoid glare from windows and shiny paper."],
        Practice = ["Practise for 10 minutes twice a day for the first two weeks.", "Stop and rest your eyes when they feel tired."],
        IfItStopsHelping = ["Check that the light is good and that you use it as this sheet shows.", "If it still does not help, call the clinic: your needs may have changed."],
    };
}
