namespace LowVisionAid.Web.Display;

/// <summary>The colour scheme the pages are drawn in.</summary>
public enum ColourScheme
{
    /// <summary>Dark text on a white background.</summary>
    Standard,

    /// <summary>White and yellow text on a black background.</summary>
    HighContrast,
}

/// <summary>The base size of the text on every page.</summary>
public enum TextSize
{
    /// <summary>The default size (already larger than a browser's default).</summary>
    Standard,

    /// <summary>About a quarter larger again.</summary>
    Large,
}

/// <summary>
/// How a reader wants the pages drawn. Remembered in a cookie set by a plain form post, and applied on the server
/// as classes on the html element, so it works without JavaScript and before the first paint.
/// </summary>
public sealed record DisplayPreferences(ColourScheme Scheme, TextSize Text)
{
    /// <summary>The cookie that remembers the choice.</summary>
    public const string CookieName = "lva-display";

    /// <summary>Standard colours and standard text.</summary>
    public static DisplayPreferences Default { get; } = new(ColourScheme.Standard, TextSize.Standard);

    /// <summary>The classes for the html element: <c>scheme-standard</c> or <c>scheme-contrast</c>, <c>text-standard</c> or <c>text-large</c>.</summary>
    public string CssClass => $"{SchemeToken(Scheme)} {TextToken(Text)}";

    /// <summary>The value written to the cookie, e.g. <c>scheme-contrast.text-large</c>.</summary>
    public string ToCookieValue() => $"{SchemeToken(Scheme)}.{TextToken(Text)}";

    /// <summary>Reads a cookie value; anything unrecognised falls back to the default for that part.</summary>
    public static DisplayPreferences FromCookieValue(string? value)
    {
        if (string.IsNullOrWhiteSpace(value))
        {
            return Default;
        }

        var parts = value.Split('.', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        var scheme = parts.Contains(SchemeToken(ColourScheme.HighContrast), StringComparer.Ordinal)
            ? ColourScheme.HighContrast
            : ColourScheme.Standard;
        var text = parts.Contains(TextToken(TextSize.Large), StringComparer.Ordinal) ? TextSize.Large : TextSize.Standard;
        return new(scheme, text);
    }

    /// <summary>The preferences remembered for this request, or the default.</summary>
    public static DisplayPreferences From(HttpRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        return FromCookieValue(request.Cookies[CookieName]);
    }

    /// <summary>Remembers these preferences for a year.</summary>
    public void WriteTo(HttpResponse response)
    {
        ArgumentNullException.ThrowIfNull(response);
        response.Cookies.Append(CookieName, ToCookieValue(), new CookieOptions
        {
            HttpOnly = true,
            IsEssential = true,
            SameSite = SameSiteMode.Lax,
            Secure = response.HttpContext.Request.IsHttps,
            MaxAge = TimeSpan.FromDays(365),
            Path = "/",
        });
    }

    private static string SchemeToken(ColourScheme scheme) => scheme == ColourScheme.HighContrast ? "scheme-contrast" : "scheme-standard";

    private static string TextToken(TextSize text) => text == TextSize.Large ? "text-large" : "text-standard";
}
