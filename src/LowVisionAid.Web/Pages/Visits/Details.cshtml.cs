using Microsoft.AspNetCore.Mvc;
using LowVisionAid.Web.Plans;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Visits;

public sealed class DetailsModel(VisitDetailsHandler handler, MakePlanHandler makePlan) : PageModel
{
    public VisitView Visit { get; private set; } = null!;

    [TempData]
    public string? Problem { get; set; }

    public async Task<IActionResult> OnPostPlanAsync(int id, CancellationToken ct)
    {
        var result = await makePlan.HandleAsync(id, ct).ConfigureAwait(false);
        if (result is null)
        {
            return NotFound();
        }

        if (result.Problem is not null)
        {
            Problem = result.Problem;
            return Redirect($"/Visits/{id}");
        }

        return Redirect($"/Plans/{result.PlanId}");
    }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var visit = await handler.HandleAsync(id, ct).ConfigureAwait(false);
        if (visit is null)
        {
            return NotFound();
        }

        Visit = visit;
        return Page();
    }
}
