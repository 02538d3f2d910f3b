using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Clients;

public sealed class DetailsModel(ClientDetailsHandler handler) : PageModel
{
    public ClientView Client { get; private set; } = null!;

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var client = await handler.HandleAsync(id, ct).ConfigureAwait(false);
        if (client is null)
        {
            return NotFound();
        }

        Client = client;
        return Page();
    }
}
