using System.Net;
using System.Text.RegularExpressions;
using LowVisionAid.Web.Tests.Support;

namespace LowVisionAid.Web.Tests.Pages.Site;

/// <summary>
/// Every form names the address it posts to. A form without an action posts to the address as shown, fragment and
/// all: after the skip link that ends in #main, and the answer (the form back with its errors) then moves the focus
/// to main instead of the error summary. The rendered check walks the demo clinic from the home page; the source
/// check also covers forms the walk cannot reach (first run, sign-in when it is off).
/// </summary>
public sealed partial class FormActionTests
{
    [Fact]
    [Trait("Category", "Slow")]
    public async Task Every_form_on_every_page_of_the_demo_clinic_renders_an_explicit_action()
    {
        using var app = new ClinicApp(loadDemo: true);
        using var browser = app.Browser();

        var pages = await CrawlAsync(browser, ["/", "/Display", "/Account/SignIn", "/Calculator/Explorer"]);

        var forms = pages.SelectMany(p => FormTag().Matches(p.Html).Select(f => (p.Url, Tag: f.Value))).ToList();
        // The demo clinic has the visit, trial, plan, settings, kit and admin forms at least.
        Assert.True(forms.Count >= 15, $"Only {forms.Count} forms found on {pages.Count} pages.");
        Assert.Contains(pages, p => p.Url.StartsWith("/Visits/New?clientId=", StringComparison.Ordinal));
        Assert.Contains(pages, p => p.Url.StartsWith("/Trials/New?planId=", StringComparison.Ordinal));
        Assert.Contains(pages, p => p.Url.EndsWith("/Edit", StringComparison.Ordinal) && p.Url.StartsWith("/Visits/", StringComparison.Ordinal));
        var missing = forms
            .Where(f => ActionAttribute().Match(f.Tag) is not { Success: true } a || !a.Groups[1].Value.StartsWith('/') || a.Groups[1].Value.Contains('#', StringComparison.Ordinal))
            .Select(f => $"{f.Url}: {f.Tag}")
            .ToList();
        Assert.True(missing.Count == 0, "Forms without an explicit action:\n" + string.Join('\n', missing));
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_visit_form_keeps_its_client_and_a_trial_form_its_plan_in_the_action()
    {
        using var app = new ClinicApp(loadDemo: true);
        using var browser = app.Browser();
        var pages = await CrawlAsync(browser, ["/"]);

        var visit = pages.First(p => p.Url.StartsWith("/Visits/New?clientId=", StringComparison.Ordinal));
        Assert.Contains($"action=\"/Visits/New?clientId={QueryId().Match(visit.Url).Value}\"", visit.Html, StringComparison.Ordinal);
        var trial = pages.First(p => p.Url.StartsWith("/Trials/New?planId=", StringComparison.Ordinal));
        Assert.Contains($"action=\"/Trials/New?planId={QueryId().Match(trial.Url).Value}\"", trial.Html, StringComparison.Ordinal);
        var edit = pages.First(p => VisitEdit().IsMatch(p.Url));
        Assert.Contains($"action=\"{edit.Url}\"", edit.Html, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_form_in_the_page_sources_names_its_page_or_its_action()
    {
        var pagesFolder = Path.Combine(RepositoryRoot(), "src", "LowVisionAid.Web", "Pages");
        var files = Directory.GetFiles(pagesFolder, "*.cshtml", SearchOption.AllDirectories);

        var tags = files.SelectMany(f => FormTag().Matches(File.ReadAllText(f)).Select(t => (File: Path.GetRelativePath(pagesFolder, f), Tag: t.Value))).ToList();

        Assert.True(tags.Count >= 20, $"Only {tags.Count} form tags found under {pagesFolder}.");
        var missing = tags
            .Where(t => !t.Tag.Contains("asp-page=\"/", StringComparison.Ordinal) && !t.Tag.Contains("action=\"/", StringComparison.Ordinal))
            .Select(t => $"{t.File}: {t.Tag}")
            .ToList();
        Assert.True(missing.Count == 0, "Forms that post to the address as shown:\n" + string.Join('\n', missing));
    }

    [Fact]
    public void No_field_in_the_page_sources_is_bound_through_an_indexer()
    {
        // ASP.NET Core compiles an asp-for holding an indexer (Input.Goals[i].Task) again on every render, about a
        // millisecond each; rows go through a partial drawn with FormRows.For instead (its asp-for is a plain member).
        var pagesFolder = Path.Combine(RepositoryRoot(), "src", "LowVisionAid.Web", "Pages");
        var files = Directory.GetFiles(pagesFolder, "*.cshtml", SearchOption.AllDirectories);

        var bindings = files.SelectMany(f => AspFor().Matches(File.ReadAllText(f)).Select(m => (File: Path.GetRelativePath(pagesFolder, f), For: m.Groups[1].Value))).ToList();

        Assert.True(bindings.Count >= 40, $"Only {bindings.Count} asp-for bindings found under {pagesFolder}.");
        var indexed = bindings.Where(b => b.For.Contains('[', StringComparison.Ordinal)).Select(b => $"{b.File}: {b.For}").ToList();
        Assert.True(indexed.Count == 0, "Fields bound through an indexer:\n" + string.Join('\n', indexed));
    }

    /// <summary>
    /// Follows the site's own links from the seeds, visiting one address of each shape (digits stand for any id),
    /// and returns every HTML page that answered 200.
    /// </summary>
    private static async Task<List<(string Url, string Html)>> CrawlAsync(HttpClient browser, IEnumerable<string> seeds)
    {
        var queue = new Queue<string>(seeds);
        var seen = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        var pages = new List<(string Url, string Html)>();
        while (queue.Count > 0 && pages.Count < 300)
        {
            var url = queue.Dequeue();
            if (!seen.Add(Digits().Replace(url, "N")))
            {
                continue;
            }

            using var response = await browser.GetAsync(new Uri(url, UriKind.Relative));
            if (response.StatusCode != HttpStatusCode.OK || response.Content.Headers.ContentType?.MediaType != "text/html")
            {
                continue;
            }

            var html = await response.Content.ReadAsStringAsync();
            pages.Add((url, html));
            foreach (Match link in Link().Matches(html))
            {
                var target = WebUtility.HtmlDecode(link.Groups[1].Value).Split('#')[0];
                if (target.Length > 0 && !target.StartsWith("//", StringComparison.Ordinal) && !target.Contains("handler=", StringComparison.OrdinalIgnoreCase))
                {
                    queue.Enqueue(target);
                }
            }
        }

        return pages;
    }

    private static string RepositoryRoot()
    {
        var folder = new DirectoryInfo(AppContext.BaseDirectory);
        while (folder is not null && !File.Exists(Path.Combine(folder.FullName, "LowVisionAid.sln")))
        {
            folder = folder.Parent;
        }

        Assert.NotNull(folder);
        return folder.FullName;
    }

    [GeneratedRegex("<form(?=[\\s>])[^>]*>", RegexOptions.IgnoreCase)]
    private static partial Regex FormTag();

    [GeneratedRegex("\\basp-for=\"([^\"]*)\"")]
    private static partial Regex AspFor();

    [GeneratedRegex("\\baction=\"([^\"]*)\"")]
    private static partial Regex ActionAttribute();

    [GeneratedRegex("href=\"(/[^\"]*)\"")]
    private static partial Regex Link();

    [GeneratedRegex("\\d+")]
    private static partial Regex Digits();

    [GeneratedRegex("(?<==)\\d+")]
    private static partial Regex QueryId();

    [GeneratedRegex("^/Visits/\\d+/Edit$")]
    private static partial Regex VisitEdit();
}
