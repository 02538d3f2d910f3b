using System.Globalization;
using System.Text.Json;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Reports;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Summaries;
using LowVisionAid.Web.Pages.Plans;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Handouts;

/// <summary>
/// Reads a saved plan for the reports: its stored outputs (the figures exactly as the plan page shows them), its
/// stored inputs, its choices, its trials, the client and the clinic settings.
/// </summary>
/// <remarks>
/// The chosen option of each goal: the one the clinician chose for the handout on the plan page, when there is one
/// (the explicit choice always wins); otherwise the options of that goal whose trial ended dispensed, loaned or
/// ordered (the device the client took home). Declined trials never count.
/// </remarks>
/// <remarks>
/// Implementation note: the outputs are read as JSON by property name (Goals, Options, KitDevices, Figures …) and
/// the stored figures are read back with the core's notation parsers, so the reports print what the plan page
/// shows and never recompute a figure.
/// </remarks>
public sealed class StoredPlanReader(ClinicDbContext db)
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public async Task<PlanReportData?> ReadAsync(int planId, CancellationToken ct)
    {
        var plan = await db.Plans.AsNoTracking()
            .Include(p => p.Visit).ThenInclude(v => v!.Client)
            .Include(p => p.Trials).ThenInclude(t => t.KitDevice)
            .FirstOrDefaultAsync(p => p.Id == planId, ct).ConfigureAwait(false);
        if (plan?.Visit?.Client is null)
        {
            return null;
        }

        var settings = await db.Settings.AsNoTracking().OrderBy(s => s.Id).FirstOrDefaultAsync(ct).ConfigureAwait(false)
            ?? Demo.DemoClinic.DefaultSettings("My clinic", hasDemoData: false);
        return Read(plan, plan.Visit, plan.Visit.Client, settings);
    }

    /// <summary>Reads a plan already loaded with its visit, client and trials (pure: no database).</summary>
    public static PlanReportData Read(Plan plan, Visit visit, Client client, ClinicSettings settings)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(visit);
        ArgumentNullException.ThrowIfNull(client);
        ArgumentNullException.ThrowIfNull(settings);
        var imperial = settings.Units == UnitSystem.Imperial;
        using var outputs = Parse(plan.OutputsJson);
        using var inputs = Parse(plan.InputsJson);
        var goals = Array(outputs.RootElement, "Goals");
        var inputGoals = Array(inputs.RootElement, "Goals");
        var trials = plan.Trials.OrderBy(t => t.TrialDate).ThenBy(t => t.Id).ToList();

        var chosen = new List<ReportOption>();
        var cautions = new List<string>();
        var estimates = new List<MethodEstimate>();
        var choosing = trials.Where(t => t.Outcome is TrialOutcome.Dispensed or TrialOutcome.Loaned or TrialOutcome.Ordered).ToList();
        var byTrial = new List<(int Goal, JsonElement Option, Trial Trial)>();
        foreach (var trial in choosing)
        {
            // A trial counts for the first goal that lists its device.
            for (int g = 0; g < goals.Count; g++)
            {
                var match = Options(goals[g]).FirstOrDefault(o => Matches(o, trial));
                if (match.ValueKind != JsonValueKind.Undefined)
                {
                    byTrial.Add((g, match, trial));
                    break;
                }
            }
        }

        var fromTrials = false;
        for (int g = 0; g < goals.Count; g++)
        {
            var inputGoal = g < inputGoals.Count ? inputGoals[g] : default;
            var picked = new List<ReportOption?>();
            if (plan.Choices.ForGoal(g) is { } choice)
            {
                var list = Array(goals[g], choice.List == PlanOptionList.KitDevices ? "KitDevices" : "Options");
                if (choice.Index < list.Count)
                {
                    picked.Add(Option(list[choice.Index], goals[g], inputGoal, inputs.RootElement, null, ChosenBy.Clinician));
                }
            }
            else
            {
                foreach (var (_, option, trial) in byTrial.Where(t => t.Goal == g))
                {
                    picked.Add(Option(option, goals[g], inputGoal, inputs.RootElement, trial, ChosenBy.Trial));
                    fromTrials = true;
                }
            }

            foreach (var option in picked.OfType<ReportOption>())
            {
                if (chosen.TrueForAll(c => c.Name != option.Name || c.Task != option.Task))
                {
                    chosen.Add(option);
                    Collect(goals[g], cautions, estimates);
                }
            }
        }

        var followUp = trials.Where(t => t.FollowUpDue is not null && t.FollowUpDone is null).Select(t => t.FollowUpDue).Min();
        // Given on: the day of the latest decision that put a device in the handout.
        var given = new[]
        {
            plan.Choices.IsEmpty || plan.ChosenUtc is not { } at ? null : (DateOnly?)DateOnly.FromDateTime(at),
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
            given ?? DateOnly.FromDateTime(plan.CreatedUtc),
            followUp,
            Inputs(inputs.RootElement, imperial),
            estimates,
            chosen,
            cautions,
            [.. trials.Select(t => new TrialRecord(t.TrialDate, t.DeviceDescription, t.Task is { } task ? Labels.Task(task) : "—",
                Result(t), Labels.Outcome(t.Outcome)))]);
    }

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

    private static JsonDocument Parse(string json)
    {
        try
        {
            return JsonDocument.Parse(string.IsNullOrWhiteSpace(json) ? "{}" : json);
        }
        catch (JsonException)
        {
            return JsonDocument.Parse("{}");
        }
    }

    private static List<JsonElement> Array(JsonElement element, string name) =>
        element.ValueKind == JsonValueKind.Object && element.TryGetProperty(name, out var value) && value.ValueKind == JsonValueKind.Array
            ? [.. value.EnumerateArray()]
            : [];

    private static string? Text(JsonElement element, string name) =>
        element.ValueKind == JsonValueKind.Object && element.TryGetProperty(name, out var value) && value.ValueKind == JsonValueKind.String
            ? value.GetString()
            : null;

    private static double? Number(JsonElement element, string name) =>
        element.ValueKind == JsonValueKind.Object && element.TryGetProperty(name, out var value) && value.ValueKind == JsonValueKind.Number
            ? value.GetDouble()
            : null;

    private static IEnumerable<JsonElement> Options(JsonElement goal) => Array(goal, "KitDevices").Concat(Array(goal, "Options"));

    // A trial of a kit device matches the option computed for that device; a typed trial matches the generic
    // option of the kind it names (the plan page's trial link fills the device with the kind).
    private static bool Matches(JsonElement option, Trial trial)
    {
        var kitCode = Text(option, "KitCode");
        if (trial.KitDevice is { } kit)
        {
            return string.Equals(kitCode, kit.Code, StringComparison.Ordinal);
        }

        return kitCode is null && string.Equals(Text(option, "Kind"), trial.DeviceDescription.Trim(), StringComparison.OrdinalIgnoreCase);
    }

    private static ReportOption? Option(JsonElement option, JsonElement goal, JsonElement inputGoal, JsonElement inputs, Trial? trial, ChosenBy chosenBy)
    {
        var figures = Array(option, "Figures")
            .Select(f => new OptionFigure(Text(f, "Label") ?? "", Text(f, "Value") ?? ""))
            .Where(f => f.Label.Length > 0)
            .ToList();
        string? Figure(string label) => figures.FirstOrDefault(f => f.Label == label)?.Value;
        var power = LeadingNumber(Figure("Power given"));
        var working = StoredDistance(Figure("Working distance"));
        if (power is not > 0 || working is null)
        {
            return null;
        }

        var target = Number(inputGoal, "TargetM") is { } m && m > 0
            ? PrintSize.FromM(m)
            : PrintSizeNotation.Parse(Text(goal, "Target"), Invariant).TryGetValue(out var typed) ? typed : PrintSize.FromM(1.0);
        var kind = Text(option, "Kind") ?? "";
        var family = Family(kind) ?? OptionKind.LargePrint;
        var kitCode = Text(option, "KitCode");
        // The kit device as it was when the plan was made (in the stored inputs), else as the trial recorded it.
        var kitPoint = kitCode is null ? default : Array(inputs, "Kit").FirstOrDefault(k => Text(k, "Code") == kitCode);
        var lit = kitPoint.ValueKind == JsonValueKind.Object && kitPoint.TryGetProperty("Illuminated", out var flag) && flag.ValueKind == JsonValueKind.True;
        return new ReportOption(
            Text(option, "KitName") ?? trial?.KitDevice?.Name ?? kind,
            family,
            kind,
            Text(goal, "Title") ?? "",
            target,
            Number(inputs, "NearThresholdM") is { } t && t > 0 ? PrintSize.FromM(t) : null,
            ReserveFor(goal),
            Number(inputs, "NearTestDistanceMetres") is { } d && d > 0 ? Distance.FromMetres(d) : null,
            Power.FromDioptres(power.Value),
            working.Value,
            StoredDistance(Figure("Eye to lens")),
            StoredDistance(Figure("Field on the page")),
            int.TryParse(Figure("Letters in view"), NumberStyles.Integer, Invariant, out var letters) ? letters : null,
            family == OptionKind.VideoMagnifier || lit || trial?.KitDevice?.Illuminated == true,
            figures,
            [.. Array(option, "Reasons").Select(r => Text(r, "Text")).OfType<string>()],
            [.. Array(option, "Notes").Where(n => n.ValueKind == JsonValueKind.String).Select(n => n.GetString()!)],
            chosenBy);
    }

    private static void Collect(JsonElement goal, List<string> cautions, List<MethodEstimate> estimates)
    {
        foreach (var text in Array(goal, "Cautions").Select(c => Text(c, "Text")).OfType<string>())
        {
            if (!cautions.Contains(text))
            {
                cautions.Add(text);
            }
        }

        var disagree = goal.TryGetProperty("MethodsDisagree", out var flag) && flag.ValueKind == JsonValueKind.True;
        foreach (var e in Array(goal, "Estimates"))
        {
            var method = Text(e, "Method") ?? "";
            if (estimates.Exists(x => x.Method == method))
            {
                continue;
            }

            var dioptres = LeadingNumber(Text(e, "EquivalentPower"));
            estimates.Add(new MethodEstimate(
                method,
                dioptres is > 0 ? Power.FromDioptres(dioptres.Value) : null,
                $"Viewing distance {Text(e, "ViewingDistance")}; magnification {Text(e, "Magnification")}; reserve {Text(e, "Reserve")}",
                disagree));
        }
    }

    /// <summary>
    /// The reserve the stored plan used: the goal's recorded reserve (plans from method 2026.12.2 on), else the reserve
    /// of its first estimate with one (older plans, whose first row was Kestenbaum at 1:1 for 1M, are read past it),
    /// else 2:1. The plan is read as it was made, never re-derived from today's rule.
    /// </summary>
    private static AcuityReserve ReserveFor(JsonElement goal)
    {
        var text = Text(goal, "Reserve")
            ?? Array(goal, "Estimates").Where(e => Text(e, "Method") != PlanBuilder.MethodLabel(PowerMethod.KestenbaumClassic))
                .Select(e => Text(e, "Reserve")).FirstOrDefault(r => r is not null && r.EndsWith(":1", StringComparison.Ordinal));
        return text is not null && double.TryParse(text.AsSpan(0, text.Length - 2), NumberStyles.Float, Invariant, out var r) && r is >= 1 and <= AcuityReserve.MaximumRatio
            ? AcuityReserve.FromRatio(r)
            : AcuityReserve.Fluent;
    }

    private static List<SummaryInput> Inputs(JsonElement inputs, bool imperial)
    {
        var list = new List<SummaryInput>();
        void Add(string label, string? value)
        {
            if (!string.IsNullOrEmpty(value))
            {
                list.Add(new SummaryInput(label, value));
            }
        }

        string? Length(string name) => Number(inputs, name) is { } m && m > 0
            ? DistanceNotation.Format(Distance.FromMetres(m), Invariant, imperial ? "in" : null)
            : null;

        Add("Distance acuity (logMAR)", Number(inputs, "DistanceLogMar")?.ToString("0.00", Invariant));
        Add("Smallest print read at near", Number(inputs, "NearThresholdM") is { } t ? t.ToString("0.0#", Invariant) + "M" : null);
        Add("Near test distance", Length("NearTestDistanceMetres"));
        Add("Preferred working distance", Length("WorkingDistanceMetres"));
        Add("Contrast sensitivity (logCS)", Number(inputs, "LogContrastSensitivity")?.ToString("0.00", Invariant));
        Add("Add worn", Number(inputs, "AddWornDioptres") is { } add ? Power.FromDioptres(add).ToString(null, Invariant) : null);
        Add("Accommodation", Number(inputs, "MeasuredAmplitudeDioptres") is { } a ? Power.FromDioptres(a).ToString(null, Invariant) + " measured" : "estimated from age");
        Add("Useful eyes", Number(inputs, "UsefulEyes") is { } eyes ? eyes.ToString("0", Invariant) : null);
        Add("Hands-free wanted", Bool(inputs, "HandsFree"));
        Add("Tremor", Bool(inputs, "Tremor"));
        Add("Character pitch k", Number(inputs, "CharacterPitch")?.ToString("0.0#", Invariant));
        foreach (var goal in Array(inputs, "Goals"))
        {
            Add("Goal", $"{Text(goal, "Task")}{(Text(goal, "Detail") is { } detail ? " (" + detail + ")" : "")}: target {Text(goal, "TargetText")}");
        }

        return list;
    }

    private static string? Bool(JsonElement element, string name) =>
        element.ValueKind == JsonValueKind.Object && element.TryGetProperty(name, out var value) && value.ValueKind is JsonValueKind.True or JsonValueKind.False
            ? (value.GetBoolean() ? "Yes" : "No")
            : null;

    private static string Result(Trial t)
    {
        var parts = new[] { t.ResultText, t.ResultWordsPerMinute is { } w ? w.ToString(Invariant) + " words a minute" : null, t.ClientComment }
            .Where(p => !string.IsNullOrWhiteSpace(p));
        var text = string.Join("; ", parts);
        return text.Length > 0 ? text : "—";
    }

    // The stored kind is the plan page's label for it (PlanBuilder.KindLabel).
    private static OptionKind? Family(string kind) =>
        Enum.GetValues<OptionKind>().Select(k => (OptionKind?)k).FirstOrDefault(k => PlanBuilder.KindLabel(k!.Value) == kind);

    // Stored figures are the plan page's text, e.g. "+8.00 D (enough)" and "12.5 cm": read back with the core parsers.
    private static double? LeadingNumber(string? text)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return null;
        }

        var end = 0;
        while (end < text.Length && (char.IsDigit(text[end]) || text[end] is '+' or '-' or '.'))
        {
            end++;
        }

        return double.TryParse(text.AsSpan(0, end), NumberStyles.Float, Invariant, out var value) ? value : null;
    }

    private static Distance? StoredDistance(string? text) =>
        text is not null && DistanceNotation.Parse(text, Invariant).TryGetValue(out var d) ? d : null;
}
