using System.Globalization;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Summaries;
using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Web.Plans;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Handouts;

/// <summary>
/// Reads a saved plan for the reports: its typed outputs (the planner's figures as numbers, read by
/// <see cref="LegacyPlanReader"/> whatever schema they were saved in), its stored inputs, its choices, its trials,
/// the client and the clinic settings. Words come from <see cref="PlanText"/>, the plan page's formatter, so the
/// reports say what the plan page says. This is the one place the reports' input models are filled from a plan.
/// </summary>
/// <remarks>
/// The chosen option of each goal: the one the clinician chose for the handout on the plan page, when there is one
/// (the explicit choice always wins); otherwise the options of that goal whose trial ended dispensed, loaned or
/// ordered (the device the client took home). Declined trials never count.
/// </remarks>
public sealed class StoredPlanReader(ClinicDbContext db, ClinicCalendar calendar)
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public async Task<PlanReportData?> ReadAsync(int planId, CancellationToken ct) =>
        await LoadAsync(planId, ct).ConfigureAwait(false) is { } loaded
            ? Read(loaded.Plan, loaded.Plan.Visit!, loaded.Plan.Visit!.Client!, loaded.Settings, calendar)
            : null;

    /// <summary>
    /// Loads a plan with its visit, client and trials (each with its kit device) and the clinic's settings, in three
    /// indexed queries: what <see cref="Read(Plan, Visit, Client, ClinicSettings, ClinicCalendar)"/> and the plan page need.
    /// </summary>
    public async Task<(Plan Plan, ClinicSettings Settings)?> LoadAsync(int planId, CancellationToken ct)
    {
        var plan = await db.Plans.AsNoTracking()
            .Include(p => p.Visit).ThenInclude(v => v!.Client)
            .FirstOrDefaultAsync(p => p.Id == planId, ct).ConfigureAwait(false);
        if (plan?.Visit?.Client is null)
        {
            return null;
        }

        // The trials by their own indexed query: included with the plan, SQLite materialised every trial in the
        // database joined with its kit device before picking this plan's (docs/performance.md, the handout at scale).
        plan.Trials.AddRange(await db.Trials.AsNoTracking().Include(t => t.KitDevice).Where(t => t.PlanId == planId)
            .ToListAsync(ct).ConfigureAwait(false));

        var settings = await db.Settings.AsNoTracking().OrderBy(s => s.Id).FirstOrDefaultAsync(ct).ConfigureAwait(false)
            ?? Demo.DemoClinic.DefaultSettings("My clinic", hasDemoData: false);
        return (plan, settings);
    }

    /// <summary>Reads a plan already loaded with its visit, client and trials (pure: no database).</summary>
    public static PlanReportData Read(Plan plan, Visit visit, Client client, ClinicSettings settings, ClinicCalendar calendar) =>
        Read(plan, LegacyPlanReader.Read(plan ?? throw new ArgumentNullException(nameof(plan))), visit, client, settings, calendar);

    /// <summary>Reads a plan whose outputs the caller has already read (the plan page), so they are parsed once.</summary>
    public static PlanReportData Read(Plan plan, TypedPlan outputs, Visit visit, Client client, ClinicSettings settings, ClinicCalendar calendar)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(outputs);
        ArgumentNullException.ThrowIfNull(visit);
        ArgumentNullException.ThrowIfNull(client);
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(calendar);
        var imperial = settings.Units == UnitSystem.Imperial;
        var inputs = PlanJson.Read<PlanInputs>(plan.InputsJson);
        var trials = plan.Trials.OrderBy(t => t.TrialDate).ThenBy(t => t.Id).ToList();

        var chosen = new List<ReportOption>();
        var cautions = new List<string>();
        var estimates = new List<MethodEstimate>();
        var choosing = trials.Where(t => t.Outcome is TrialOutcome.Dispensed or TrialOutcome.Loaned or TrialOutcome.Ordered).ToList();
        var byTrial = new List<(int Goal, RankedOption Option, Trial Trial)>();
        foreach (var trial in choosing)
        {
            // A trial counts for the first goal that lists its device.
            for (var g = 0; g < outputs.Goals.Length; g++)
            {
                if (outputs.Goals[g].KitDevices.Concat(outputs.Goals[g].Options).FirstOrDefault(o => Matches(o.Option, trial)) is { } match)
                {
                    byTrial.Add((g, match, trial));
                    break;
                }
            }
        }

        var fromTrials = false;
        for (var g = 0; g < outputs.Goals.Length; g++)
        {
            var goal = outputs.Goals[g];
            var picked = new List<ReportOption?>();
            if (plan.Choices.ForGoal(g) is { } choice)
            {
                var list = goal.List(choice.List);
                if (choice.Index < list.Length)
                {
                    var option = list[choice.Index].Option;
                    picked.Add(Option(option, outputs, goal, inputs, imperial, trials.LastOrDefault(t => Matches(option, t)), ChosenBy.Clinician));
                }
            }
            else
            {
                foreach (var (_, option, trial) in byTrial.Where(t => t.Goal == g))
                {
                    picked.Add(Option(option.Option, outputs, goal, inputs, imperial, trial, ChosenBy.Trial));
                    fromTrials = true;
                }
            }

            foreach (var option in picked.OfType<ReportOption>())
            {
                if (chosen.TrueForAll(c => c.Name != option.Name || c.Task != option.Task))
                {
                    chosen.Add(option);
                    Collect(goal, imperial, cautions, estimates);
                }
            }
        }

        var followUp = trials.Where(t => t.FollowUpDue is not null && t.FollowUpDone is null).Select(t => t.FollowUpDue).Min();
        // Given on: the clinic's day of the latest decision that put a device in the handout.
        var given = new[]
        {
            plan.Choices.IsEmpty || plan.ChosenUtc is not { } at ? null : (DateOnly?)calendar.DateOf(at),
            fromTrials ? choosing.Select(t => (DateOnly?)t.TrialDate).Max() : null,
        }.Max();
        return new PlanReportData(
            plan.Id,
            client.Code,
            client.Name,
            visit.VisitDate,
            visit.Practitioner,
            plan.MethodVersion,
            Contact(settings),
            imperial ? PaperSize.Letter : PaperSize.A4,
            BodyPoints(settings.HandoutPrintSize),
            imperial,
            given ?? calendar.DateOf(plan.CreatedUtc),
            followUp,
            Inputs(inputs, imperial),
            estimates,
            chosen,
            cautions,
            [.. trials.Select(t => new TrialRecord(t.TrialDate, t.DeviceDescription, t.Task is { } task ? PlanText.Task(task) : "—",
                Result(t), Labels.Outcome(t.Outcome)))],
            Reader(outputs, inputs),
            Eyes(visit),
            Near(visit, inputs),
            Curve(outputs, inputs));
    }

    /// <summary>
    /// The print the client reads comfortably, from the typed plan: the critical print size of the measured reading
    /// curve (methods.md §2.5), else the near threshold with the fluent reserve (methods.md §2.3), both at the near
    /// test distance. The handout is taken as held where that print was read, with the correction the client wore
    /// there; <see cref="HandoutPrint.Needed"/> moves it if another reading distance is ever given.
    /// </summary>
    public static HandoutReader? Reader(TypedPlan plan, PlanInputs inputs)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(inputs);
        var threshold = inputs.NearThresholdM is { } m && m > 0 ? PrintSize.FromM(m) : (PrintSize?)null;
        if (plan.Goals.Select(g => g.ReadingCurve).FirstOrDefault(c => c?.CriticalPrintSize is not null) is { } curve)
        {
            return new HandoutReader(curve.TestDistance, curve.TestDistance, curve.CriticalPrintSize, threshold, inputs.FluentReserveUsed());
        }

        return threshold is not null && inputs.NearTestDistanceMetres is { } d && d > 0
            ? new HandoutReader(Distance.FromMetres(d), Distance.FromMetres(d), null, threshold, inputs.FluentReserveUsed())
            : null;
    }

    private static List<EyeAcuity>? Eyes(Visit visit)
    {
        var eyes = new List<EyeAcuity>();
        foreach (var (eye, typed, read) in new[]
        {
            ("Right eye", visit.DistanceRightText, visit.DistanceRight),
            ("Left eye", visit.DistanceLeftText, visit.DistanceLeft),
            ("Both eyes", visit.DistanceBothText, visit.DistanceBoth),
        })
        {
            if (!string.IsNullOrWhiteSpace(typed))
            {
                eyes.Add(new EyeAcuity(eye, typed.Trim(), read));
            }
        }

        return eyes.Count > 0 ? eyes : null;
    }

    // Near acuity as typed ("1.6M at 40 cm") beside the numbers the plan was made with.
    private static NearAcuityRecord? Near(Visit visit, PlanInputs inputs)
    {
        if (inputs.NearThresholdM is not { } m || !(m > 0) || inputs.NearTestDistanceMetres is not { } at || !(at > 0))
        {
            return null;
        }

        var typed = (visit.NearThresholdText ?? "").Trim();
        return new NearAcuityRecord(
            string.IsNullOrWhiteSpace(visit.NearTestDistanceText) ? typed : $"{typed} at {visit.NearTestDistanceText.Trim()}",
            PrintSize.FromM(m),
            Distance.FromMetres(at));
    }

    private static ReadingCurveRecord? Curve(TypedPlan plan, PlanInputs inputs) =>
        plan.Goals.Select(g => g.ReadingCurve).FirstOrDefault(c => c is not null) is { } curve
            ? new ReadingCurveRecord(
                curve.TestDistance,
                [.. inputs.ReadingSpeeds.Select(s => new ReadingCurvePoint(PrintSize.FromM(s.PrintM), s.WordsPerMinute))],
                curve.CriticalPrintSize,
                curve.MaximumReadingSpeed,
                curve.Refusal)
            : null;

    /// <summary>
    /// The clinic's contact line split at "·", ";" or a line break: a part that is mostly digits is the phone, a part
    /// with "@" the e-mail, the rest the address. No phone gives a blank phone, which the renderers refuse with a
    /// message that points to the settings.
    /// </summary>
    public static ClinicContact Contact(ClinicSettings settings)
    {
        ArgumentNullException.ThrowIfNull(settings);
        var parts = (settings.ClinicContact ?? "").Split(['·', ';', '\n'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        string? phone = null, email = null;
        var address = new List<string>();
        foreach (var part in parts)
        {
            var digits = part.Count(char.IsDigit);
            if (email is null && part.Contains('@', StringComparison.Ordinal))
            {
                email = part;
            }
            else if (phone is null && digits >= 6 && digits > part.Count(char.IsLetter))
            {
                phone = part;
            }
            else
            {
                address.Add(part);
            }
        }

        return new ClinicContact(settings.ClinicName, phone ?? "", email, address.Count > 0 ? string.Join(", ", address) : null);
    }

    /// <summary>The handout body size from the clinic's handout print size, within what the handout accepts (18–48 pt).</summary>
    public static double BodyPoints(PrintSize handoutPrint) =>
        handoutPrint.IsValid
            ? Math.Clamp(Math.Round(handoutPrint.ToPoints(HyperlegibleFont.XHeightRatio)), Reports.Handouts.ClientHandout.DefaultBodyPoints, Reports.Handouts.ClientHandout.MaximumBodyPoints)
            : Reports.Handouts.ClientHandout.DefaultBodyPoints;

    // A trial of a kit device matches the option computed for that device; a trial typed without a kit device
    // matches the generic option whose class it names (the plan page's trial link fills the device with the class's
    // label). The option's own label is compared; no text is turned back into a class.
    private static bool Matches(MagnifierOption option, Trial trial) =>
        trial.KitDevice is { } kit
            ? string.Equals(option.KitDeviceId, kit.Code, StringComparison.Ordinal)
            : option.KitDeviceId is null && string.Equals(PlanText.Kind(option.Kind), trial.DeviceDescription.Trim(), StringComparison.OrdinalIgnoreCase);

    private static ReportOption? Option(MagnifierOption option, TypedPlan plan, PlannedGoal goal, PlanInputs inputs, bool imperial, Trial? trial, ChosenBy chosenBy)
    {
        if (option.DeliveredPower.Dioptres <= 0)
        {
            return null;
        }

        var ranked = goal.Options.Concat(goal.KitDevices).First(r => ReferenceEquals(r.Option, option));
        // The kit device as it was when the plan was made (in the stored inputs), else as the trial recorded it.
        var kitPoint = option.KitDeviceId is { } code ? inputs.Kit.FirstOrDefault(k => k.Code == code) : null;
        return new ReportOption(
            option.KitDeviceId is not null && !plan.KitNames.ContainsKey(option.KitDeviceId) && trial?.KitDevice?.Name is { } trialName ? trialName : PlanText.Name(option, plan),
            option.Kind,
            PlanText.Kind(option.Kind),
            PlanText.GoalTitle(goal, plan.Imperial),
            goal.TargetPrint ?? PrintSize.FromM(1.0),
            inputs.NearThresholdM is { } t && t > 0 ? PrintSize.FromM(t) : null,
            goal.Reserve?.Reserve ?? AcuityReserve.Fluent,
            inputs.NearTestDistanceMetres is { } d && d > 0 ? Distance.FromMetres(d) : null,
            option.DeliveredPower,
            option.WorkingDistance.Abs(),
            option.EyeToLens?.Abs(),
            option.LinearField?.Abs(),
            option.LettersInView,
            option.Kind == OptionKind.VideoMagnifier || kitPoint?.Illuminated == true || trial?.KitDevice?.Illuminated == true,
            [.. PlanText.Figures(option, imperial).Select(f => new OptionFigure(f.Label, f.Value))],
            [.. ranked.Reasons.Select(PlanText.Reason)],
            PlanText.Notes(option),
            chosenBy,
            trial?.Outcome == TrialOutcome.Declined,
            // A device the handout holds because of its trial is for what it was tried for; a clinician's choice is for its goal.
            chosenBy == ChosenBy.Trial && trial?.Task is { } task ? TaskOf(task, inputs) : null,
            option.AccommodationOrAddNeeded,
            [.. ranked.Reasons.Select(r => new OptionReason(r.Text, r.InFavour))],
            option is ScreenMagnificationOption screen ? new HandoutScreen(screen.ZoomPercent, screen.ReversedPolarityAdvised) : null);
    }

    // The trial's task in the plan's words, with the detail of the goal recorded for that task ("Letters (bills)").
    private static string TaskOf(GoalTask task, PlanInputs inputs) =>
        PlanText.Task(task) + (inputs.Goals.FirstOrDefault(g => g.Task == task)?.Detail is { } detail ? $" ({detail})" : "");

    private static void Collect(PlannedGoal goal, bool imperial, List<string> cautions, List<MethodEstimate> estimates)
    {
        foreach (var caution in goal.Cautions)
        {
            if (!cautions.Contains(caution.Text))
            {
                cautions.Add(caution.Text);
            }
        }

        var disagree = !goal.Disagreements.IsDefaultOrEmpty;
        foreach (var e in goal.Estimates)
        {
            var method = PlanText.Method(e.Method);
            if (estimates.Exists(x => x.Method == method))
            {
                continue;
            }

            estimates.Add(new MethodEstimate(
                method,
                e.EquivalentPower,
                // The reserve has its own column; one built into the reading curve (no reserve of its own) is said here.
                $"Viewing distance {PlanText.Length(e.EquivalentViewingDistance, imperial)}; magnification {PlanText.EstimateMagnification(e, imperial)}"
                    + (e.Reserve is null ? "; " + PlanText.EstimateReserve(e).ToLowerInvariant() : ""),
                disagree,
                e.Reserve));
        }
    }

    private static List<SummaryInput> Inputs(PlanInputs inputs, bool imperial)
    {
        var list = new List<SummaryInput>();
        void Add(string label, string? value)
        {
            if (!string.IsNullOrEmpty(value))
            {
                list.Add(new SummaryInput(label, value));
            }
        }

        static string? Length(double? metres, bool imperial) => metres is { } m && m > 0 ? PlanText.Length(Distance.FromMetres(m), imperial) : null;

        Add("Distance acuity (logMAR)", inputs.DistanceLogMar?.ToString("0.00", Invariant));
        Add("Smallest print read at near", inputs.NearThresholdM is { } t ? t.ToString("0.0#", Invariant) + "M" : null);
        Add("Near test distance", Length(inputs.NearTestDistanceMetres, imperial));
        Add("Preferred working distance", Length(inputs.WorkingDistanceMetres, imperial));
        Add("Contrast sensitivity (logCS)", inputs.LogContrastSensitivity?.ToString("0.00", Invariant));
        Add("Add worn", inputs.AddWornDioptres is { } add ? PlanText.Power(Power.FromDioptres(add)) : null);
        Add("Accommodation", inputs.MeasuredAmplitudeDioptres is { } a ? PlanText.Power(Power.FromDioptres(a)) + " measured" : "estimated from age");
        Add("Eyes in use", inputs.UsefulEyes >= 2 ? "Both eyes" : "One eye");
        Add("Hands-free wanted", PlanText.YesNo(inputs.HandsFree));
        Add("Tremor", PlanText.YesNo(inputs.Tremor));
        Add("Letter pitch used for letters in view", inputs.CharacterPitch > 0 ? inputs.CharacterPitch.ToString("0.0#", Invariant) + " × the x-height" : null);
        foreach (var goal in inputs.Goals)
        {
            Add("Goal", $"{PlanText.Task(goal.Task)}{(goal.Detail is { } detail ? " (" + detail + ")" : "")}: target {goal.TargetText}");
        }

        return list;
    }

    private static string Result(Trial t)
    {
        var parts = new[] { t.ResultText, t.ResultWordsPerMinute is { } w ? w.ToString(Invariant) + " words a minute" : null, t.ClientComment }
            .Where(p => !string.IsNullOrWhiteSpace(p));
        var text = string.Join("; ", parts);
        return text.Length > 0 ? text : "—";
    }
}
