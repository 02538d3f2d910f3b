using System.Globalization;
using LowVisionAid.Web.Handouts;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Calculator;

/// <summary>
/// Teaching explorer: power and eye distance of a hand magnifier against working distance, field and letters in
/// view. Works by submitting the form; with script, wwwroot/js/explorer.js asks <c>?handler=Figures</c> for the
/// same figures as JSON, so no formula lives in the browser.
/// </summary>
public sealed class ExplorerModel : PageModel
{
    public const string OutOfRange = "Enter a power between 1 and 80 D and an eye-to-lens distance between 1 and 100 cm.";

    [BindProperty(SupportsGet = true)]
    public string Power { get; set; } = "10";

    [BindProperty(SupportsGet = true)]
    public string EyeToLens { get; set; } = "25";

    public ExplorerFigures? Figures { get; private set; }

    public void OnGet() => Figures = Compute(Power, EyeToLens);

    public IActionResult OnGetFigures()
    {
        var figures = Compute(Power, EyeToLens);
        return figures is null
            ? BadRequest(new { error = OutOfRange })
            : new JsonResult(new
            {
                workingDistance = Cm(figures.WorkingDistanceCm),
                field = figures.FieldMm.ToString("0", CultureInfo.InvariantCulture) + " mm",
                letters = figures.LettersInView.ToString("0", CultureInfo.InvariantCulture),
            });
    }

    public static string Cm(double cm) => cm.ToString("0.#", CultureInfo.InvariantCulture) + " cm";

    private static ExplorerFigures? Compute(string? power, string? eye) =>
        double.TryParse(power, NumberStyles.Float, CultureInfo.InvariantCulture, out var p)
        && double.TryParse(eye, NumberStyles.Float, CultureInfo.InvariantCulture, out var e)
            ? ExplorerFigures.For(p, e)
            : null;
}
