using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>One page of a list that can grow: its rows, its number (from 1) and whether a later page exists.</summary>
public sealed record ListPage<T>(IReadOnlyList<T> Rows, int Number, bool HasNext)
{
    public bool HasPrevious => Number > 1;
}

/// <summary>Reads a page of an ordered query: one row more than the page holds tells whether another page follows.</summary>
public static class ListPage
{
    public static async Task<ListPage<T>> ReadAsync<T>(IQueryable<T> ordered, int page, int size, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(ordered);
        page = Math.Clamp(page, 1, int.MaxValue / size);
        var rows = await ordered.Skip((page - 1) * size).Take(size + 1).ToListAsync(ct).ConfigureAwait(false);
        return new(rows.Take(size).ToList(), page, rows.Count > size);
    }
}

/// <summary>
/// The links under a paged list (Shared/_Pager): what the list is, which page this is, and the addresses of the
/// pages before and after it (null where there is none).
/// </summary>
public sealed record Pager(string Label, int Number, string? PreviousUrl, string? NextUrl)
{
    /// <summary>A pager for <paramref name="page"/>, with each neighbour's address made by <paramref name="urlFor"/>.</summary>
    public static Pager For<T>(string label, ListPage<T> page, Func<int, string> urlFor)
    {
        ArgumentNullException.ThrowIfNull(page);
        ArgumentNullException.ThrowIfNull(urlFor);
        return new(label, page.Number, page.HasPrevious ? urlFor(page.Number - 1) : null, page.HasNext ? urlFor(page.Number + 1) : null);
    }

    public bool IsNeeded => PreviousUrl is not null || NextUrl is not null;
}
