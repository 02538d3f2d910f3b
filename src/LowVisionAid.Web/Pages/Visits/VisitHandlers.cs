using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.Visits;

public sealed record VisitClient(int Id, string Code, string? Name);

public sealed class VisitFormHandler(ClinicDbContext db)
{
    public Task<VisitClient?> ClientAsync(int clientId, CancellationToken ct) =>
        db.Clients.AsNoTracking().Where(c => c.Id == clientId).Select(c => new VisitClient(c.Id, c.Code, c.Name)).FirstOrDefaultAsync(ct);

    public async Task<SnellenUnit> SnellenUnitAsync(CancellationToken ct) =>
        await db.Settings.AsNoTracking().OrderBy(s => s.Id).Select(s => (SnellenUnit?)s.SnellenIn).FirstOrDefaultAsync(ct).ConfigureAwait(false) ?? SnellenUnit.Metres;

    /// <summary>A visit with its goals and reading speeds, for editing; null when there is none.</summary>
    public Task<Visit?> LoadAsync(int id, CancellationToken ct) =>
        db.Visits.AsNoTracking().Include(v => v.Goals).Include(v => v.ReadingSpeeds).Include(v => v.Client).FirstOrDefaultAsync(v => v.Id == id, ct);
}

public sealed class NewVisitHandler(ClinicDbContext db)
{
    public async Task<int> HandleAsync(int clientId, VisitInput input, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(input);
        var visit = new Visit { ClientId = clientId };
        VisitMapping.Apply(input, visit);
        db.Visits.Add(visit);
        await db.SaveChangesAsync(ct).ConfigureAwait(false);
        return visit.Id;
    }
}

/// <summary>The outcome of saving an edit: saved, not found, or changed by someone else first.</summary>
public sealed record EditVisitResult(bool Saved, bool NotFound, Guid CurrentVersion, DateTime? ChangedAtUtc)
{
    public bool Conflict => !Saved && !NotFound;
}

public sealed class EditVisitHandler(ClinicDbContext db)
{
    public async Task<EditVisitResult> HandleAsync(int id, VisitInput input, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(input);
        var visit = await db.Visits.Include(v => v.Goals).Include(v => v.ReadingSpeeds).FirstOrDefaultAsync(v => v.Id == id, ct).ConfigureAwait(false);
        if (visit is null)
        {
            return new(false, true, Guid.Empty, null);
        }

        // Compare against the version the editor opened, not the one just read.
        db.Entry(visit).Property(v => v.Version).OriginalValue = input.Version;
        if (visit.Version != input.Version)
        {
            return new(false, false, visit.Version, visit.UpdatedUtc);
        }

        VisitMapping.Apply(input, visit);
        db.Entry(visit).State = EntityState.Modified;
        try
        {
            await db.SaveChangesAsync(ct).ConfigureAwait(false);
            return new(true, false, visit.Version, visit.UpdatedUtc);
        }
        catch (DbUpdateConcurrencyException)
        {
            var current = await db.Visits.AsNoTracking().Where(v => v.Id == id)
                .Select(v => new { v.Version, v.UpdatedUtc }).FirstOrDefaultAsync(ct).ConfigureAwait(false);
            return current is null ? new(false, true, Guid.Empty, null) : new(false, false, current.Version, current.UpdatedUtc);
        }
    }
}

public sealed record GoalView(string Task, string? Detail, string TargetPrint, string? ViewingDistance);

public sealed record SpeedView(string PrintSize, int WordsPerMinute);

public sealed record PlanRow(int Id, DateTime CreatedUtc, string MethodVersion, int Trials);

public sealed record VisitView(
    int Id, VisitClient Client, DateOnly Date, string? Practitioner,
    IReadOnlyList<UnderstoodReading> Readings, IReadOnlyList<GoalView> Goals, IReadOnlyList<SpeedView> Speeds,
    string? ContrastSensitivity, string? RefractionWorn, string Eyes, string Lighting, bool HandsFree, bool Tremor,
    bool AccommodationFromAge, string? Notes, bool IsDemo, IReadOnlyList<PlanRow> Plans);

public sealed class VisitDetailsHandler(ClinicDbContext db, VisitFormHandler form)
{
    public async Task<VisitView?> HandleAsync(int id, CancellationToken ct)
    {
        var visit = await form.LoadAsync(id, ct).ConfigureAwait(false);
        if (visit is null)
        {
            return null;
        }

        var snellen = await form.SnellenUnitAsync(ct).ConfigureAwait(false);
        var input = VisitMapping.ToInput(visit);
        var plans = await db.Plans.AsNoTracking().Where(p => p.VisitId == id).OrderByDescending(p => p.CreatedUtc)
            .Select(p => new PlanRow(p.Id, p.CreatedUtc, p.MethodVersion, p.Trials.Count)).ToListAsync(ct).ConfigureAwait(false);
        var client = visit.Client!;
        return new VisitView(
            visit.Id, new VisitClient(client.Id, client.Code, client.Name), visit.VisitDate, visit.Practitioner,
            Understood.From(input, snellen),
            [.. visit.Goals.OrderBy(g => g.Position).Select(g => new GoalView(Web.Plans.PlanText.Task(g.Task), g.Detail, g.TargetText, g.ViewingDistanceText))],
            [.. visit.ReadingSpeeds.OrderBy(s => s.Position).Select(s => new SpeedView(s.PrintSizeText, s.WordsPerMinute))],
            visit.ContrastSensitivityText, visit.RefractionWorn, Labels.Eyes(visit.UsefulEyes), Labels.Lighting(visit.HomeLighting),
            visit.NeedsHandsFree, visit.HasTremor, visit.AccommodationMeasured is null, visit.Notes, client.IsDemo, plans);
    }
}
