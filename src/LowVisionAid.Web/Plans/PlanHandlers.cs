using System.Globalization;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Handouts;
using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Optics.Planning;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Plans;

public sealed record MakePlanResult(int? PlanId, string? Problem);

/// <summary>Makes a plan from a visit as it is now, and saves its inputs, the method version and its outputs.</summary>
public sealed class MakePlanHandler(ClinicDbContext db, TimeProvider clock)
{
    public const string NoGoals = "Add at least one goal to the visit (a task and its print size) before making a plan.";
    public const string NoWorkingDistance = "Type the client's preferred working distance on the visit, such as 25 cm, before making a plan for near tasks.";

    public async Task<MakePlanResult?> HandleAsync(int visitId, CancellationToken ct)
    {
        var inputs = await InputsAsync(visitId, ct).ConfigureAwait(false);
        if (inputs is null)
        {
            return null;
        }

        if (inputs.Goals.Count == 0)
        {
            return new(null, NoGoals);
        }

        if (inputs.WorkingDistanceMetres <= 0 && inputs.Goals.Any(g => TaskRules.For(g.Task).Kind != ReadingTask.DistanceViewing))
        {
            return new(null, NoWorkingDistance);
        }

        var outputs = PlanBuilder.Build(inputs);
        var plan = new Plan
        {
            VisitId = visitId,
            CreatedUtc = clock.GetUtcNow().UtcDateTime,
            MethodVersion = outputs.MethodVersion,
            InputsJson = PlanJson.Write(inputs),
            OutputsJson = PlanJson.Write(outputs),
        };
        db.Plans.Add(plan);
        await db.SaveChangesAsync(ct).ConfigureAwait(false);
        return new(plan.Id, null);
    }

    /// <summary>The inputs a plan would be made from now; null when there is no such visit.</summary>
    public async Task<PlanInputs?> InputsAsync(int visitId, CancellationToken ct)
    {
        var visit = await db.Visits.AsNoTracking().Include(v => v.Client).Include(v => v.Goals).Include(v => v.ReadingSpeeds)
            .FirstOrDefaultAsync(v => v.Id == visitId, ct).ConfigureAwait(false);
        if (visit is null)
        {
            return null;
        }

        var settings = await db.Settings.AsNoTracking().OrderBy(s => s.Id).FirstOrDefaultAsync(ct).ConfigureAwait(false)
            ?? Demo.DemoClinic.DefaultSettings("My clinic", hasDemoData: false);
        var kit = await db.KitDevices.AsNoTracking().OrderBy(k => k.Code).ToListAsync(ct).ConfigureAwait(false);
        return new PlanInputs
        {
            VisitId = visit.Id,
            AgeYears = visit.Client!.YearOfBirth is { } born ? Math.Clamp(visit.VisitDate.Year - born, 0, 120) : null,
            DistanceLogMar = (visit.DistanceBoth ?? Best(visit.DistanceRight, visit.DistanceLeft))?.LogMar,
            NearThresholdM = visit.NearThreshold?.M,
            NearTestDistanceMetres = visit.NearTestDistance?.Metres,
            ReadingSpeeds = [.. visit.ReadingSpeeds.OrderBy(s => s.Position).Select(s => new SpeedPoint(s.PrintSize.M, s.WordsPerMinute))],
            LogContrastSensitivity = visit.ContrastLogCs,
            DimLighting = visit.HomeLighting is HomeLighting.Dim or HomeLighting.Poor,
            AddWornDioptres = visit.AddWorn?.Dioptres,
            MeasuredAmplitudeDioptres = visit.AccommodationMeasured?.Dioptres,
            WorkingDistanceMetres = visit.WorkingDistance?.Metres ?? 0,
            HandsFree = visit.NeedsHandsFree,
            Tremor = visit.HasTremor,
            UsefulEyes = visit.UsefulEyes == UsefulEyes.Both ? 2 : 1,
            SpotReserve = settings.SpotReserve.Ratio,
            FluentReserve = settings.FluentReserve.Ratio,
            SustainedReserve = settings.SustainedReserve.Ratio,
            CharacterPitch = settings.CharacterPitch,
            Imperial = settings.Units == UnitSystem.Imperial,
            CostClasses = settings.CostClasses.Count > 0 ? settings.CostClasses : null,
            Goals = [.. visit.Goals.OrderBy(g => g.Position).Select(g => new GoalPoint(g.Task, g.Detail, g.TargetText, g.TargetPrint?.M, g.TargetAcuity?.LogMar, g.ViewingDistance?.Metres))],
            Kit = [.. kit.Select(KitPoint.From)],
        };
    }

