namespace LowVisionAid.Web.Errors;

/// <summary>
/// What a reader sees when something goes wrong: a plain page for people (never a stack trace outside Development),
/// and ProblemDetails JSON for the API under <c>/api</c>.
/// </summary>
public static class FriendlyErrorsExtensions
{
    /// <summary>Registers ProblemDetails, used by the API's errors.</summary>
    public static IServiceCollection AddFriendlyErrors(this IServiceCollection services) => services.AddProblemDetails();

    /// <summary>
    /// Unknown addresses and records give the friendly "Page not found" page (status-code pages). Requests under
    /// <c>/api</c> get ProblemDetails instead, for faults too. Call it after Program.cs' own
    /// <c>UseExceptionHandler("/Error")</c>, which shows people the "Something went wrong" page outside Development.
    /// </summary>
    public static WebApplication UseFriendlyErrors(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);

        app.UseWhen(IsApi, api =>
        {
            api.UseExceptionHandler();
            api.UseStatusCodePages();
        });

        app.UseWhen(context => !IsApi(context), site => site.UseStatusCodePagesWithReExecute("/Status/{0}"));
        return app;
    }

    private static bool IsApi(HttpContext context) => context.Request.Path.StartsWithSegments("/api", StringComparison.OrdinalIgnoreCase);
}
