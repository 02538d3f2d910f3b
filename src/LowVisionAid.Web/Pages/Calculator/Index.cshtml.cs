using System.Globalization;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Figures;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Calculator;

/// <summary>The quick calculator: a plan from typed measurements, without a client record. Nothing is saved.</summary>
public sealed class QuickCalculatorModel(QuickPlanHandler handler, TradeOffFigures figures) : PageModel
{
    // Posted, not sent in the address: the figures are health information and addresses end up in logs.
    [BindProperty]
    public QuickPlanInput Input { get; set; } = new();

    public QuickPlanView? Plan { get; private set; }

    /// <summary>The three trade-off figures for the calculated plan (empty without a plan).</summary>
    public IReadOnlyList<TradeOffFigure> Figures { get; private set; } = [];

    public static CultureInfo Culture => CultureInfo.CurrentCulture;

    /// <summary>
    /// True for a distance-viewing plan (<see cref="Ranking.IsDistanceTask"/>): its options have no page, so no letters
    /// in view, and sitting nearer has no field.
    /// </summary>
    public bool DistancePlan => Enum.TryParse<ReadingTask>(Input.Task, out var task) && Ranking.IsDistanceTask(task);

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
        if (Plan is not null)
        {
            Figures = FiguresFor(Plan, Input);
        }

        return Page();
    }

    /// <summary>
    /// The figures drawn from the plan's own numbers: (a) power against working distance and field and (b) the
    /// letters-in-view windows for every usable option with a field, and (c) the print-size ladder when a near
    /// acuity was given. The letters are the engine's count in whole letters, as the options show it.
    /// </summary>
    public IReadOnlyList<TradeOffFigure> FiguresFor(QuickPlanView plan, QuickPlanInput input)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(input);
        var result = new List<TradeOffFigure>(3);
        var target = PrintSizeNotation.Parse(input.TargetPrint, Culture).TryGetValue(out var typed) ? typed : (PrintSize?)null;
        var drawable = plan.Options
            .Where(o => o.IsApplicable && o.MeetsRequiredPower && o.IsPractical
                && o.LinearFieldCm is > 0 && o.CharactersInView is >= 1 && o.DeliveredPowerDioptres > 0 && o.WorkingDistanceCm > 0)
            .Select(o => new FigureOption(
                o.Name,
                Power.FromDioptres(o.DeliveredPowerDioptres),
                Distance.FromCentimetres(o.WorkingDistanceCm),
                Distance.FromCentimetres(o.LinearFieldCm!.Value),
                (int)Math.Floor(o.CharactersInView!.Value)))
            .ToList();
        if (drawable.Count > 0 && target is { } print)
        {
            result.Add(figures.PowerAgainstDistanceAndField(drawable, "calculator-power"));
            result.Add(figures.LettersInView(drawable, print, "calculator-window"));
        }

        var near = plan.Estimates.FirstOrDefault(e => e.Method == "NearAcuity");
        if (target is { } wanted && near?.ReserveRatio is { } ratio
            && NearAcuityNotation.Parse(input.NearAcuity, Culture).TryGetValue(out var acuity))
        {
            result.Add(figures.PrintSizeLadder(new PrintLadderData(acuity.Threshold, wanted, AcuityReserve.FromRatio(ratio), acuity.TestDistance), "calculator-ladder"));
        }

        return result;
    }

    public string? ErrorFor(string field) =>
        ModelState.TryGetValue($"{nameof(Input)}.{field}", out var entry) && entry.Errors.Count > 0 ? entry.Errors[0].ErrorMessage : null;
}
