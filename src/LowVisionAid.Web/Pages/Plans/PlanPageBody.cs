using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Web.Plans;
using Microsoft.AspNetCore.Mvc;

namespace LowVisionAid.Web.Pages.Plans;

/// <summary>
/// The plan page's body: everything under the heading but the refused-choice alert and the one choice form. The page
/// puts it in a cache tag keyed by <see cref="PlanPageStamp.Key"/>, so this loads the plan and reads its outputs only
/// when that key has no body yet.
/// </summary>
public sealed class PlanPageBodyViewComponent(PlanDetailsHandler handler, Infrastructure.ClinicCalendar calendar) : ViewComponent
{
    public async Task<IViewComponentResult> InvokeAsync(int id)
    {
        // Not cancelled with this request: the cache tag shares one render among the requests that wait for the key.
        // A plan removed between the page's stamp and this load: nothing to show (the next stamp is a 404).
        var plan = await handler.HandleAsync(id, CancellationToken.None).ConfigureAwait(false);
        return plan is null
            ? Content("")
            : View("~/Pages/Plans/_PlanBody.cshtml", new PlanBody(plan, calendar.DateAndTime(plan.Created.UtcDateTime)));
    }
}

/// <summary>The plan page body's model: the plan, and the cautions and option cards the page draws from it.</summary>
public sealed class PlanBody
{
    public PlanBody(PlanView plan, string made)
    {
        ArgumentNullException.ThrowIfNull(plan);
        Plan = plan;
        Made = made;
        var planned = plan.Outputs.Goals.Where(g => g.IsPlanned).ToList();
        CommonCautions = planned.Count == 0
            ? []
            : [.. planned[0].Cautions.Where(c => c != Caution.StartingPoint && planned.TrueForAll(g => g.Cautions.Contains(c)))];
    }

    public PlanView Plan { get; }

    /// <summary>When the plan was made, in the clinic's time zone.</summary>
    public string Made { get; }

    /// <summary>The caution that every figure is a starting point: the lead of the cautions box, whatever was planned.</summary>
    public static string StartingPoint => Caution.StartingPoint.Text;

    /// <summary>The cautions every planned goal carries, shown once above the goals (the starting point leads the box).</summary>
    public IReadOnlyList<Caution> CommonCautions { get; }

    /// <summary>The cautions of one goal that are not already shown for the whole plan.</summary>
    public IEnumerable<Caution> OwnCautions(PlannedGoal goal) => goal.Cautions.Where(c => c != Caution.StartingPoint && !CommonCautions.Contains(c));

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
        return new(ranked, name, fromKit, trialLink, CardId(place), Plan.Id, place, Plan.Choices.Contains(place),
            OptionUse.IsUsable(o), Plan.Outputs.Imperial);
    }

    /// <summary>The option card's element id, the page's anchor after a choice, e.g. <c>goal-0-kit-1</c>.</summary>
    public static string CardId(PlanOptionRef place) =>
        string.Create(System.Globalization.CultureInfo.InvariantCulture, $"goal-{place.Goal}-{(place.List == PlanOptionList.KitDevices ? "kit" : "option")}-{place.Index}");
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
