using LowVisionAid.Data;
using LowVisionAid.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.FollowUps;

public sealed record FollowUpRow(int TrialId, Guid Version, int ClientId, string ClientCode, int PlanId, string Device, DateOnly Due, string Status);

/// <summary>Follow-ups booked and not yet done, earliest first, each marked overdue, due today or upcoming, a page at a time.</summary>
public sealed class FollowUpListHandler(ClinicDbContext db, Infrastructure.ClinicCalendar calendar)
{
    public const int PageSize = 50;

    public async Task<ListPage<FollowUpRow>> HandleAsync(int page, CancellationToken ct)
    {
        var today = calendar.Today;
        var rows = await ListPage.ReadAsync(db.Trials.AsNoTracking()
            .Where(t => t.FollowUpDue != null && t.FollowUpDone == null)
            .OrderBy(t => t.FollowUpDue).ThenBy(t => t.Id)
            .Select(t => new { t.Id, t.Version, t.Plan!.Visit!.ClientId, t.Plan.Visit.Client!.Code, t.PlanId, t.DeviceDescription, Due = t.FollowUpDue!.Value }), page, PageSize, ct).ConfigureAwait(false);
        return new([.. rows.Rows.Select(r => new FollowUpRow(r.Id, r.Version, r.ClientId, r.Code, r.PlanId, r.DeviceDescription, r.Due, Status(r.Due, today)))], rows.Number, rows.HasNext);
    }

    internal static string Status(DateOnly due, DateOnly today) =>
        due < today ? "Overdue" : due == today ? "Due today" : "Upcoming";
}

public sealed class FollowUpDoneHandler(ClinicDbContext db, Infrastructure.ClinicCalendar calendar)
{
    /// <summary>Marks the follow-up done; false when the trial is gone or someone changed it meanwhile.</summary>
    public async Task<bool> HandleAsync(int trialId, Guid version, CancellationToken ct)
    {
        var trial = await db.Trials.FirstOrDefaultAsync(t => t.Id == trialId, ct).ConfigureAwait(false);
        if (trial is null || trial.Version != version)
        {
            return false;
        }

        trial.FollowUpDone = calendar.Today;
        try
        {
            await db.SaveChangesAsync(ct).ConfigureAwait(false);
            return true;
        }
        catch (DbUpdateConcurrencyException)
        {
            return false;
        }
    }
}
