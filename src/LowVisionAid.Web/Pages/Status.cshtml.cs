using Microsoft.AspNetCore.Mvc;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages;

/// <summary>The friendly page shown for a status code with no body (404 for unknown addresses and records).</summary>
[IgnoreAntiforgeryToken]
public sealed class StatusModel : PageModel
{
    public int Code { get; private set; }

    public string Title => Code switch
    {
        404 => "Page not found",
        400 => "The request could not be read",
        405 => "That action is not available here",
        _ => "The page could not be shown",
    };

    /// <summary>What went wrong and what to do, for a form the app could not accept (400).</summary>
    public string? Explanation => Code == 400 ? SecuritySetup.BadRequestMessage : null;

    public void OnGet(int code)
    {
        Code = code;

        // Reached directly (not re-executed for a failed request): still answer with the status it describes.
        if (code is >= 400 and < 600)
        {
            Response.StatusCode = code;
        }
    }

    public void OnPost(int code) => OnGet(code);
}
