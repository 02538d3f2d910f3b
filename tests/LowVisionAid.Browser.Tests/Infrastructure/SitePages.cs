namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>The pages every page-wide check (axe scan, reflow, zoom, keyboard) visits, with the heading each must show.</summary>
public static class SitePages
{
    /// <summary>Address (relative) and the text of its h1.</summary>
    public static readonly IReadOnlyList<(string Path, string Heading)> All =
    [
        ("", "LowVisionAid"),
        ("Display", "Display settings"),
        ("Calculator", "Quick calculator"),
        ("Calculator/Explorer", "Magnifier explorer"),
        // The clinic pages, on the demo clinic loaded into each test class's own empty database.
        ("Clients", "Clients"),
        ("Clients/New", "Add a client"),
        ("Clients/1", "Client DEMO-01"),
        ("Clients/1/Edit", "Edit client DEMO-01"),
        ("Visits/New?clientId=1", "Record a visit for DEMO-01"),
        ("Visits/1", "Visit of"),
        ("Visits/1/Edit", "Edit visit for DEMO-01"),
        ("Plans/1", "Plan for DEMO-01"),
        // The print views (no site navigation: made for printing) and the explanation for a plan without a choice
        // (demo plan 3). /Plans/1/Print with no "for" is the client view.
        ("Plans/1/Print?for=client", "Your magnifier plan"),
        ("Plans/1/Print?for=clinician", "Magnifier plan: clinician summary"),
        ("Plans/3/Handout", "Client handout"),
        ("Trials/New?planId=1", "Record a trial for DEMO-01"),
        ("FollowUps", "Follow-ups due"),
        ("Kit", "Trial kit"),
        ("Kit/New", "Add a device to the kit"),
        ("Settings", "Settings"),
        // Export, erasure, administration and sign-in: reachable over loopback with sign-in off (the tests' app).
        ("Clients/1/Export", "Export the whole record of client DEMO-01"),
        ("Clients/1/Erase", "Erase client DEMO-01 completely"),
        ("Admin/Users", "Users"),
        ("Admin/Audit", "Audit trail"),
        ("Admin/Backup", "Backup and restore"),
        ("Account/SignIn", "Sign in"),
        ("no-such-page", "Page not found"),
    ];

    /// <summary>Pages made for printing, without the site's header and navigation (their own links sit in the main content).</summary>
    public static readonly IReadOnlySet<string> WithoutSiteNavigation = new HashSet<string>(StringComparer.Ordinal)
    {
        "Plans/1/Print?for=client", "Plans/1/Print?for=clinician",
    };

    public static TheoryData<string, string> Paths()
    {
        var data = new TheoryData<string, string>();
        foreach (var (path, heading) in All)
        {
            data.Add(path, heading);
        }

        return data;
    }

    /// <summary>Every page in both colour schemes, standard then high contrast (for the axe scan and the reflow check).</summary>
    public static TheoryData<string, string, bool> PathsInBothSchemes() => EveryPageOffAndOn();

    /// <summary>Every page with the standard text, then the larger text (for the zoom check).</summary>
    public static TheoryData<string, string, bool> PathsInBothTextSizes() => EveryPageOffAndOn();

    private static TheoryData<string, string, bool> EveryPageOffAndOn()
    {
        var data = new TheoryData<string, string, bool>();
        foreach (var (path, heading) in All)
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
