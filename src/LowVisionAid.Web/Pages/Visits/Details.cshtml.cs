using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Visits;

public sealed class DetailsModel(VisitDetailsHandler handler) : PageModel
{
    public VisitView Visit { get; private set; } = null!;

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
