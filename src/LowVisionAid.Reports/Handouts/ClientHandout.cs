using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Reports.Handouts;

/// <summary>
/// Everything the large-print client handout prints, as plain values already worked out by the plan.
/// Lists hold short sentences in plain language, one instruction each.
/// </summary>
/// <param name="Clinic">The clinic's name and contact, printed at the top and the end.</param>
/// <param name="ClientCode">The client's code (always printed).</param>
/// <param name="ClientName">The client's name, or null to print the code only.</param>
/// <param name="IssuedOn">The day the handout is given.</param>
/// <param name="FollowUpOn">The follow-up date, or null when none is booked yet.</param>
/// <param name="Devices">The chosen device or devices; at least one.</param>
/// <param name="Light">Advice on lighting.</param>
/// <param name="Practice">A short practice routine.</param>
/// <param name="Care">How to look after the device.</param>
/// <param name="IfItStopsHelping">What to do if it stops helping.</param>
/// <param name="TargetPrint">The print size the client wants to read; one line is printed at this size.</param>
/// <param name="BodyPoints">
/// The clinic's smallest body text size in points (18 by default, 24 or more on request). The handout prints larger
/// when <paramref name="Reader"/> needs it (see <see cref="HandoutPrint"/>).
/// </param>
/// <param name="Paper">A4 or Letter.</param>
/// <param name="Reader">What print the client reads comfortably, or null when it was not measured.</param>
public sealed record ClientHandout(
    ClinicContact Clinic,
    string ClientCode,
    string? ClientName,
    DateOnly IssuedOn,
    DateOnly? FollowUpOn,
    IReadOnlyList<HandoutDevice> Devices,
    IReadOnlyList<string> Light,
    IReadOnlyList<string> Practice,
    IReadOnlyList<string> Care,
    IReadOnlyList<string> IfItStopsHelping,
    PrintSize TargetPrint,
    double BodyPoints = ClientHandout.DefaultBodyPoints,
    PaperSize Paper = PaperSize.A4,
    HandoutReader? Reader = null)
{
    /// <summary>The default body size, 18 pt (large print).</summary>
    public const double DefaultBodyPoints = 18;

    /// <summary>The larger body size offered on request, 24 pt.</summary>
    public const double LargerBodyPoints = 24;

    /// <summary>The largest body size accepted, 48 pt.</summary>
    public const double MaximumBodyPoints = 48;

    /// <summary>Smallest target print accepted for the check line, in M units.</summary>
    public const double MinimumTargetM = 0.4;

    /// <summary>Largest target print accepted for the check line, in M units.</summary>
    public const double MaximumTargetM = 10;

    /// <summary>The devices the handout describes: every device but those declined at their trial.</summary>
    public IReadOnlyList<HandoutDevice> DevicesToPrint => [.. Devices.Where(d => d is { TrialDeclined: false })];

    /// <summary>The cautions for <see cref="DevicesToPrint"/> (<see cref="HandoutWording.CautionsFor"/>).</summary>
    public IReadOnlyList<string> CautionsToPrint => HandoutWording.CautionsFor(DevicesToPrint);

    /// <summary>"Looking after it": <see cref="Care"/>, then the care each class of device printed needs, once each.</summary>
    public IReadOnlyList<string> CareToPrint =>
        [.. Care.Concat(DevicesToPrint.Where(d => d.Kind is not null).SelectMany(d => DeviceWording.Care(d.Kind!.Value))).Distinct()];
}

/// <summary>One chosen device, described for the client.</summary>
/// <param name="Name">What to call it, e.g. "Hand magnifier with a light".</param>
/// <param name="WhatItIs">One or two plain sentences on what it is.</param>
/// <param name="Task">The task it is for, e.g. "Reading letters and bills".</param>
/// <param name="HowToUse">Steps for holding or setting it.</param>
/// <param name="Distances">The distances to keep, each printed in centimetres and inches.</param>
/// <param name="HasLightOrBattery">True for illuminated or electronic devices (adds the charging caution).</param>
/// <param name="View">What the client sees through it at once (drawn to size with its text equivalent), or null.</param>
/// <param name="Kind">
/// The class of device. It decides the care and safety text (no lens care or sunlight warning for a video
/// magnifier) and how the glasses are worded; null prints every caution, as for an optical magnifier.
/// </param>
/// <param name="ReadingAdd">
/// The reading glasses (add) to wear with it, e.g. +3.00 D for a stand magnifier or +4.00 D for a screen at 25 cm;
/// null or zero when it is used with the distance glasses (or none).
/// </param>
/// <param name="TrialDeclined">True when the client's trial of it ended declined: it is left out of the handout.</param>
/// <param name="Screen">For screen magnification, the zoom and polarity the plan worked out; null otherwise.</param>
public sealed record HandoutDevice(
    string Name,
    string WhatItIs,
    string Task,
    IReadOnlyList<string> HowToUse,
    IReadOnlyList<HandoutDistance> Distances,
    bool HasLightOrBattery = false,
    HandoutView? View = null,
    OptionKind? Kind = null,
    Power? ReadingAdd = null,
    bool TrialDeclined = false,
    HandoutScreen? Screen = null);

/// <summary>The built-in screen setting the plan worked out (the core's <c>ScreenMagnificationOption</c>).</summary>
/// <param name="ZoomPercent">The text size or zoom, per cent of the text as it is now.</param>
/// <param name="ReversedPolarity">True when light letters on a dark background are advised (poor contrast or light).</param>
public sealed record HandoutScreen(double ZoomPercent, bool ReversedPolarity);

/// <summary>
/// The print the client reads comfortably, from which the handout's body size follows: the critical print size
/// (MNREAD, methods.md §2.5) when a reading curve was measured, otherwise the threshold times the fluent reserve
/// (2:1, methods.md §2.3), each moved from the test distance to the distance the client holds the handout.
/// </summary>
/// <param name="TestDistance">Where the near print was measured.</param>
/// <param name="ReadingDistance">Where the client holds the handout to read it (often the same distance).</param>
/// <param name="CriticalPrint">The critical print size at the test distance, or null.</param>
/// <param name="Threshold">The smallest print read at the test distance, or null.</param>
/// <param name="FluentReserve">The reserve applied to the threshold; 2:1 when null.</param>
public sealed record HandoutReader(
    Distance TestDistance,
    Distance ReadingDistance,
    PrintSize? CriticalPrint = null,
    PrintSize? Threshold = null,
    AcuityReserve? FluentReserve = null);

/// <summary>
/// What the client sees through the device at once, for the handout's to-scale window: the field on the page and
/// how many letters of the target print fit in it (the plan's own count, never recomputed here).
/// </summary>
/// <param name="Field">The width of the page seen through the device.</param>
/// <param name="LettersInView">Letters of <paramref name="Target"/> in that width, as the plan counted them.</param>
/// <param name="Target">The print the client wants to read with this device.</param>
public sealed record HandoutView(Distance Field, int LettersInView, PrintSize Target);

/// <summary>A distance the client keeps, e.g. "Lens to page" and 8 cm.</summary>
/// <param name="What">What the distance is between, in plain words.</param>
/// <param name="Distance">The distance (a positive magnitude).</param>
public sealed record HandoutDistance(string What, Distance Distance);
