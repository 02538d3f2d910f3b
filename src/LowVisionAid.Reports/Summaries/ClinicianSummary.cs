using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Reports.Summaries;

/// <summary>
/// Everything the clinician summary prints for the clinical record, as values already worked out by the plan.
/// </summary>
/// <param name="Clinic">The clinic's name and contact.</param>
/// <param name="ClientCode">The client's code.</param>
/// <param name="ClientName">The client's name, or null.</param>
/// <param name="AssessedOn">The date of the assessment.</param>
/// <param name="Clinician">Who assessed, or null.</param>
/// <param name="Inputs">The measurements and choices the plan started from, already formatted.</param>
/// <param name="Estimates">Each method's estimate of the equivalent power needed.</param>
/// <param name="ChosenOptions">The chosen device options; at least one.</param>
/// <param name="Trials">Trials and their outcomes, oldest first.</param>
/// <param name="MethodVersion">The version of the methods that produced the figures, e.g. "methods 2027.1".</param>
/// <param name="Paper">A4 or Letter.</param>
/// <param name="FigureTables">The trade-off figures' data tables to print with the record (from <see cref="Figures.TradeOffFigures"/>), or null.</param>
/// <param name="Eyes">Distance acuity of each eye (and both) as typed and as read, or null.</param>
/// <param name="Near">Near acuity as typed and as read, or null.</param>
/// <param name="ReadingCurve">The reading-speed curve and its results, or null when none was measured.</param>
/// <param name="HandoutReader">
/// The print the client reads comfortably, as the handout is given it; with <paramref name="HandoutMinimumPoints"/> the
/// summary says what size the handout is printed at and, for very large print, that other forms should be offered.
/// </param>
/// <param name="HandoutMinimumPoints">The clinic's smallest handout body size in points.</param>
public sealed record ClinicianSummary(
    ClinicContact Clinic,
    string ClientCode,
    string? ClientName,
    DateOnly AssessedOn,
    string? Clinician,
    IReadOnlyList<SummaryInput> Inputs,
    IReadOnlyList<MethodEstimate> Estimates,
    IReadOnlyList<ChosenOption> ChosenOptions,
    IReadOnlyList<TrialRecord> Trials,
    string MethodVersion,
    PaperSize Paper = PaperSize.A4,
    IReadOnlyList<Figures.FigureTable>? FigureTables = null,
    IReadOnlyList<EyeAcuity>? Eyes = null,
    NearAcuityRecord? Near = null,
    ReadingCurveRecord? ReadingCurve = null,
    Handouts.HandoutReader? HandoutReader = null,
    double HandoutMinimumPoints = Handouts.ClientHandout.DefaultBodyPoints);

/// <summary>One eye's distance acuity as the clinician typed it and as the plan read it.</summary>
/// <param name="Eye">Which eye, in words: "Right eye", "Left eye", "Both eyes".</param>
/// <param name="AsTyped">The entry exactly as typed, e.g. "6/60" or "CF at 1 m".</param>
/// <param name="AsRead">The acuity the plan understood, or null when the entry was not a chart acuity.</param>
public sealed record EyeAcuity(string Eye, string AsTyped, Acuity? AsRead);

/// <summary>Near acuity as typed and as read.</summary>
/// <param name="AsTyped">The entry exactly as typed, e.g. "N24 at 25 cm".</param>
/// <param name="Threshold">The smallest print read, in M.</param>
/// <param name="TestDistance">The distance it was read at.</param>
public sealed record NearAcuityRecord(string AsTyped, PrintSize Threshold, Distance TestDistance);

/// <summary>A measured reading-speed curve (MNREAD style, methods.md §2.5) and what the plan read from it.</summary>
/// <param name="TestDistance">The distance the sentences were read at.</param>
/// <param name="Points">Each print size read and its speed.</param>
/// <param name="CriticalPrint">The critical print size, or null when the curve gave none.</param>
/// <param name="MaximumReadingSpeed">The maximum reading speed in words a minute, or null.</param>
/// <param name="Refusal">Why the curve gave no result, or null.</param>
public sealed record ReadingCurveRecord(
    Distance TestDistance,
    IReadOnlyList<ReadingCurvePoint> Points,
    PrintSize? CriticalPrint,
    double? MaximumReadingSpeed,
    string? Refusal = null);

