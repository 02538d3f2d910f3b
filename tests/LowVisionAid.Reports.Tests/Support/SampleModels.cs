using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Summaries;

namespace LowVisionAid.Reports.Tests.Support;

/// <summary>
/// An invented scenario (a fictional clinic and client) used to drive the renderers. These are inputs only,
/// never check values: the checks compare what is printed with what was passed in, or with cited formulas.
/// </summary>
internal static class SampleModels
{
    // 01632 960xxx is a UK range set aside for fiction; ".example" is reserved (RFC 2606).
    public static readonly ClinicContact Clinic = new(
        "Harbourside Low Vision Clinic", "01632 960 418", "reception@harbourside-clinic.example", "4 Quay Street, Porthaven");

    public static HandoutDevice HandMagnifier { get; } = new(
        "Hand magnifier with a light, +12 D",
        "A round lens with a handle and a small lamp. It makes print look bigger.",
        "Reading letters, bills and labels at the kitchen table",
        [
            "Wear your distance glasses, not your reading glasses.",
            "Put the lens flat on the page, then lift it slowly until the print is clear.",
            "Keep your eye close to the lens to see more words at once.",
        ],
        [
            new HandoutDistance("Lens above the page", Distance.FromCentimetres(8)),
            new HandoutDistance("Your eye above the lens", Distance.FromCentimetres(5)),
        ],
        HasLightOrBattery: true);

    public static HandoutDevice StandMagnifier { get; } = new(
        "Stand magnifier, +20 D",
        "A lens on legs that rests on the page, so you do not need to hold it steady.",
        "Reading the newspaper in your chair",
        ["Wear your reading glasses.", "Slide the stand along each line."],
        [new HandoutDistance("Your eye above the lens", Distance.FromCentimetres(15))]);

    public static ClientHandout Handout(double bodyPoints = 18, PaperSize paper = PaperSize.A4, double targetM = 1.0,
        IReadOnlyList<HandoutDevice>? devices = null) => new(
        Clinic,
        "HX-0042",
        "Morwenna Tredinnick",
        new DateOnly(2027, 3, 9),
        new DateOnly(2027, 4, 20),
        devices ?? [HandMagnifier],
        ["Sit with the lamp behind you, shining on the page.", "Keep the lamp out of your eyes."],
        ["Practise for 10 minutes, two or three times a day.", "Start with large print, then try your letters.", "Rest your eyes when they feel tired."],
        ["Clean the lens with the soft cloth.", "Keep it in its case when you are not using it."],
        ["Call the clinic: your sight or your glasses may have changed.", "Do not buy a stronger magnifier before you talk to us."],
        PrintSize.FromM(targetM),
        bodyPoints,
        paper);

    public static ClinicianSummary Summary(IReadOnlyList<ChosenOption>? chosen = null) => new(
        Clinic,
        "HX-0042",
        "Morwenna Tredinnick",
        new DateOnly(2027, 3, 9),
        "A. Penrose, optometrist",
        [
            new SummaryInput("Distance acuity", "6/60 (logMAR 1.00)"),
            new SummaryInput("Near threshold", "4.0M at 40 cm"),
            new SummaryInput("Target print", "1.0M (newsprint)"),
            new SummaryInput("Acuity reserve", "2:1 (fluent reading)"),
        ],
        [
            new MethodEstimate("Kestenbaum", Power.FromDioptres(10), "1M at threshold, no reserve"),
            new MethodEstimate("Near threshold with reserve", Power.FromDioptres(20), "4.0M at 40 cm, target 1.0M, reserve 2:1", DisagreesWithOthers: true),
            new MethodEstimate("Critical print size", null, "No reading-speed curve was measured"),
        ],
        chosen ??
        [
            new ChosenOption(
                "Hand magnifier with a light, +12 D",
                "Hand magnifier",
                Power.FromDioptres(12),
                Distance.FromCentimetres(8.3),
                Distance.FromMillimetres(55),
                34,
                [new OptionFigure("Depth of field", "5.6 mm"), new OptionFigure("Lens diameter", "50 mm")],
                ["Meets the 2:1 reserve for 1.0M at the client's preferred table height.", "Light helps with reduced contrast sensitivity."],
                ["Short working distance: use a reading stand."]),
        ],
        [
            new TrialRecord(new DateOnly(2027, 3, 9), "Hand magnifier with a light, +12 D", "Newspaper column", "Read 1.0M at 80 words a minute", "Dispensed"),
            new TrialRecord(new DateOnly(2027, 3, 9), "Stand magnifier, +20 D", "Newspaper column", "Read 0.8M, found the stand tiring", "Not chosen"),
        ],
        "methods 2027.1");
}
