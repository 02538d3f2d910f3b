using System.Globalization;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Diagnostics;
using Microsoft.AspNetCore.Mvc;
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

    // No handler parameters: a refused POST is re-executed here as a POST with the same body, and when that body is
    // the reason for the refusal (a form the reader cannot decode, e.g. a NUL character) model binding fails and a
    // bound code would stay 0. The code comes from the status-code pages' own record, or from the route.
    public void OnGet()
    {
        Code = HttpContext.Features.Get<IStatusCodeReExecuteFeature>()?.OriginalStatusCode
            ?? (int.TryParse(RouteData.Values["code"]?.ToString(), NumberStyles.None, CultureInfo.InvariantCulture, out var code) ? code : 0);

        // Reached directly (not re-executed for a failed request): still answer with the status it describes.
        if (Code is >= 400 and < 600)
        {
            Response.StatusCode = Code;
        }
    }

    public void OnPost() => OnGet();
}