/// <summary>One sentence of a reading-speed test.</summary>
/// <param name="Print">Its print size.</param>
/// <param name="WordsPerMinute">The speed read.</param>
public sealed record ReadingCurvePoint(PrintSize Print, double WordsPerMinute);

/// <summary>A reason for or against an option's place in the plan.</summary>
/// <param name="Text">The reason in words.</param>
/// <param name="For">True when it counts for the option, false when against.</param>
public sealed record OptionReason(string Text, bool For);

/// <summary>One input as the record shows it, e.g. "Distance acuity" and "6/60 (logMAR 1.00)".</summary>
/// <param name="Label">What was measured or chosen.</param>
/// <param name="Value">The value as entered or formatted.</param>
public sealed record SummaryInput(string Label, string Value);

/// <summary>One published method's estimate of the equivalent power needed.</summary>
/// <param name="Method">The method's name, e.g. "Kestenbaum".</param>
/// <param name="EquivalentPower">The estimate, or null when the method could not be applied.</param>
/// <param name="Basis">What the estimate rests on, or why it is missing.</param>
/// <param name="DisagreesWithOthers">True when the plan flags it as more than 0.2 log units from another estimate.</param>
/// <param name="Reserve">The acuity reserve the estimate used, or null when it used none (the critical print size holds its own).</param>
public sealed record MethodEstimate(string Method, Power? EquivalentPower, string Basis, bool DisagreesWithOthers = false, AcuityReserve? Reserve = null);

/// <summary>A chosen device option with every figure the plan worked out for it and the reasons for it.</summary>
/// <param name="Name">The option's name.</param>
/// <param name="Kind">The kind of device, e.g. "Hand magnifier".</param>
/// <param name="EquivalentPower">Its equivalent power.</param>
/// <param name="WorkingDistance">Lens-to-page (or eye-to-page) working distance.</param>
/// <param name="Field">Linear field on the page (for a distance telescope, at the viewing distance), or null when not applicable.</param>
/// <param name="LettersInView">Letters of the target print in the field, or null.</param>
/// <param name="OtherFigures">Every other figure, already formatted.</param>
/// <param name="Reasons">Why it was chosen.</param>
/// <param name="Cautions">Cautions that apply to it.</param>
/// <param name="WeighedReasons">Its reasons labelled for or against; printed instead of <paramref name="Reasons"/> when given.</param>
/// <param name="Task">The task it was chosen for, or null.</param>
/// <param name="Family">The class of device, which words its field (on the page, or at the viewing distance); null reads as a near device.</param>
public sealed record ChosenOption(
    string Name,
    string Kind,
    Power EquivalentPower,
    Distance WorkingDistance,
    Distance? Field,
    int? LettersInView,
    IReadOnlyList<OptionFigure> OtherFigures,
    IReadOnlyList<string> Reasons,
    IReadOnlyList<string> Cautions,
    IReadOnlyList<OptionReason>? WeighedReasons = null,
    string? Task = null,
    OptionKind? Family = null);

/// <summary>A figure of an option, already formatted, e.g. "Depth of field" and "5.6 mm".</summary>
/// <param name="Label">What the figure is.</param>
/// <param name="Value">The figure with its unit.</param>
public sealed record OptionFigure(string Label, string Value);

/// <summary>One trial of a device.</summary>
/// <param name="Date">When it was tried.</param>
/// <param name="Device">What was tried.</param>
/// <param name="Task">With what material or task.</param>
/// <param name="Result">What the client achieved.</param>
/// <param name="Outcome">What was decided, e.g. "Dispensed".</param>
public sealed record TrialRecord(DateOnly Date, string Device, string Task, string Result, string Outcome);
