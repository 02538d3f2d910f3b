namespace LowVisionAid.Web.Security;

/// <summary>
/// Who may reach the app, from configuration section <c>Access</c>. By default the app listens on 127.0.0.1 only
/// and needs no sign-in (one PC, one person at a time). <see cref="AllowLan"/> is the explicit setting that lets it
/// listen on a network address, and then sign-in is always required, as it is when the database is a shared server. Bound as options at start (SecuritySetup).
/// </summary>
public sealed class AccessSettings
{
    public const string Section = "Access";

    /// <summary>Allow listening on a non-loopback address (set <c>Access:AllowLan=true</c> and <c>--urls</c>).</summary>
    public bool AllowLan { get; init; }

    /// <summary>Require sign-in even on loopback (<c>Access:RequireSignIn=true</c>). Always on when <see cref="AllowLan"/> is.</summary>
    public bool RequireSignIn { get; init; }

    /// <summary>
    /// True when the clinic's database is a shared server (set from the <c>Database</c> section at start, not here):
    /// other PCs reach the same records, so sign-in is always required.
    /// </summary>
    public bool SharedDatabase { get; set; }

    /// <summary>True when every page except sign-in and static files needs a signed-in user.</summary>
    public bool SignInRequired => RequireSignIn || AllowLan || SharedDatabase;

    /// <summary>
    /// The section bound as the options are (<c>IOptions&lt;AccessSettings&gt;</c>), for the one decision made before
    /// the services exist: whether the configured addresses may be listened on (<see cref="NetworkExposure"/>).
    /// </summary>
    public static AccessSettings From(IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        return configuration.GetSection(Section).Get<AccessSettings>() ?? new AccessSettings();
    }
}
