using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Http;

namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// A test-only fault: requests to <see cref="SitePath"/> or <see cref="ApiPath"/> throw after the app's own
/// pipeline (so inside its error handling), as a bug in a page or an endpoint would.
/// </summary>
public sealed class FaultInjection : IStartupFilter
{
    public const string SitePath = "/test-fault";
    public const string ApiPath = "/api/test-fault";
    public const string Secret = "Injected fault: this text must never reach the reader";

    public Action<IApplicationBuilder> Configure(Action<IApplicationBuilder> next) => app =>
    {
        next(app);
        app.Use((context, nextMiddleware) =>
            context.Request.Path == SitePath || context.Request.Path == ApiPath
                ? throw new InvalidOperationException(Secret)
                : nextMiddleware(context));
    };
}
