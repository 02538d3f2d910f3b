using System.Net;

namespace LowVisionAid.Web.Security;

/// <summary>Refuses to start on a network address unless <see cref="AccessSettings.AllowLan"/> says so.</summary>
internal static class NetworkExposure
{
    public const string RefusalMessage =
        "LowVisionAid is set to listen on a network address, but it holds health information and listens on this " +
        "computer only (127.0.0.1) unless you allow the network explicitly. To let other PCs on the clinic network reach it, " +
        "set Access:AllowLan=true (sign-in is then required; see docs/security.md), or remove the address to stay on 127.0.0.1.";

    /// <summary>The addresses the server is configured to listen on: <c>urls</c> and Kestrel endpoints.</summary>
    public static IReadOnlyList<string> ConfiguredUrls(IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var urls = new List<string>();
        foreach (var key in new[] { "urls", "ASPNETCORE_URLS", "URLS" })
        {
            if (configuration[key] is { Length: > 0 } value)
            {
                urls.AddRange(value.Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
            }
        }

        foreach (var endpoint in configuration.GetSection("Kestrel:Endpoints").GetChildren())
        {
            if (endpoint["Url"] is { Length: > 0 } url)
            {
                urls.Add(url);
            }
        }

        foreach (var key in new[] { "http_ports", "https_ports", "HTTP_PORTS", "HTTPS_PORTS" })
        {
            if (configuration[key] is { Length: > 0 } ports)
            {
                urls.AddRange(ports.Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).Select(p => $"http://*:{p}"));
            }
        }

        return urls.Distinct(StringComparer.OrdinalIgnoreCase).ToList();
    }

    /// <summary>True for 127.0.0.0/8, ::1 and localhost; false for wildcards (*, +, 0.0.0.0, [::]) and any other host.</summary>
    public static bool IsLoopbackUrl(string url)
    {
        ArgumentNullException.ThrowIfNull(url);
        var rest = url.Contains("://", StringComparison.Ordinal) ? url[(url.IndexOf("://", StringComparison.Ordinal) + 3)..] : url;
        if (rest.StartsWith('['))
        {
            var close = rest.IndexOf(']', StringComparison.Ordinal);
            return close > 0 && IPAddress.TryParse(rest[1..close], out var v6) && IPAddress.IsLoopback(v6);
        }

        var host = rest.Split(':', '/')[0];
        return string.Equals(host, "localhost", StringComparison.OrdinalIgnoreCase)
            || (IPAddress.TryParse(host, out var address) && IPAddress.IsLoopback(address));
    }

    /// <summary>Throws with <see cref="Refusal"/> when a configured address is not loopback and the LAN is not allowed.</summary>
    public static void Validate(IConfiguration configuration, AccessSettings settings)
    {
        if (Refusal(configuration, settings) is { } refusal)
        {
            throw new InvalidOperationException(refusal);
        }
    }

    /// <summary><see cref="RefusalMessage"/> with the network addresses, when the app must not start; otherwise null.</summary>
    public static string? Refusal(IConfiguration configuration, AccessSettings settings)
    {
        ArgumentNullException.ThrowIfNull(settings);
        var exposed = ConfiguredUrls(configuration).Where(u => !IsLoopbackUrl(u)).ToList();
        return exposed.Count > 0 && !settings.AllowLan ? RefusalMessage + " Network address: " + string.Join(", ", exposed) + "." : null;
    }

    /// <summary>True when the request came over loopback (or from inside the process, with no network address).</summary>
    public static bool IsLocalRequest(HttpContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var remote = context.Connection.RemoteIpAddress;
        return remote is null || IPAddress.IsLoopback(remote);
    }
}
