using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.FollowUps;

public sealed class IndexModel(FollowUpListHandler list, FollowUpDoneHandler done) : PageModel
{
    public const string ChangedMeanwhile = "That follow-up was changed by someone else just now; the list below is up to date. Check it and try again.";

    public IReadOnlyList<FollowUpRow> FollowUps { get; private set; } = [];

    [TempData]
    public string? Message { get; set; }

    public async Task OnGetAsync(CancellationToken ct) => FollowUps = await list.HandleAsync(ct).ConfigureAwait(false);

    public async Task<IActionResult> OnPostDoneAsync(int trialId, Guid version, CancellationToken ct)
    {
        Message = await done.HandleAsync(trialId, version, ct).ConfigureAwait(false) ? "Follow-up marked as done." : ChangedMeanwhile;
        return RedirectToPage();
    }
}
