using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Summaries;

namespace LowVisionAid.Web.Handouts;

/// <summary>
/// What the reports need from one saved plan, read from the plan as it was stored (its outputs, the method version
/// and its trials) together with the client and the clinic settings. Typed values only where a figure is drawn.
/// </summary>
public sealed record PlanReportData(
    int PlanId,
    string ClientCode,
    string? ClientName,
    DateOnly AssessedOn,
    string? Clinician,
    string MethodVersion,
    ClinicContact Clinic,
    PaperSize Paper,
    double BodyPoints,
    bool Imperial,
    DateOnly IssuedOn,
    DateOnly? FollowUpOn,
    IReadOnlyList<SummaryInput> Inputs,
    IReadOnlyList<MethodEstimate> Estimates,
    IReadOnlyList<ReportOption> Chosen,
    IReadOnlyList<string> PlanCautions,
    IReadOnlyList<TrialRecord> Trials,
    HandoutReader? Reader = null,
    IReadOnlyList<EyeAcuity>? Eyes = null,
    NearAcuityRecord? Near = null,
    ReadingCurveRecord? ReadingCurve = null)
{
    /// <summary>True when at least one option was chosen (on the plan page, or by a trial that ended dispensed, loaned or ordered).</summary>
    public bool HasChosenOption => Chosen.Count > 0;
}

/// <summary>A chosen option: the device the client takes home, with the plan's figures for it.</summary>
/// <param name="Name">What the client calls it (the kit device's name, or the kind of option).</param>
/// <param name="Family">The kind of device, for the plain-language wording.</param>
/// <param name="KindLabel">The kind as the plan shows it.</param>
/// <param name="Task">The goal it is for, e.g. "Newspaper".</param>
/// <param name="Target">The print the client wants to read for that goal.</param>
/// <param name="Threshold">The smallest print read at the near test, or null.</param>
/// <param name="Reserve">The acuity reserve the plan used for that goal.</param>
/// <param name="TestDistance">The near test distance, or null.</param>
/// <param name="EquivalentPower">Power given, as the plan stored it.</param>
/// <param name="WorkingDistance">Working distance, as the plan stored it.</param>
/// <param name="EyeToLens">Eye-to-lens distance, or null.</param>
/// <param name="Field">Field on the page (for a distance telescope, at the viewing distance), or null.</param>
/// <param name="LettersInView">Letters of the target print in view, or null.</param>
/// <param name="HasLightOrBattery">True for lit or electronic devices.</param>
/// <param name="Figures">Every figure the plan stored for it, as shown on the plan page.</param>
/// <param name="Reasons">The plan's reasons for its position.</param>
/// <param name="Notes">The plan's notes on it (limits, fluency).</param>
/// <param name="ChosenBy">How it came to be chosen.</param>
/// <param name="Declined">True when its latest trial ended declined (the handout leaves it out and says so).</param>
/// <param name="TrialTask">The task its trial was for (e.g. "letters and bills"), printed instead of the goal's task.</param>
/// <param name="AddNeeded">The reading add to wear with it, or null for the distance glasses.</param>
/// <param name="WeighedReasons">Its reasons labelled for or against, or null.</param>
/// <param name="Screen">For screen magnification, the zoom and polarity the plan worked out; null otherwise.</param>
public sealed record ReportOption(
    string Name,
    OptionKind Family,
    string KindLabel,
    string Task,
    PrintSize Target,
    PrintSize? Threshold,
    AcuityReserve Reserve,
    Distance? TestDistance,
    Power EquivalentPower,
    Distance WorkingDistance,
    Distance? EyeToLens,
    Distance? Field,
    int? LettersInView,
    bool HasLightOrBattery,
    IReadOnlyList<OptionFigure> Figures,
    IReadOnlyList<string> Reasons,
    IReadOnlyList<string> Notes,
    ChosenBy ChosenBy = ChosenBy.Clinician,
    bool Declined = false,
    string? TrialTask = null,
    Power? AddNeeded = null,
    IReadOnlyList<OptionReason>? WeighedReasons = null,
    HandoutScreen? Screen = null);

/// <summary>How an option came to be in the handout.</summary>
public enum ChosenBy
{
    /// <summary>The clinician chose it for the handout on the plan page.</summary>
    Clinician,

    /// <summary>No choice was made for its goal, and a trial of it ended dispensed, loaned or ordered.</summary>
    Trial,
}
