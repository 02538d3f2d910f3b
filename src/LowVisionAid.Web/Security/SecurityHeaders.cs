namespace LowVisionAid.Web.Security;

/// <summary>
/// Response headers for every response: a Content-Security-Policy that allows scripts, styles and fonts from the
/// app itself only (no inline script, no framing), no MIME sniffing, no referrer, and no caching of pages that may
/// hold client information on a shared PC.
/// </summary>
internal static class SecurityHeaders
{
    public const string ContentSecurityPolicy =
        "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' data:; font-src 'self'; connect-src 'self'; " +
        "object-src 'none'; base-uri 'none'; form-action 'self'; frame-ancestors 'none'";

    public static IApplicationBuilder UseSecurityHeaders(this IApplicationBuilder app) => app.Use(async (context, next) =>
    {
        var headers = context.Response.Headers;
        headers.ContentSecurityPolicy = ContentSecurityPolicy;
        headers.XContentTypeOptions = "nosniff";
        headers.XFrameOptions = "DENY";
        headers["Referrer-Policy"] = "no-referrer";
        headers["Cross-Origin-Opener-Policy"] = "same-origin";
        headers["Cross-Origin-Resource-Policy"] = "same-origin";
        headers["Permissions-Policy"] = "camera=(), microphone=(), geolocation=(), payment=(), usb=()";
        if (context.Request.IsHttps)
        {
            headers.StrictTransportSecurity = "max-age=31536000";
        }

        context.Response.OnStarting(() =>
        {
            var type = context.Response.ContentType ?? "";
            if (!type.StartsWith("text/css", StringComparison.OrdinalIgnoreCase)
                && !type.StartsWith("text/javascript", StringComparison.OrdinalIgnoreCase)
                && !type.StartsWith("font/", StringComparison.OrdinalIgnoreCase)
                && !type.StartsWith("image/", StringComparison.OrdinalIgnoreCase))
            {
                context.Response.Headers.CacheControl = "no-store";
            }

            return Task.CompletedTask;
        });
        await next(context).ConfigureAwait(false);
    });
}
