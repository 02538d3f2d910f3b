using LowVisionAid.Data.Entities;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Plans;

public sealed class DetailsModel(PlanDetailsHandler handler, ChoosePlanOptionHandler choose) : PageModel
{
    public PlanView Plan { get; private set; } = null!;

    /// <summary>Why a choice was refused, shown at the top of the page.</summary>
    [TempData]
    public string? ChoiceProblem { get; set; }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var plan = await handler.HandleAsync(id, ct).ConfigureAwait(false);
        if (plan is null)
        {
            return NotFound();
        }

        Plan = plan;
        return Page();
    }

    /// <summary>Chooses one option of a goal for the handout, in place of any earlier choice for that goal.</summary>
    public async Task<IActionResult> OnPostChooseAsync(int id, int goal, PlanOptionList list, int index, CancellationToken ct)
    {
        var (found, problem) = await choose.ChooseAsync(id, new PlanOptionRef(goal, list, index), ct).ConfigureAwait(false);
        if (!found)
        {
            return NotFound();
        }

        ChoiceProblem = problem;
        return Redirect($"/Plans/{id}#{CardId(goal, list == PlanOptionList.KitDevices, index)}");
    }

    /// <summary>Clears the choice for one goal.</summary>
    public async Task<IActionResult> OnPostClearAsync(int id, int goal, PlanOptionList list, int index, CancellationToken ct)
    {
        if (!await choose.ClearAsync(id, goal, ct).ConfigureAwait(false))
        {
            return NotFound();
        }

        return Redirect($"/Plans/{id}#{CardId(goal, list == PlanOptionList.KitDevices, index)}");
    }

    /// <summary>One option as a card: its figures, its reasons, a link to record a trial of it and its choice.</summary>
    public OptionCard Card(OptionRow option, int goal, int index, bool fromKit)
    {
        var place = new PlanOptionRef(goal, fromKit ? PlanOptionList.KitDevices : PlanOptionList.Options, index);
        return new(option, TrialLink(option), CardId(goal, fromKit, index), Plan.Id, place, Plan.Choices.Contains(place));
    }

    public static string CardId(int goal, bool fromKit, int index) =>
        string.Create(System.Globalization.CultureInfo.InvariantCulture, $"goal-{goal}-{(fromKit ? "kit" : "option")}-{index}");

    public string TrialLink(OptionRow option) =>
        option.KitCode is { } code
            ? $"/Trials/New?planId={Plan.Id}&kit={Uri.EscapeDataString(code)}"
            : $"/Trials/New?planId={Plan.Id}&device={Uri.EscapeDataString(option.Kind)}";
}

/// <param name="Chosen">True when the clinician chose this option for the handout.</param>
public sealed record OptionCard(OptionRow Option, string TrialLink, string HeadingId, int PlanId, PlanOptionRef Place, bool Chosen);
