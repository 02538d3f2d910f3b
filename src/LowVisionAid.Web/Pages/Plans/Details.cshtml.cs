using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Plans;

public sealed class DetailsModel(PlanDetailsHandler handler) : PageModel
{
    public PlanView Plan { get; private set; } = null!;

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

    /// <summary>One option as a card: its figures, its reasons and a link to record a trial of it.</summary>
    public OptionCard Card(OptionRow option, int goal, int index, bool fromKit) =>
        new(option, TrialLink(option), string.Create(System.Globalization.CultureInfo.InvariantCulture, $"goal-{goal}-{(fromKit ? "kit" : "option")}-{index}"));

    public string TrialLink(OptionRow option) =>
        option.KitCode is { } code
            ? $"/Trials/New?planId={Plan.Id}&kit={Uri.EscapeDataString(code)}"
            : $"/Trials/New?planId={Plan.Id}&device={Uri.EscapeDataString(option.Kind)}";
}

public sealed record OptionCard(OptionRow Option, string TrialLink, string HeadingId);
