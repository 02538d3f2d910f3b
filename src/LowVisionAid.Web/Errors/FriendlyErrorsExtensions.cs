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
    /// Unknown addresses and records give the friendly "Page not found" page; a fault gives the "Something went
    /// wrong" page. Requests under <c>/api</c> get ProblemDetails instead.
    /// </summary>
    public static WebApplication UseFriendlyErrors(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        var development = app.Environment.IsDevelopment();

        app.UseWhen(IsApi, api =>
        {
            api.UseExceptionHandler();
            api.UseStatusCodePages();
        });

        app.UseWhen(context => !IsApi(context), site =>
        {
            if (!development)
            {
                site.UseExceptionHandler("/Error");
            }

            site.UseStatusCodePagesWithReExecute("/Status/{0}");
        });

        return app;
    }

    private static bool IsApi(HttpContext context) => context.Request.Path.StartsWithSegments("/api", StringComparison.OrdinalIgnoreCase);
}
