using System.Globalization;
using System.Text;

namespace LowVisionAid.Reports.Fonts;

/// <summary>
/// Keeps text within the characters the embedded faces can draw. PDFsharp silently drops a character its font has
/// no glyph for, so a name such as "Ŵynne" would print as "ynne"; instead a missing letter is replaced by its base
/// letter ("W") when the face has that, and by "?" otherwise, so nothing vanishes without trace.
/// </summary>
internal static class GlyphCoverage
{
    // Stand-ins for symbols clinical text uses that the faces lack (minutes and seconds of arc, arrows, sub/superscripts).
    private static readonly Dictionary<char, string> StandIns = new()
    {
        ['′'] = "'", ['″'] = "\"", ['→'] = "->", ['←'] = "<-", ['⁻'] = "-", ['₀'] = "0", ['₁'] = "1", ['₂'] = "2",
    };

    private static readonly Lazy<HashSet<char>> Mapped = new(Load, LazyThreadSafetyMode.ExecutionAndPublication);

    public static bool CanDraw(char c) => Mapped.Value.Contains(c);

    public static string Fit(string text)
    {
        if (text.All(c => char.IsWhiteSpace(c) || CanDraw(c)))
            return text;
        var fitted = new StringBuilder(text.Length);
        foreach (char c in text)
        {
            if (char.IsWhiteSpace(c) || CanDraw(c))
            {
                fitted.Append(c);
                continue;
            }

            // A character beyond the BMP (a surrogate pair) is never in the faces: one "?" for the pair.
            if (char.IsSurrogate(c))
            {
                if (char.IsHighSurrogate(c))
                    fitted.Append('?');
                continue;
            }

            if (StandIns.TryGetValue(c, out var standIn))
            {
                fitted.Append(standIn);
                continue;
            }

            // The base letter of a decomposable letter (Ŵ → W + combining circumflex), if the face has it.
            var decomposed = c.ToString().Normalize(NormalizationForm.FormD);
            char first = decomposed[0];
            bool hasBase = decomposed.Length > 1 && CharUnicodeInfo.GetUnicodeCategory(decomposed[1]) == UnicodeCategory.NonSpacingMark && CanDraw(first);
            fitted.Append(hasBase ? first : '?');
        }

        return fitted.ToString();
    }

    // A character counts as drawable only when every face has it.
    private static HashSet<char> Load()
    {
        HashSet<char>? all = null;
        foreach (var (bold, italic) in new[] { (false, false), (true, false), (false, true), (true, true) })
        {
            var mapped = FontFile.MappedCharacters(EmbeddedFontResolver.LoadFace(EmbeddedFontResolver.FaceName(bold, italic)));
            if (all is null)
                all = mapped;
            else
                all.IntersectWith(mapped);
        }

        return all ?? [];
    }
}
