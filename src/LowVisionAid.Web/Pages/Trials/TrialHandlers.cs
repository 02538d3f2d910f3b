using System.Globalization;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Planning;
using Microsoft.AspNetCore.Mvc.Rendering;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.Trials;

public sealed record TrialContext(int PlanId, int VisitId, int ClientId, string ClientCode, IReadOnlyList<SelectListItem> KitChoices);

public sealed class NewTrialHandler(ClinicDbContext db)
{
    public const string KitDeviceGone = "That kit device is no longer in the kit; choose another or type the device.";

    public async Task<TrialContext?> ContextAsync(int planId, CancellationToken ct)
    {
        var plan = await db.Plans.AsNoTracking().Where(p => p.Id == planId)
            .Select(p => new { p.Id, p.VisitId, p.Visit!.ClientId, p.Visit.Client!.Code }).FirstOrDefaultAsync(ct).ConfigureAwait(false);
        if (plan is null)
        {
            return null;
        }

        var kit = await db.KitDevices.AsNoTracking().OrderBy(k => k.Kind).ThenBy(k => k.Name)
            .Select(k => new SelectListItem($"{k.Name} ({k.Code})", k.Id.ToString(CultureInfo.InvariantCulture)))
            .ToListAsync(ct).ConfigureAwait(false);
        return new(plan.Id, plan.VisitId, plan.ClientId, plan.Code, [new SelectListItem("Not from the kit (type it below)", ""), .. kit]);
    }

    public async Task<string?> KitIdAsync(string code, CancellationToken ct) =>
        (await db.KitDevices.AsNoTracking().Where(k => k.Code == code).Select(k => (int?)k.Id).FirstOrDefaultAsync(ct).ConfigureAwait(false))
        ?.ToString(CultureInfo.InvariantCulture);

    /// <summary>Saves the trial; returns null and an error when the chosen kit device has gone.</summary>
    public async Task<(int? Id, string? KitError)> HandleAsync(int planId, TrialInput input, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(input);
        KitDevice? device = null;
        if (input.KitId is { } kitId)
        {
            device = await db.KitDevices.FirstOrDefaultAsync(k => k.Id == kitId, ct).ConfigureAwait(false);
            if (device is null)
            {
                return (null, KitDeviceGone);
            }
        }

        TrialInput.TryDate(input.TrialDate, out var date);
        var trial = new Trial
        {
            PlanId = planId,
            TrialDate = date,
            KitDeviceId = device?.Id,
            DeviceDescription = Clean(input.DeviceDescription) ?? $"{device!.Name} ({device.Code})",
            Task = Enum.TryParse<GoalTask>(input.Task, out var task) ? task : null,
            ResultText = Clean(input.Result),
            ResultWordsPerMinute = int.TryParse(input.ResultWordsPerMinute?.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var wpm) ? wpm : null,
            ClientComment = Clean(input.ClientComment),
            Outcome = Enum.Parse<TrialOutcome>(input.Outcome!),
            FollowUpDue = TrialInput.TryDate(input.FollowUpDue, out var due) ? due : null,
        };
        db.Trials.Add(trial);
        await db.SaveChangesAsync(ct).ConfigureAwait(false);
        return (trial.Id, null);
    }

    private static string? Clean(string? text) => string.IsNullOrWhiteSpace(text) ? null : text.Trim();
}