    // With no both-eyes acuity, the better eye's acuity stands for the client's distance vision.
    private static Optics.Quantities.Acuity? Best(Optics.Quantities.Acuity? right, Optics.Quantities.Acuity? left) =>
        (right, left) switch
        {
            ({ } r, { } l) => r <= l ? r : l,
            ({ } r, null) => r,
            (null, { } l) => l,
            _ => null,
        };
}

/// <summary>
/// Records which option the clinician chose for the handout, one per goal, beside the plan's outputs (which stay
/// exactly as they were made). The audit trail gets its "Plan changed" line from the save, like every other write.
/// </summary>
public sealed class ChoosePlanOptionHandler(ClinicDbContext db, TimeProvider clock)
{
    public const string NoSuchOption = "That option is not in this plan. Reload the plan page and choose again.";

    /// <summary>Found is false when there is no such plan; Problem says why the choice was refused, or is null.</summary>
    public async Task<(bool Found, string? Problem)> ChooseAsync(int planId, PlanOptionRef option, CancellationToken ct)
    {
        var plan = await db.Plans.FirstOrDefaultAsync(p => p.Id == planId, ct).ConfigureAwait(false);
        if (plan is null)
        {
            return (false, null);
        }

        if (!Exists(LegacyPlanReader.Read(plan), option))
        {
            return (true, NoSuchOption);
        }

        if (!plan.Choices.Contains(option))
        {
            plan.Choices = plan.Choices.With(option);
            plan.ChosenUtc = clock.GetUtcNow().UtcDateTime;
            await db.SaveChangesAsync(ct).ConfigureAwait(false);
        }

        return (true, null);
    }

    /// <summary>Clears the choice for one goal; false when there is no such plan.</summary>
    public async Task<bool> ClearAsync(int planId, int goal, CancellationToken ct)
    {
        var plan = await db.Plans.FirstOrDefaultAsync(p => p.Id == planId, ct).ConfigureAwait(false);
        if (plan is null)
        {
            return false;
        }

        if (plan.Choices.ForGoal(goal) is not null)
        {
            plan.Choices = plan.Choices.Without(goal);
            plan.ChosenUtc = clock.GetUtcNow().UtcDateTime;
            await db.SaveChangesAsync(ct).ConfigureAwait(false);
        }

        return true;
    }

    public static bool Exists(TypedPlan plan, PlanOptionRef option)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return option.Goal >= 0 && option.Goal < plan.Goals.Length && option.Index >= 0
            && option.Index < plan.Goals[option.Goal].List(option.List).Length;
    }
}

public sealed record PlanTrialRow(int Id, DateOnly Date, string Device, string Outcome, string FollowUp, string? Result, string? Comment);

/// <summary>
/// What the plan page needs before its cached body: the plan's client for the heading, and <see cref="Key"/>, which
/// names the page body's content. The key is made of the plan's id, when it was made, its choices and when they
/// changed, and the version token of its visit, its client, the settings, each trial and each trial's kit device
/// (every save of those gives a new token, <c>ClinicDbContext.StampVersions</c>): nothing else the body shows can
/// change (the outputs never change; the clinic's time zone is fixed for the process). A key from the records
/// themselves, not a count of changes kept in memory, so a restored older database or a second app process on the
/// same server database never gets a body made for other records.
/// </summary>
public sealed record PlanPageStamp(int PlanId, int ClientId, string ClientCode, string Key)
{
    /// <summary>The key of these parts: the plan id, then a SHA-256 of them all (short, whatever the trial count).</summary>
    public static string KeyOf(IReadOnlyList<string> parts)
    {
        ArgumentNullException.ThrowIfNull(parts);
        var hash = System.Security.Cryptography.SHA256.HashData(System.Text.Encoding.UTF8.GetBytes(string.Join('\n', parts)));
        return $"plan-{parts[0]}-{Convert.ToHexString(hash)}";
    }
}

