namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>Visits the app's pages by following its own links from the start pages, bounded in count.</summary>
public static class Crawler
{
    public const int MaxPages = 400;

    /// <summary>Entry points that may not be linked from the home page (admin and account pages, per-client actions).</summary>
    public static readonly string[] StartPages =
    [
        "/", "/Clients", "/Clients/New", "/Account/SignIn", "/Account/SignOut", "/Admin/Users", "/Admin/Audit", "/Admin/Backup",
    ];

    public static async Task<IReadOnlyList<(string Url, HttpResponseMessage Response, string Body)>> CrawlAsync(FormClient client, IEnumerable<string>? extra = null)
    {
        var queue = new Queue<string>(StartPages.Concat(extra ?? []));
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var pages = new List<(string, HttpResponseMessage, string)>();
        while (queue.Count > 0 && pages.Count < MaxPages)
        {
            var url = queue.Dequeue();
            if (!seen.Add(url) || url.StartsWith("/css/", StringComparison.Ordinal) || url.StartsWith("/js/", StringComparison.Ordinal)
                || url.StartsWith("/lib/", StringComparison.Ordinal) || url.StartsWith("/fonts/", StringComparison.Ordinal)
                || url.Contains("/Erase", StringComparison.Ordinal) && pages.Count(p => p.Item1.Contains("/Erase", StringComparison.Ordinal)) >= 3)
            {
                continue;
            }

            var response = await client.Http.GetAsync(new Uri(url, UriKind.Relative));
            var body = await response.Content.ReadAsStringAsync();
            pages.Add((url, response, body));
            if (response.Content.Headers.ContentType?.MediaType == "text/html")
            {
                foreach (var link in Html.Links(body))
                {
                    queue.Enqueue(link);

                    // Export and erasure are reached from a client's page; until it links them, visit them directly.
                    if (System.Text.RegularExpressions.Regex.IsMatch(link, "^/Clients/[0-9]+$", System.Text.RegularExpressions.RegexOptions.None, TimeSpan.FromSeconds(1)))
                    {
                        queue.Enqueue(link + "/Export");
                        queue.Enqueue(link + "/Erase");
                    }
                }
            }
        }

        return pages;
    }
}
