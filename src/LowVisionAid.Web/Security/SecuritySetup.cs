using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Backup;
using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;

namespace LowVisionAid.Web.Security;

/// <summary>
/// Network exposure, sign-in and roles, security headers, the audit trail, and backups (including the automatic one
/// taken before any migration). Program.cs calls each piece once.
/// </summary>
internal static class SecuritySetup
{
    /// <summary>Configuration key for the backup folder; default <c>&lt;data folder&gt;/backups</c>.</summary>
    public const string BackupFolderKey = "BackupFolder";

    /// <summary>The answer to a form that could not be accepted at all (400).</summary>
    public const string BadRequestMessage =
        "This form could not be accepted: it arrived without its security token (the page may have been open a long time, or the app restarted) " +
        "or with characters that cannot be stored. Nothing was saved. Go back, reload the page and type the entry again.";

    public static WebApplicationBuilder AddClinicSecurity(this WebApplicationBuilder builder)
    {
        var settings = AccessSettings.From(builder.Configuration);
        NetworkExposure.Validate(builder.Configuration, settings);
        builder.WebHost.ConfigureKestrel(o => o.AddServerHeader = false);
        var services = builder.Services;
        services.AddSingleton(settings);
        services.AddHttpContextAccessor();

        // Request lines carry search text (?q=…), which may be a client's name or code: keep them out of the log.
        builder.Logging.AddFilter("Microsoft.AspNetCore.Hosting.Diagnostics", LogLevel.Warning);

        // Audit trail: one line per record saved through the clinic context, in the same transaction.
        services.AddSingleton<IAuditActor, HttpAuditActor>();
        services.AddSingleton<AuditInterceptor>();
        services.ConfigureDbContext<ClinicDbContext>((sp, options) => options.AddInterceptors(sp.GetRequiredService<AuditInterceptor>()));
        services.AddScoped<AuditTrail>();
        services.AddScoped(sp =>
        {
            var path = new SqliteConnectionStringBuilder(ClinicConnectionString(sp)).DataSource;
            var configured = sp.GetRequiredService<IConfiguration>()[BackupFolderKey];
            var folder = string.IsNullOrWhiteSpace(configured)
                ? Path.Combine(Path.GetDirectoryName(Path.GetFullPath(path))!, "backups")
                : Path.GetFullPath(configured, builder.Environment.ContentRootPath);
            return new DatabaseBackups(path, folder, sp.GetRequiredService<TimeProvider>());
        });

        // Sign-in: ASP.NET Core Identity on EF Core (PBKDF2-hashed passwords, lockout after repeated failures).
        services.AddIdentity<IdentityUser, IdentityRole>(o =>
            {
                o.Password.RequiredLength = 10;
                o.Password.RequireDigit = false;
                o.Password.RequireLowercase = false;
                o.Password.RequireUppercase = false;
                o.Password.RequireNonAlphanumeric = false;
                o.Lockout.MaxFailedAccessAttempts = 5;
                o.Lockout.DefaultLockoutTimeSpan = TimeSpan.FromMinutes(15);
                o.Lockout.AllowedForNewUsers = true;
                o.User.RequireUniqueEmail = false;
            })
            .AddEntityFrameworkStores<ClinicDbContext>();
        services.ConfigureApplicationCookie(o =>
        {
            o.Cookie.Name = "LowVisionAid.SignIn";
            o.Cookie.HttpOnly = true;
            o.Cookie.SameSite = SameSiteMode.Strict;
            o.Cookie.SecurePolicy = CookieSecurePolicy.SameAsRequest;
            o.LoginPath = "/Account/SignIn";
            o.LogoutPath = "/Account/SignOut";
            o.AccessDeniedPath = "/Account/NotAllowed";
            o.ExpireTimeSpan = TimeSpan.FromHours(8);
            o.SlidingExpiration = true;
        });
        services.AddSessionChecks();   // sign-out, a password change or a disabled account ends every session (SessionChecks)
        services.AddAntiforgery(o =>
        {
            o.Cookie.Name = "LowVisionAid.Form";
            o.Cookie.SameSite = SameSiteMode.Strict;
        });

        services.AddSingleton<IAuthorizationHandler, ClinicRoleHandler>();
        services.AddAuthorizationBuilder()
            .AddPolicy(ClinicPolicies.Administer, p => p.AddRequirements(new ClinicRoleRequirement([.. ClinicRoleHandler.RolesFor(ClinicPolicies.Administer)])))
            .AddPolicy(ClinicPolicies.ExportOrDelete, p => p.AddRequirements(new ClinicRoleRequirement([.. ClinicRoleHandler.RolesFor(ClinicPolicies.ExportOrDelete)])));
        if (settings.SignInRequired)
        {
            services.Configure<AuthorizationOptions>(o => o.FallbackPolicy = new AuthorizationPolicyBuilder().RequireAuthenticatedUser().Build());
        }

        services.Configure<RazorPagesOptions>(o =>
        {
            o.Conventions.AuthorizeFolder("/Admin", ClinicPolicies.Administer);
            o.Conventions.AllowAnonymousToPage("/Admin/FirstRun");
            o.Conventions.AllowAnonymousToFolder("/Account");
            o.Conventions.AllowAnonymousToPage("/Error");
        });
        services.Configure<MvcOptions>(o => o.Filters.Add<TeacherRestrictionFilter>());
        return builder;
    }