public sealed record PlanView(
    int Id, int VisitId, DateOnly VisitDate, int ClientId, string ClientCode, bool IsDemo, DateTimeOffset Created,
    TypedPlan Outputs, IReadOnlyList<PlanTrialRow> Trials, PlanChoices Choices, PlanReportData Report);

/// <summary>
/// The plan page's data from one load (the plan with its visit, client and trials, and the settings) and one read of
/// its stored outputs: the typed plan for the page, and the report data for its handouts section.
/// </summary>
public sealed class PlanDetailsHandler(ClinicDbContext db, StoredPlanReader reader, ClinicCalendar calendar)
{
    /// <summary>
    /// The plan page's stamp: one query (no stored outputs read) for whether the plan exists, its client for the
    /// page's heading, and every record whose change can change the page; null when there is no such plan.
    /// </summary>
    public async Task<PlanPageStamp?> StampAsync(int id, CancellationToken ct)
    {
        // One row per trial of the plan (one with no trial when there is none), each carrying the plan's own
        // columns and the settings row's version; the outputs and inputs JSON are never selected.
        var rows = await (
            from p in db.Plans.AsNoTracking()
            where p.Id == id
            join t in db.Trials.AsNoTracking() on p.Id equals t.PlanId into trials
            from t in trials.DefaultIfEmpty()
            select new
            {
                p.CreatedUtc,
                p.ChosenUtc,
                p.Choices,
                p.Visit!.ClientId,
                p.Visit.Client!.Code,
                VisitVersion = p.Visit.Version,
                ClientVersion = p.Visit.Client.Version,
                SettingsVersion = db.Settings.OrderBy(s => s.Id).Select(s => (Guid?)s.Version).FirstOrDefault(),
                TrialId = (int?)t!.Id,
                TrialVersion = (Guid?)t.Version,
                KitVersion = (Guid?)t.KitDevice!.Version,
            }).ToListAsync(ct).ConfigureAwait(false);
        if (rows.Count == 0)
        {
            return null;
        }

        var plan = rows[0];
        return new PlanPageStamp(id, plan.ClientId, plan.Code, PlanPageStamp.KeyOf(
        [
            id.ToString(CultureInfo.InvariantCulture),
            plan.CreatedUtc.Ticks.ToString(CultureInfo.InvariantCulture),
            plan.ChosenUtc?.Ticks.ToString(CultureInfo.InvariantCulture) ?? "",
            plan.Choices.Stored,
            plan.VisitVersion.ToString(),
            plan.ClientVersion.ToString(),
            plan.SettingsVersion?.ToString() ?? "",
            .. rows.Where(r => r.TrialId is not null).OrderBy(r => r.TrialId)
                .Select(r => string.Create(CultureInfo.InvariantCulture, $"{r.TrialId}/{r.TrialVersion}/{r.KitVersion}")),
        ]));
    }

    public async Task<PlanView?> HandleAsync(int id, CancellationToken ct)
    {
        if (await reader.LoadAsync(id, ct).ConfigureAwait(false) is not var (plan, settings))
        {
            return null;
        }

        var visit = plan.Visit!;
        var outputs = LegacyPlanReader.Read(plan);
        var trials = plan.Trials.OrderBy(t => t.TrialDate).ThenBy(t => t.Id);
        return new PlanView(plan.Id, plan.VisitId, visit.VisitDate, visit.ClientId, visit.Client!.Code, visit.Client.IsDemo, calendar.Local(plan.CreatedUtc),
            outputs,
            [.. trials.Select(t => new PlanTrialRow(t.Id, t.TrialDate, t.DeviceDescription, Labels.Outcome(t.Outcome), Labels.FollowUp(t.FollowUpDue, t.FollowUpDone), t.ResultText, t.ClientComment))],
            plan.Choices,
            StoredPlanReader.Read(plan, outputs, visit, visit.Client, settings, calendar));
    }
}
