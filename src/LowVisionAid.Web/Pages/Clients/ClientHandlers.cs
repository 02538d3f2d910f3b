using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.Clients;

public sealed record ClientRow(int Id, string Code, string? Name, int? YearOfBirth, DateOnly? LastVisit, bool IsDemo);

/// <summary>
/// Clients whose code or name contains the search text (ignoring case and accents, <see cref="ClientSearch"/>), most
/// recently seen first, a page at a time. Reads the stored latest-visit date and search text through their indexes,
/// so the list does not slow with the number of clients and visits.
/// </summary>
public sealed class ClientListHandler(ClinicDbContext db)
{
    public const int PageSize = 50;

    public async Task<ListPage<ClientRow>> HandleAsync(string? search, int page, CancellationToken ct)
    {
        var query = string.IsNullOrWhiteSpace(search) ? db.Clients.AsNoTracking() : ClientSearch.Matching(db, search).AsNoTracking();

        // Clients never seen come last. SQLite sorts a missing date last when descending, so its index serves the order
        // as written; PostgreSQL sorts it first, so the server is told.
        var ordered = db.Database.IsServer()
            ? query.OrderBy(c => c.LastVisitDate == null).ThenByDescending(c => c.LastVisitDate)
            : query.OrderByDescending(c => c.LastVisitDate);
        return await ListPage.ReadAsync(ordered.ThenBy(c => c.Code)
            .Select(c => new ClientRow(c.Id, c.Code, c.Name, c.YearOfBirth, c.LastVisitDate, c.IsDemo)), page, PageSize, ct).ConfigureAwait(false);
    }
}

public sealed record NewClientResult(int? Id, string? CodeError);

public sealed class NewClientHandler(ClinicDbContext db)
{
    public const string CodeTaken = "Another client already has this code. Type a different code, or search for that client.";

    public async Task<NewClientResult> HandleAsync(ClientInput input, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(input);
        var code = input.Code.Trim();
        if (await db.Clients.AnyAsync(c => c.Code == code, ct).ConfigureAwait(false))
        {
            return new(null, CodeTaken);
        }

        var client = new Client
        {
            Code = code,
            Name = Blank(input.Name),
            YearOfBirth = input.ParsedYearOfBirth,
            Notes = Blank(input.Notes),
        };
        db.Clients.Add(client);
        try
        {
            await db.SaveChangesAsync(ct).ConfigureAwait(false);
        }
        catch (DbUpdateException e) when (e.IsDuplicateKey())
        {
            // Two people saved the same new code at the same moment: the unique index let only one in.
            return new(null, CodeTaken);
        }

        return new(client.Id, null);
    }

    internal static string? Blank(string? text) => string.IsNullOrWhiteSpace(text) ? null : text.Trim();
}

/// <summary>The outcome of saving an edit: saved, not found, refused (the code is taken), or changed by someone else first.</summary>
public sealed record EditClientResult(bool Saved, bool NotFound, string? CodeError, Guid CurrentVersion, DateTime? ChangedAtUtc)
{
    public bool Conflict => !Saved && !NotFound && CodeError is null;
}

public sealed class EditClientHandler(ClinicDbContext db)
{
    /// <summary>The client as the edit form shows it; null when there is none.</summary>
    public Task<Client?> LoadAsync(int id, CancellationToken ct) =>
        db.Clients.AsNoTracking().FirstOrDefaultAsync(c => c.Id == id, ct);

    public async Task<EditClientResult> HandleAsync(int id, ClientInput input, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(input);
        var client = await db.Clients.FirstOrDefaultAsync(c => c.Id == id, ct).ConfigureAwait(false);
        if (client is null)
        {
            return new(false, true, null, Guid.Empty, null);
        }

        // Compare against the version the editor opened, not the one just read.
        db.Entry(client).Property(c => c.Version).OriginalValue = input.Version;
        if (client.Version != input.Version)
        {
            return new(false, false, null, client.Version, client.UpdatedUtc);
        }

        var code = input.Code.Trim();
        if (await db.Clients.AnyAsync(c => c.Code == code && c.Id != id, ct).ConfigureAwait(false))
        {
            return new(false, false, NewClientHandler.CodeTaken, client.Version, client.UpdatedUtc);
        }

        client.Code = code;
        client.Name = NewClientHandler.Blank(input.Name);
        client.YearOfBirth = input.ParsedYearOfBirth;
        client.Notes = NewClientHandler.Blank(input.Notes);
        db.Entry(client).State = EntityState.Modified;
        try
        {
            await db.SaveChangesAsync(ct).ConfigureAwait(false);
            return new(true, false, null, client.Version, client.UpdatedUtc);
        }
        catch (DbUpdateConcurrencyException)
        {
            var current = await db.Clients.AsNoTracking().Where(c => c.Id == id)
                .Select(c => new { c.Version, c.UpdatedUtc }).FirstOrDefaultAsync(ct).ConfigureAwait(false);
            return current is null ? new(false, true, null, Guid.Empty, null) : new(false, false, null, current.Version, current.UpdatedUtc);
        }
        catch (DbUpdateException e) when (e.IsDuplicateKey())
        {
            // Another client took the same code at the same moment: the unique index let only one in.
            return new(false, false, NewClientHandler.CodeTaken, input.Version, null);
        }
    }
}

public sealed record ClientVisitRow(int Id, DateOnly Date, string? Practitioner, string? DistanceBoth, int Plans);

public sealed record ClientTrialRow(int Id, int PlanId, DateOnly Date, string Device, TrialOutcome Outcome, DateOnly? FollowUpDue, DateOnly? FollowUpDone);

public sealed record ClientView(
    int Id, string Code, string? Name, int? YearOfBirth, string? Notes, bool IsDemo,
    ListPage<ClientVisitRow> Visits, ListPage<ClientTrialRow> Trials);

/// <summary>A client with one page of their visits and one of their trials, latest first.</summary>
public sealed class ClientDetailsHandler(ClinicDbContext db)
{
    /// <summary>Visits or trials shown at once on a client's page.</summary>
    public const int PageSize = 20;

    public async Task<ClientView?> HandleAsync(int id, int visitPage, int trialPage, CancellationToken ct)
    {
        var client = await db.Clients.AsNoTracking().FirstOrDefaultAsync(c => c.Id == id, ct).ConfigureAwait(false);
        if (client is null)
        {
            return null;
        }

        var visits = await ListPage.ReadAsync(db.Visits.AsNoTracking().Where(v => v.ClientId == id)
            .OrderByDescending(v => v.VisitDate).ThenByDescending(v => v.Id)
            .Select(v => new ClientVisitRow(v.Id, v.VisitDate, v.Practitioner, v.DistanceBothText, v.Plans.Count)), visitPage, PageSize, ct).ConfigureAwait(false);
        var trials = await ListPage.ReadAsync(db.Trials.AsNoTracking().Where(t => t.Plan!.Visit!.ClientId == id)
            .OrderByDescending(t => t.TrialDate).ThenByDescending(t => t.Id)
            .Select(t => new ClientTrialRow(t.Id, t.PlanId, t.TrialDate, t.DeviceDescription, t.Outcome, t.FollowUpDue, t.FollowUpDone)), trialPage, PageSize, ct).ConfigureAwait(false);
        return new(client.Id, client.Code, client.Name, client.YearOfBirth, client.Notes, client.IsDemo, visits, trials);
    }
}
