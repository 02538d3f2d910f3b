using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Clients;

public sealed class IndexModel(ClientListHandler handler) : PageModel
{
    [BindProperty(SupportsGet = true, Name = "q")]
    public string? Search { get; set; }

    public IReadOnlyList<ClientRow> Clients { get; private set; } = [];

    public async Task OnGetAsync(CancellationToken ct) => Clients = await handler.HandleAsync(Search, ct).ConfigureAwait(false);
}
