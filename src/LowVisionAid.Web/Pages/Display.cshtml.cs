using LowVisionAid.Web.Display;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages;

public sealed class DisplayModel : PageModel
{
    [BindProperty]
    public ColourScheme Scheme { get; set; }

    [BindProperty]
    public TextSize Text { get; set; }

    [BindProperty(SupportsGet = true)]
    public string? ReturnUrl { get; set; }

    public bool Saved { get; private set; }

    public void OnGet(bool saved = false)
    {
        var current = DisplayPreferences.From(Request);
        Scheme = current.Scheme;
        Text = current.Text;
        Saved = saved;
    }

    public IActionResult OnPost()
    {
        if (!Enum.IsDefined(Scheme))
        {
            ModelState.AddModelError(nameof(Scheme), "Choose standard colours or high contrast.");
        }

        if (!Enum.IsDefined(Text))
        {
            ModelState.AddModelError(nameof(Text), "Choose standard or large text.");
        }

        if (!ModelState.IsValid)
        {
            return Page();
        }

        new DisplayPreferences(Scheme, Text).WriteTo(Response);
        return IsSafeReturnUrl(ReturnUrl)
            ? LocalRedirect(ReturnUrl!)
            : RedirectToPage(new { saved = true });
    }

    private bool IsSafeReturnUrl(string? url) =>
        !string.IsNullOrEmpty(url) && Url.IsLocalUrl(url) && !url.StartsWith("/Display", StringComparison.OrdinalIgnoreCase);
}
