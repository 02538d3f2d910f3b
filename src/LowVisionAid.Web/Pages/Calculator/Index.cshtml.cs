using System.Globalization;
using LowVisionAid.Web.Calculator;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Calculator;

/// <summary>The quick calculator: a plan from typed measurements, without a client record. Nothing is saved.</summary>
public sealed class QuickCalculatorModel(QuickPlanHandler handler) : PageModel
{
    // Posted, not sent in the address: the figures are health information and addresses end up in logs.
    [BindProperty]
    public QuickPlanInput Input { get; set; } = new();

    public QuickPlanView? Plan { get; private set; }

    public static CultureInfo Culture => CultureInfo.CurrentCulture;

    public void OnGet()
    {
    }

    public IActionResult OnPost()
    {
        var outcome = handler.Handle(Input, Culture);
        foreach (var (field, message) in outcome.Errors)
        {
            ModelState.AddModelError(field.Length == 0 ? "" : $"{nameof(Input)}.{field}", message);
        }

        Plan = outcome.Plan;
        return Page();
    }

    public string? ErrorFor(string field) =>
        ModelState.TryGetValue($"{nameof(Input)}.{field}", out var entry) && entry.Errors.Count > 0 ? entry.Errors[0].ErrorMessage : null;

    public static string Dioptres(double value) => value.ToString("0.00", Culture) + " D";

    public static string Centimetres(double value) => value.ToString(value < 10 ? "0.0" : "0", Culture) + " cm";

    public static string Times(double value) => value.ToString("0.0", Culture) + "×";

    public static string Number(double value, string format = "0.##") => value.ToString(format, Culture);

    public static string YesNo(bool value) => value ? "Yes" : "No";

    public static string BothEyes(OptionView option)
    {
        ArgumentNullException.ThrowIfNull(option);
        if (!option.BothEyesPossible)
        {
            return "One eye only";
        }

        var text = "Possible";
        if (option.ConvergenceDemandPrismDioptres > 0)
        {
            text += "; convergence " + Number(option.ConvergenceDemandPrismDioptres, "0.#") + " Δ";
        }

        if (option.BaseInPrismDioptres is { } prism)
        {
            text += "; base-in prism by the add + 2 rule: " + Number(prism, "0.#") + " Δ";
        }

        return text;
    }
}
