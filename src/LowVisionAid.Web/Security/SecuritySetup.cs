using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;
using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.DataProtection;
using Microsoft.AspNetCore.DataProtection.KeyManagement;
using Microsoft.AspNetCore.DataProtection.Repositories;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.Extensions.Options;

namespace LowVisionAid.Web.Security;

/// <summary>
/// Network exposure, sign-in and roles, the keys that protect the cookies, security headers and the audit trail.
/// Program.cs calls each piece once.
/// </summary>
internal static class SecuritySetup
{
    /// <summary>The Data Protection application name: cookies stay valid across restarts and content roots.</summary>
    public const string KeyRingName = "LowVisionAid";

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
        services.AddOptions<AccessSettings>().BindConfiguration(AccessSettings.Section)
            .PostConfigure<IOptions<ClinicDatabaseOptions>>((access, database) => access.SharedDatabase = database.Value.IsServer)
            .ValidateOnStart();
        services.AddSingleton(sp => sp.GetRequiredService<IOptions<AccessSettings>>().Value);
        services.AddHttpContextAccessor();

        // The keys that protect the sign-in and form cookies live in the data folder, so a restart (or a move of the
        // folder to another PC) keeps people signed in and open forms valid.
        services.AddDataProtection().SetApplicationName(KeyRingName);
        services.AddOptions<KeyManagementOptions>().Configure<ClinicFolders, ILoggerFactory>((o, folders, logs) =>
            o.XmlRepository = new FileSystemXmlRepository(new DirectoryInfo(folders.Keys), logs));

        // Audit trail: one line per record saved through the clinic context, in the same transaction.
        services.AddSingleton<IAuditActor, HttpAuditActor>();
        services.AddSingleton<AuditInterceptor>();
        services.ConfigureDbContext<ClinicDbContext>((sp, options) => options.AddInterceptors(sp.GetRequiredService<AuditInterceptor>()));
        services.AddScoped<AuditTrail>();

        // Sign-in: ASP.NET Core Identity on EF Core (PBKDF2-hashed passwords, lockout after repeated failures).
        services.AddIdentity<IdentityUser, IdentityRole>(o =>
            {
                o.Password.RequiredLength = PasswordRules.MinimumLength;
                o.Password.RequireDigit = false;
                o.Password.RequireLowercase = false;
                o.Password.RequireUppercase = false;
                o.Password.RequireNonAlphanumeric = false;
                o.Lockout.MaxFailedAccessAttempts = 5;
                o.Lockout.DefaultLockoutTimeSpan = TimeSpan.FromMinutes(15);
                o.Lockout.AllowedForNewUsers = true;
                o.User.RequireUniqueEmail = false;
            })
            .AddEntityFrameworkStores<ClinicDbContext>()
            .AddSignInManager<ClinicSignInManager>();   // logs refused sign-ins
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
        services.AddOptions<AuthorizationOptions>().Configure<AccessSettings>((o, access) =>
        {
            if (access.SignInRequired)
            {
                o.FallbackPolicy = new AuthorizationPolicyBuilder().RequireAuthenticatedUser().Build();
            }
        });

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

    /// <summary>The three roles exist (at start, after a restore, before an account is made).</summary>
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
}
