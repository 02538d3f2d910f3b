using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Clients;

public sealed class IndexModel(ClientListHandler handler) : PageModel
{
    [BindProperty(SupportsGet = true, Name = "q")]
    public string? Search { get; set; }

    [BindProperty(SupportsGet = true, Name = "p")]
    public int PageNumber { get; set; } = 1;

    public ListPage<ClientRow> Clients { get; private set; } = new([], 1, false);

    public Pager Pages { get; private set; } = new("Client list pages", 1, null, null);

    public async Task OnGetAsync(CancellationToken ct)
    {
        Clients = await handler.HandleAsync(Search, PageNumber, ct).ConfigureAwait(false);
        Pages = Pager.For("Client list pages", Clients, n => Url.Page("/Clients/Index", new { q = Search, p = n })!);
    }
}
