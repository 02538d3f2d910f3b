using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Plans;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Plans;

/// <summary>
/// The plan page. A GET reads only the plan's stamp (<see cref="PlanDetailsHandler.StampAsync"/>); the body comes from
/// the cache tag keyed by it, rendered by <see cref="PlanPageBodyViewComponent"/> when the key is new. The option
/// cards' choice buttons post the page's one form (outside the cache, so the cached body holds no antiforgery token).
/// </summary>
public sealed class DetailsModel(PlanDetailsHandler handler, ChoosePlanOptionHandler choose) : PageModel
{
    /// <summary>A body no request asked for in this long leaves the memory cache.</summary>
    public static readonly TimeSpan BodyKeptFor = TimeSpan.FromMinutes(10);

    /// <summary>The form the choice buttons post with their <c>form</c> attribute.</summary>
    public const string ChoiceForm = "plan-choice";

    /// <summary>The name of the choice buttons' value: the option as <see cref="PlanOptionRef.Key"/>.</summary>
    public const string OptionField = "option";

    public PlanPageStamp Stamp { get; private set; } = null!;

    /// <summary>Why a choice was refused, shown at the top of the page.</summary>
    [TempData]
    public string? ChoiceProblem { get; set; }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        if (await handler.StampAsync(id, ct).ConfigureAwait(false) is not { } stamp)
        {
            return NotFound();
        }

        Stamp = stamp;
        return Page();
    }

    /// <summary>Chooses one option of a goal for the handout, in place of any earlier choice for that goal.</summary>
    public async Task<IActionResult> OnPostChooseAsync(int id, string? option, CancellationToken ct)
    {
        if (!PlanOptionRef.TryParse(option, out var place))
        {
            ChoiceProblem = ChoosePlanOptionHandler.NoSuchOption;
            return Redirect($"/Plans/{id}");
        }

        var (found, problem) = await choose.ChooseAsync(id, place, ct).ConfigureAwait(false);
        if (!found)
        {
            return NotFound();
        }

        ChoiceProblem = problem;
        return Redirect($"/Plans/{id}#{PlanBody.CardId(place)}");
    }

    /// <summary>Clears the choice for one goal.</summary>
    public async Task<IActionResult> OnPostClearAsync(int id, string? option, CancellationToken ct)
    {
        if (!PlanOptionRef.TryParse(option, out var place))
        {
            ChoiceProblem = ChoosePlanOptionHandler.NoSuchOption;
            return Redirect($"/Plans/{id}");
        }

        if (!await choose.ClearAsync(id, place.Goal, ct).ConfigureAwait(false))
        {
            return NotFound();
        }

        return Redirect($"/Plans/{id}#{PlanBody.CardId(place)}");
    }
}
