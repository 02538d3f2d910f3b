using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Web.Plans;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Plans;

public sealed class DetailsModel(PlanDetailsHandler handler, ChoosePlanOptionHandler choose, Infrastructure.ClinicCalendar calendar) : PageModel
{
    public PlanView Plan { get; private set; } = null!;

    /// <summary>Why a choice was refused, shown at the top of the page.</summary>
    [TempData]
    public string? ChoiceProblem { get; set; }

    /// <summary>When the plan was made, in the clinic's time zone.</summary>
    public string Made => calendar.DateAndTime(Plan.Created.UtcDateTime);

    /// <summary>The caution that every figure is a starting point: the lead of the cautions box, whatever was planned.</summary>
    public string StartingPoint => Caution.StartingPoint.Text;

    /// <summary>The cautions every planned goal carries, shown once above the goals (the starting point leads the box).</summary>
    public IReadOnlyList<Caution> CommonCautions { get; private set; } = [];

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var plan = await handler.HandleAsync(id, ct).ConfigureAwait(false);
        if (plan is null)
        {
            return NotFound();
        }

        Plan = plan;
        var planned = plan.Outputs.Goals.Where(g => g.IsPlanned).ToList();
        CommonCautions = planned.Count == 0
            ? []
            : [.. planned[0].Cautions.Where(c => c != Caution.StartingPoint && planned.TrueForAll(g => g.Cautions.Contains(c)))];
        return Page();
    }

    /// <summary>The cautions of one goal that are not already shown for the whole plan.</summary>
    public IEnumerable<Caution> OwnCautions(PlannedGoal goal) => goal.Cautions.Where(c => c != Caution.StartingPoint && !CommonCautions.Contains(c));

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

    /// <summary>Every option of a goal, generic options first, then the kit devices, each as a card.</summary>
    public IReadOnlyList<OptionCard> Cards(PlannedGoal goal, int g)
    {
        ArgumentNullException.ThrowIfNull(goal);
        return [.. goal.Options.Select((o, i) => Card(o, g, i, fromKit: false)), .. goal.KitDevices.Select((o, i) => Card(o, g, i, fromKit: true))];
    }

    private OptionCard Card(RankedOption ranked, int goal, int index, bool fromKit)
    {
        var place = new PlanOptionRef(goal, fromKit ? PlanOptionList.KitDevices : PlanOptionList.Options, index);
        var o = ranked.Option;
        var name = PlanText.Name(o, Plan.Outputs);
        var trialLink = o.KitDeviceId is { } code
            ? $"/Trials/New?planId={Plan.Id}&kit={Uri.EscapeDataString(code)}"
            : $"/Trials/New?planId={Plan.Id}&device={Uri.EscapeDataString(PlanText.Kind(o.Kind))}";
        return new(ranked, name, fromKit, trialLink, CardId(goal, fromKit, index), Plan.Id, place, Plan.Choices.Contains(place),
            OptionUse.IsUsable(o), Plan.Outputs.Imperial);
    }

    public static string CardId(int goal, bool fromKit, int index) =>
        string.Create(System.Globalization.CultureInfo.InvariantCulture, $"goal-{goal}-{(fromKit ? "kit" : "option")}-{index}");
}

/// <summary>One option of a goal: its row in the comparison table and its full figures one step away.</summary>
/// <param name="Chosen">True when the clinician chose this option for the handout.</param>
public sealed record OptionCard(
    RankedOption Ranked, string Name, bool FromKit, string TrialLink, string Id, int PlanId, PlanOptionRef Place, bool Chosen, bool Usable, bool Imperial)
{
    public MagnifierOption Option => Ranked.Option;

    /// <summary>The row's first cell: position and name, with the kit code for a kit device.</summary>
    public string Title => $"{(FromKit ? "Kit " : "")}{Ranked.Position}. {Name}{(Option.KitDeviceId is { } code ? $" ({code})" : "")}";
}
