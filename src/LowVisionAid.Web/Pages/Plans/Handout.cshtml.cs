using LowVisionAid.Reports;
using LowVisionAid.Web.Handouts;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Plans;

/// <summary>The client's large-print handout as a PDF, or, when it cannot be printed, the reason on screen.</summary>
public sealed class HandoutModel(PlanReports reports) : PageModel
{
    public int PlanId { get; private set; }

    public string? Problem { get; private set; }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var plan = await reports.LoadAsync(id, ct).ConfigureAwait(false);
        if (plan is null)
        {
            return NotFound();
        }

        PlanId = id;
        var result = plan.HasChosenOption ? reports.RenderHandout(plan) : null;
        if (result is not { Success: true })
        {
            Problem = result?.Error ?? ReportMessages.NoChosenOption;
            return Page();
        }

        return File(result.Content.ToArray(), ReportResult.PdfContentType, result.FileName);
    }
}
