using System.Text;
using Deque.AxeCore.Commons;
using Deque.AxeCore.Playwright;

namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// An axe-core scan of the page as it is now: WCAG 2.0–2.2 A and AA, best practice, and the AAA contrast rule
/// (7:1 for text), which the project requires. Any violation fails, listing each rule id, its help and targets.
/// </summary>
public static class AxeScan
{
    private static readonly List<string> Tags = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa", "best-practice"];

    public static async Task AssertNoViolationsAsync(IPage page, string what)
    {
        ArgumentNullException.ThrowIfNull(page);
        var options = new AxeRunOptions
        {
            RunOnly = new RunOnlyOptions { Type = "tag", Values = Tags },
            // Every rule still runs; passing and inapplicable rules come back with one element each instead of every
            // element they checked, which on a long page is most of the scan's time (axe-core's resultTypes option).
            ResultTypes = [ResultType.Violations, ResultType.Incomplete],
            Rules = new Dictionary<string, RuleOptions>
            {
                ["color-contrast-enhanced"] = new() { Enabled = true },
            },
        };

        var result = await page.RunAxe(options);

        // A scan that checked nothing would pass vacuously; a real page always passes some rules.
        Assert.True(result.Passes.Length > 0, $"axe ran no rule on {what}.");
        var ran = result.Passes.Concat(result.Violations).Concat(result.Incomplete).Select(rule => rule.Id).ToHashSet(StringComparer.Ordinal);
        Assert.True(ran.Contains("color-contrast-enhanced"), $"axe did not run the 7:1 contrast rule on {what}; it ran {string.Join(", ", ran)}.");
        Assert.True(result.Violations.Length == 0, Describe(what, result.Violations));
    }

    private static string Describe(string what, AxeResultItem[] violations)
    {
        var text = new StringBuilder().Append(CultureInfo.InvariantCulture, $"axe found {violations.Length} violation(s) on {what}:");
        foreach (var violation in violations)
        {
            text.AppendLine().Append(CultureInfo.InvariantCulture, $"- {violation.Id} ({violation.Impact}): {violation.Help}");
            foreach (var node in violation.Nodes)
            {
                var checks = node.Any.Concat(node.All).Concat(node.None).Select(check => check.Message);
                text.AppendLine().Append(CultureInfo.InvariantCulture, $"    at {node.Target}: {string.Join("; ", checks)}");
            }
        }

        return text.ToString();
    }
}
