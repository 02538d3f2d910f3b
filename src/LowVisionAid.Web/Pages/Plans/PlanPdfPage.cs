using LowVisionAid.Reports;
using LowVisionAid.Web.Handouts;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Plans;

/// <summary>
/// A plan's PDF (handout or summary), or, when it cannot be printed, the reason on screen instead of an empty file.
/// </summary>
public abstract class PlanPdfPage(PlanReports reports) : PageModel
{
    public int PlanId { get; private set; }

    public string? Problem { get; private set; }

    protected abstract ReportResult Render(PlanReports reports, PlanReportData plan);

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var plan = await reports.LoadAsync(id, ct).ConfigureAwait(false);
        if (plan is null)
        {
            return NotFound();
        }

        PlanId = id;
        var result = plan.HasChosenOption ? Render(reports, plan) : null;
        if (result is not { Success: true })
        {
            Problem = result?.Error ?? ReportMessages.NoChosenOption;
            return Page();
        }

        return File(result.Content.ToArray(), ReportResult.PdfContentType, result.FileName);
    }
}
