using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Clients;

public sealed class DetailsModel(ClientDetailsHandler handler) : PageModel
{
    public ClientView Client { get; private set; } = null!;

    /// <summary>Which page of the visits (from 1, latest first).</summary>
    [BindProperty(SupportsGet = true, Name = "visits")]
    public int VisitPage { get; set; } = 1;

    /// <summary>Which page of the trials (from 1, latest first).</summary>
    [BindProperty(SupportsGet = true, Name = "trials")]
    public int TrialPage { get; set; } = 1;

    public Pager VisitPages { get; private set; } = null!;

    public Pager TrialPages { get; private set; } = null!;

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var client = await handler.HandleAsync(id, VisitPage, TrialPage, ct).ConfigureAwait(false);
        if (client is null)
        {
            return NotFound();
        }

        Client = client;
        VisitPages = Pager.For("Visit pages", client.Visits, n => Url.Page("/Clients/Details", null, new { id, visits = n, trials = client.Trials.Number }, null, null, "visits")!);
        TrialPages = Pager.For("Trial pages", client.Trials, n => Url.Page("/Clients/Details", null, new { id, visits = client.Visits.Number, trials = n }, null, null, "trials")!);
        return Page();
    }
}