    /// <summary>Outermost: refuses other computers unless the LAN is allowed, then sets the security headers.</summary>
    public static WebApplication UseClinicSecurityHeaders(this WebApplication app)
    {
        var settings = app.Services.GetRequiredService<AccessSettings>();
        app.Use(async (context, next) =>
        {
            if (!settings.AllowLan && !NetworkExposure.IsLocalRequest(context))
            {
                context.Response.StatusCode = StatusCodes.Status403Forbidden;
                await context.Response.WriteAsync("LowVisionAid accepts connections from this computer only.", context.RequestAborted).ConfigureAwait(false);
                return;
            }

            await next(context).ConfigureAwait(false);

            // A refused form (no antiforgery token, or characters the form reader cannot accept) otherwise comes back empty.
            if (context.Response is { StatusCode: StatusCodes.Status400BadRequest, HasStarted: false, ContentLength: null or 0 })
            {
                context.Response.ContentType = "text/plain; charset=utf-8";
                await context.Response.WriteAsync(BadRequestMessage, context.RequestAborted).ConfigureAwait(false);
            }
        });
        app.UseSecurityHeaders();
        return app;
    }

    /// <summary>After routing: who is signed in, and may they see this page.</summary>
    public static WebApplication UseClinicSignIn(this WebApplication app)
    {
        app.UseAuthentication();
        app.UseAuthorization();
        return app;
    }

    /// <summary>
    /// Before any migration: a backup of an existing database that has a migration to apply (or still has the earlier
    /// separate access history). Then the schema is upgraded (<see cref="ClinicDatabase.UpgradeAsync"/>) and the three
    /// roles exist. Runs before the demo clinic is loaded.
    /// </summary>
    public static async Task PrepareAccessDatabaseAsync(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        await PrepareDatabaseAsync(app.Services).ConfigureAwait(false);
    }

    /// <inheritdoc cref="PrepareAccessDatabaseAsync"/>
    public static async Task PrepareDatabaseAsync(IServiceProvider root)
    {
        await using var scope = root.CreateAsyncScope();
        var services = scope.ServiceProvider;
        var clinic = services.GetRequiredService<ClinicDbContext>();
        var backups = services.GetRequiredService<DatabaseBackups>();
        BackupFile? taken = null;
        if (File.Exists(backups.DatabasePath) && new FileInfo(backups.DatabasePath).Length > 0)
        {
            var hasSchema = (await clinic.Database.GetAppliedMigrationsAsync().ConfigureAwait(false)).Any();
            var pending = (await clinic.Database.GetPendingMigrationsAsync().ConfigureAwait(false)).Any();
            if (hasSchema && pending)
            {
                taken = backups.Create("before-migration");
            }
        }

        await clinic.UpgradeAsync().ConfigureAwait(false);
        await EnsureRolesAsync(services.GetRequiredService<RoleManager<IdentityRole>>()).ConfigureAwait(false);
        if (taken is not null)
        {
            await services.GetRequiredService<AuditTrail>().RecordAsync(AuditAction.BackedUp, "Database", null, "Before migration: " + taken.Name, CancellationToken.None, AuditActors.System).ConfigureAwait(false);
        }
    }

    /// <summary>Every migration a restored backup may record (this build's, and the earlier separate access history's).</summary>
    public static IReadOnlySet<string> KnownMigrations(ClinicDbContext clinic) => clinic.KnownMigrations();

    public static async Task EnsureRolesAsync(RoleManager<IdentityRole> roles)
    {
        ArgumentNullException.ThrowIfNull(roles);
        foreach (var role in ClinicRoles.All)
        {
            if (!await roles.RoleExistsAsync(role).ConfigureAwait(false))
            {
                await roles.CreateAsync(new IdentityRole(role)).ConfigureAwait(false);
            }
        }
    }

    private static string ClinicConnectionString(IServiceProvider services) =>
        RelationalOptionsExtension.Extract(services.GetRequiredService<DbContextOptions<ClinicDbContext>>()).ConnectionString
        ?? throw new InvalidOperationException("The clinic database has no connection string.");
}
