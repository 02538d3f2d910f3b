using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.FollowUps;

public sealed class IndexModel(FollowUpListHandler list, FollowUpDoneHandler done) : PageModel
{
    public const string ChangedMeanwhile = "That follow-up was changed by someone else just now; the list below is up to date. Check it and try again.";

    [BindProperty(SupportsGet = true, Name = "p")]
    public int PageNumber { get; set; } = 1;

    public ListPage<FollowUpRow> FollowUps { get; private set; } = new([], 1, false);

    public Pager Pages { get; private set; } = new("Follow-up pages", 1, null, null);

    [TempData]
    public string? Message { get; set; }

    public async Task OnGetAsync(CancellationToken ct)
    {
        FollowUps = await list.HandleAsync(PageNumber, ct).ConfigureAwait(false);
        Pages = Pager.For("Follow-up pages", FollowUps, n => Url.Page("/FollowUps/Index", new { p = n })!);
    }

    public async Task<IActionResult> OnPostDoneAsync(int trialId, Guid version, CancellationToken ct)
    {
        Message = await done.HandleAsync(trialId, version, ct).ConfigureAwait(false) ? "Follow-up marked as done." : ChangedMeanwhile;
        return RedirectToPage();
    }
}
