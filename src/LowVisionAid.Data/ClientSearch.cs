using System.Globalization;
using System.Text;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Data;

/// <summary>
/// How a client is found by what a clinician types: code or name, any part of either, ignoring case and accents
/// ("muller" finds "Müller", "ren" finds "Irène"). The folded text is stored with the client
/// (<see cref="Entities.Client.SearchText"/>) so a search reads one narrow column.
/// </summary>
public static class ClientSearch
{
    /// <summary>The longest search text honoured; longer input is cut (no code or name is longer).</summary>
    public const int MaximumLength = FieldLimits.Code + 1 + FieldLimits.Name;

    /// <summary>
    /// Lower case (invariant), accents and other combining marks removed (Unicode decomposition, NFD), runs of white
    /// space as one space, trimmed.
    /// </summary>
    public static string Fold(string? text)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return "";
        }

        var decomposed = text.Normalize(NormalizationForm.FormD);
        var folded = new StringBuilder(decomposed.Length);
        var space = false;
        foreach (var c in decomposed)
        {
            if (CharUnicodeInfo.GetUnicodeCategory(c) is UnicodeCategory.NonSpacingMark or UnicodeCategory.SpacingCombiningMark or UnicodeCategory.EnclosingMark)
            {
                continue;
            }

            if (char.IsWhiteSpace(c))
            {
                space = folded.Length > 0;
                continue;
            }

            if (space)
            {
                folded.Append(' ');
                space = false;
            }

            folded.Append(char.ToLowerInvariant(c));
        }

        return folded.ToString().Normalize(NormalizationForm.FormC);
    }

    /// <summary>The stored search text of a client: folded code and name.</summary>
    public static string For(string code, string? name) => Fold(code + " " + name);

    /// <summary>
    /// The clients whose code or name holds <paramref name="typed"/>. Three or more letters with no LIKE wildcard in
    /// them are looked up in the trigram index ClientSearchIndex (SQLite FTS5 over the search text, made and kept by
    /// the ListsAtScale migration's triggers), so only the matching clients are read; anything shorter, or holding
    /// %, _ or \, is matched against the stored search text (which the client-list index also holds). On a PostgreSQL
    /// server every search is that LIKE, which the server's trigram index on the search text serves.
    /// </summary>
    public static IQueryable<Entities.Client> Matching(ClinicDbContext db, string typed)
    {
        ArgumentNullException.ThrowIfNull(db);
        var folded = Fold(typed);
        if (folded.Length > MaximumLength)
        {
            folded = folded[..MaximumLength];
        }

        if (!db.Database.IsServer() && folded.Length >= 3 && folded.IndexOfAny(['%', '_', '\\']) < 0)
        {
            var anywhere = "%" + folded + "%";
            return db.Clients.FromSql($"SELECT * FROM Clients WHERE Id IN (SELECT rowid FROM ClientSearchIndex WHERE SearchText LIKE {anywhere})");
        }

        var pattern = ContainsPattern(folded);
        return db.Clients.Where(c => EF.Functions.Like(c.SearchText, pattern, "\\"));
    }

    /// <summary>A LIKE pattern that finds <paramref name="typed"/> anywhere, with \ as the escape character.</summary>
    public static string ContainsPattern(string typed)
    {
        var folded = Fold(typed);
        if (folded.Length > MaximumLength)
        {
            folded = folded[..MaximumLength];
        }

        return "%" + folded.Replace("\\", "\\\\", StringComparison.Ordinal).Replace("%", "\\%", StringComparison.Ordinal).Replace("_", "\\_", StringComparison.Ordinal) + "%";
    }

    /// <summary>
    /// Gives every client saved before the search text existed its folded search text (the migration that adds the
    /// column cannot fold accents in SQL). A batch at a time; nothing to do on a current database.
    /// </summary>
    public static async Task FillMissingAsync(ClinicDbContext db, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(db);
        var after = 0;
        while (true)
        {
            var batch = await db.Clients.Where(c => c.SearchText == "" && c.Id > after).OrderBy(c => c.Id).Take(1000)
                .Select(c => new { c.Id, c.Code, c.Name }).ToListAsync(ct).ConfigureAwait(false);
            if (batch.Count == 0)
            {
                return;
            }

            after = batch[^1].Id;
            foreach (var c in batch)
            {
                var text = For(c.Code, c.Name);
                await db.Clients.Where(x => x.Id == c.Id).ExecuteUpdateAsync(set => set.SetProperty(x => x.SearchText, text), ct).ConfigureAwait(false);
            }
        }
    }
}
