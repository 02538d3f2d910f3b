using LowVisionAid.TestSupport;

namespace LowVisionAid.Web.Tests.Support;

/// <summary>
/// The app over its own SQLite file in a fresh temporary folder, starting from the migrated template database
/// (<see cref="TemplateDatabase"/>); the app's own start-up still runs on it, as in production. The demo clinic is
/// off unless a test asks for it, so each test sees only the records it makes. A test that depends on today's date
/// passes its own clock.
/// </summary>
public sealed class ClinicApp : ClinicHost
{
    public ClinicApp(bool loadDemo = false, TimeProvider? clock = null)
    {
        LoadDemo = loadDemo;
        Clock = clock;
    }

    /// <summary>A client that keeps cookies (for antiforgery) and does not follow redirects.</summary>
    public HttpClient Browser() => NewBrowserClient();
}
