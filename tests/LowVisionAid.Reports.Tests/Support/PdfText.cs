using System.Text.RegularExpressions;
using UglyToad.PdfPig.Content;
using PigDocument = UglyToad.PdfPig.PdfDocument;

namespace LowVisionAid.Reports.Tests.Support;

/// <summary>What PdfPig reads back from a rendered document.</summary>
internal sealed partial class PdfText
{
    private PdfText(string words, IReadOnlyList<string> footers, IReadOnlyList<Letter> letters, int pages, IReadOnlyList<string> pageWords, double lastPageUsed)
    {
        Words = words;
        Footers = footers;
        Letters = letters;
        PageCount = pages;
        PageWords = pageWords;
        LastPageUsed = lastPageUsed;
    }

    /// <summary>Each page's words but the footer, joined by single spaces.</summary>
    public IReadOnlyList<string> PageWords { get; }

    /// <summary>How far down the last page its text reaches, as a fraction of the page height.</summary>
    public double LastPageUsed { get; }

    /// <summary>True when the whole of <paramref name="sentence"/> is on one page.</summary>
    public bool OnOnePage(string sentence) => PageWords.Any(p => p.Contains(Normalise(sentence), StringComparison.Ordinal));

    /// <summary>
    /// Every word of every page but the footers, joined by single spaces (line breaks become spaces), so that a
    /// sentence running over a page break reads as one.
    /// </summary>
    public string Words { get; }

    /// <summary>Each page's footer line ("Page i of n ...").</summary>
    public IReadOnlyList<string> Footers { get; }

    public IReadOnlyList<Letter> Letters { get; }

    public int PageCount { get; }

    public static PdfText Read(ReadOnlyMemory<byte> pdf)
    {
        using var document = PigDocument.Open(pdf.ToArray());
        var words = new List<string>();
        var footers = new List<string>();
        var letters = new List<Letter>();
        var perPage = new List<string>();
        double lastUsed = 0;
        foreach (var page in document.GetPages())
        {
            var pageWords = page.GetWords().ToList();
            // The footer is the lowest line on the page and starts with "Page".
            double lowest = pageWords.Min(w => Math.Round(w.BoundingBox.Bottom));
            var footer = pageWords.Where(w => Math.Abs(w.BoundingBox.Bottom - lowest) < 3).OrderBy(w => w.BoundingBox.Left).ToList();
            if (footer.Count > 0 && footer[0].Text == "Page")
            {
                footers.Add(string.Join(' ', footer.Select(w => w.Text)));
                pageWords = [.. pageWords.Except(footer)];
            }

            words.AddRange(pageWords.Select(w => w.Text));
            perPage.Add(string.Join(' ', pageWords.Select(w => w.Text)));
            letters.AddRange(page.Letters);
            lastUsed = pageWords.Count == 0 ? 0 : (page.Height - pageWords.Min(w => w.BoundingBox.Bottom)) / page.Height;
        }

        return new PdfText(string.Join(' ', words), footers, letters, document.NumberOfPages, perPage, lastUsed);
    }

    /// <summary>Collapses runs of white space, so wrapped text compares with the sentence it came from.</summary>
    public static string Normalise(string text) => Spaces().Replace(text, " ").Trim();

    public bool Contains(string sentence) => Words.Contains(Normalise(sentence), StringComparison.Ordinal);

    /// <summary>
    /// True when the words of <paramref name="phrase"/> appear in order, each within <paramref name="maxGap"/> words
    /// of the last: a table cell that wraps interleaves its lines with the cells beside it.
    /// </summary>
    public bool ContainsInCell(string phrase, int maxGap = 12)
    {
        var words = Words.Split(' ');
        var wanted = Normalise(phrase).Split(' ');
        for (int start = 0; start < words.Length; start++)
        {
            if (words[start] != wanted[0])
                continue;
            int at = start, found = 1;
            for (; found < wanted.Length; found++)
            {
                int next = Array.IndexOf(words, wanted[found], at + 1);
                if (next < 0 || next - at > maxGap)
                    break;
                at = next;
            }

            if (found == wanted.Length)
                return true;
        }

        return false;
    }

    [GeneratedRegex(@"\s+")]
    private static partial Regex Spaces();
}
