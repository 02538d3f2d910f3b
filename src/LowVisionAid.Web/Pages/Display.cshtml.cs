using LowVisionAid.Web.Display;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages;

public sealed class DisplayModel : PageModel
{
    // Bound as text and read here, so a stale or tampered value gets our message, not the binder's.
    [BindProperty]
    public string? Scheme { get; set; }

    [BindProperty]
    public string? Text { get; set; }

    [BindProperty(SupportsGet = true)]
    public string? ReturnUrl { get; set; }

    public bool Saved { get; private set; }

    public ColourScheme ChosenScheme { get; private set; }

    public TextSize ChosenText { get; private set; }

    public void OnGet(bool saved = false)
    {
        var current = DisplayPreferences.From(Request);
        ChosenScheme = current.Scheme;
        ChosenText = current.Text;
        Saved = saved;
    }

    public IActionResult OnPost()
    {
        var schemeRead = Enum.TryParse<ColourScheme>(Scheme, ignoreCase: false, out var scheme) && Enum.IsDefined(scheme);
        var textRead = Enum.TryParse<TextSize>(Text, ignoreCase: false, out var text) && Enum.IsDefined(text);
        ChosenScheme = scheme;
        ChosenText = text;

        if (!schemeRead)
        {
            ModelState.AddModelError(nameof(Scheme), "Choose standard colours or high contrast.");
        }

        if (!textRead)
        {
            ModelState.AddModelError(nameof(Text), "Choose standard or large text.");
        }

        if (!ModelState.IsValid)
        {
            return Page();
        }

        new DisplayPreferences(scheme, text).WriteTo(Response);
        return IsSafeReturnUrl(ReturnUrl)
            ? LocalRedirect(ReturnUrl!)
            : RedirectToPage(new { saved = true });
    }

    private bool IsSafeReturnUrl(string? url) =>
        !string.IsNullOrEmpty(url) && Url.IsLocalUrl(url) && !url.StartsWith("/Display", StringComparison.OrdinalIgnoreCase);
}
