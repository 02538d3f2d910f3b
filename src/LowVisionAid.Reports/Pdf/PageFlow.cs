using LowVisionAid.Reports.Fonts;
using PdfSharp.Drawing;
using PdfSharp.Pdf;
using PdfSharp.UniversalAccessibility;

namespace LowVisionAid.Reports.Pdf;

/// <summary>
/// Lays text down the pages of a document from top to bottom: left-aligned, word-wrapped, black on white, a new
/// page when the next block does not fit. Every block is tagged for screen readers (PDF/UA through PDFsharp's
/// <see cref="UAManager"/>): headings, paragraphs, lists, tables and figures in reading order; rules and footers
/// are artifacts. Running text goes on over a page break only between sentences; a heading, list item or step is
/// kept whole unless it is taller than a page; a heading is kept with the first line or sentence after it. Each page's footer ("Page i of n" and a line of text) is drawn as an
/// artifact when the page starts, so the caller lays out twice: once to count the pages, then with the count.
/// </summary>
internal sealed partial class PageFlow : IDisposable
{
    private readonly PdfDocument _document;
    private readonly PaperSize _paper;
    private readonly double _margin;
    private readonly double _footerHeight;
    private readonly StructureBuilder _tags;
    private readonly string _footerText;
    private readonly XFont _footerFont;
    private readonly int? _pageCount;
    private XGraphics? _graphics;

    /// <param name="document">The document to add pages to.</param>
    /// <param name="paper">The sheet.</param>
    /// <param name="margin">The margin on every side, in points.</param>
    /// <param name="footerHeight">The height kept free above the bottom margin for the footer.</param>
    /// <param name="footerText">The footer's text after "Page i of n".</param>
    /// <param name="footerFont">The footer's font.</param>
    /// <param name="pageCount">The number of pages, known from an earlier layout; null on the first.</param>
    public PageFlow(PdfDocument document, PaperSize paper, double margin, double footerHeight, string footerText, XFont footerFont, int? pageCount)
    {
        _document = document;
        _paper = paper;
        _margin = margin;
        _footerHeight = footerHeight;
        _footerText = footerText;
        _footerFont = footerFont;
        _pageCount = pageCount;
        var ua = UAManager.ForDocument(document);
        ua.SetDocumentLanguage(document.Language ?? "en");
        _tags = ua.StructureBuilder;
        NewPage();
    }

    public double Y { get; private set; }

    public double Left => _margin;

    public double Width => PageWidth - (2 * _margin);

    /// <summary>The height a page holds between the top margin and the footer.</summary>
    public double PageBody => Bottom - _margin;

    /// <summary>
    /// The room a heading and its gaps take above a block. A block taller than a page less this room is laid out a
    /// sentence at a time, so that it can start on its heading's page.
    /// </summary>
    public double HeadingRoom { get; init; }

    private double TallBlock => PageBody - HeadingRoom;

    /// <summary>How much of the last page's body is used, from 0 to 1.</summary>
    public double LastPageFill => (Y - _margin) / PageBody;

    private double PageWidth => _document.Pages[^1].Width.Point;

    private double Bottom => _document.Pages[^1].Height.Point - _margin - _footerHeight;

    private XGraphics Graphics => _graphics ?? throw new InvalidOperationException("The page flow is finished.");

    /// <summary>Starts a new page unless <paramref name="height"/> points still fit on this one.</summary>
    public void KeepTogether(double height)
    {
        if (Y + Math.Min(height, PageBody) > Bottom && Y > _margin)
            NewPage();
    }

    public void Space(double points) => Y = Math.Min(Y + points, Bottom);

    /// <summary>Opens a grouping element (a section, the document part) that later blocks belong to.</summary>
    public void Begin(PdfGroupingElementTag tag) => _tags.BeginElement(tag);

    /// <summary>Opens a block element (a list, a table) that later blocks belong to.</summary>
    public void Begin(PdfBlockLevelElementTag tag) => _tags.BeginElement(tag);

    /// <summary>Closes the element opened last.</summary>
    public void End() => _tags.End();

    /// <summary>
    /// The height <see cref="Paragraph"/> needs to start this text on a page: its first sentence for running text,
    /// or all of it for a unit kept whole (a list item, a step, a heading) unless that is taller than a page less
    /// <see cref="HeadingRoom"/> (it is then laid out a sentence at a time too).
    /// </summary>
    /// <param name="text">The text.</param>
    /// <param name="font">Its font.</param>
    /// <param name="lineHeight">Its line height.</param>
    /// <param name="indent">Its indent from the left margin.</param>
    /// <param name="whole">True for a unit kept whole (a list item, a step, a heading).</param>
    public double Height(string text, XFont font, double lineHeight, double indent = 0, bool whole = false) =>
        Wrap(Pieces(GlyphCoverage.Fit(text), font, lineHeight, indent, whole)[0], font, Width - indent).Count * lineHeight;

    /// <summary>
    /// Wrapped lines of text as one tagged block (a paragraph, a heading, or a list item when it has a marker).
    /// Running text (a paragraph) may go on over a page break, but only between sentences: a sentence is never
    /// split. A heading or list item (a step) is kept whole on one page unless it is taller than a page, when it
    /// too breaks only between sentences. A heading keeps <paramref name="keepWithNext"/> points (the first line or
    /// sentence of what follows) on its page. Returns the number of lines drawn.
    /// </summary>
    public int Paragraph(string text, XFont font, double lineHeight, double indent = 0, string? marker = null,
        PdfBlockLevelElementTag tag = PdfBlockLevelElementTag.Paragraph, double keepWithNext = 0)
    {
        double x = Left + indent;
        double width = Width - indent;
        bool whole = marker is not null || tag != PdfBlockLevelElementTag.Paragraph;
        var units = Pieces(GlyphCoverage.Fit(text), font, lineHeight, indent, whole);
        // The first unit starts on this page only with room for it (and, for a single unit, what must follow it).
        KeepTogether((Wrap(units[0], font, width).Count * lineHeight) + (units.Count == 1 ? keepWithNext : 0));
        if (marker is not null)
        {
            _tags.BeginElement(PdfBlockLevelElementTag.ListItem);
            _tags.BeginElement(PdfBlockLevelElementTag.Label);
            Graphics.DrawString(marker, font, XBrushes.Black, x - Measure(marker + " ", font), Baseline(font, lineHeight));
            _tags.End();
            _tags.BeginElement(PdfBlockLevelElementTag.ListBody);
        }
        else
        {
            _tags.BeginElement(tag);
        }

        int drawn = 0;
        for (int next = 0; next < units.Count;)
        {
            int room = (int)Math.Floor(((Bottom - Y) / lineHeight) + 1e-6);
            // As many whole units as fit on this page; the greedy wrap of the first k units gives the same lines as
            // the whole text's up to the end of unit k, so the paragraph reads the same, only broken there.
            List<string>? fits = null;
            int taken = 0;
            for (int k = 1; next + k <= units.Count; k++)
            {
                var lines = Wrap(string.Join(' ', units.Skip(next).Take(k)), font, width);
                if (lines.Count > room)
                    break;
                (fits, taken) = (lines, k);
            }

            if (fits is null && Y > _margin)
            {
                NewPage();
                continue;
            }

            // A single sentence taller than a whole page is the one thing left to break between lines.
            fits ??= Wrap(units[next], font, width);
            taken = Math.Max(taken, 1);
            next += taken;
            for (int i = 0; i < fits.Count; i++)
            {
                KeepTogether(lineHeight);
                // A trailing space keeps the words of one line apart from the next line's in the extracted text.
                bool last = next >= units.Count && i == fits.Count - 1;
                Graphics.DrawString(last ? fits[i] : fits[i] + " ", font, XBrushes.Black, x, Baseline(font, lineHeight));
                Y += lineHeight;
                drawn++;
            }

            if (next < units.Count)
                NewPage();
        }

        _tags.End();
        if (marker is not null)
            _tags.End();
        return drawn;
    }

    // The units a block is broken into across pages: each sentence of running text; the whole of a unit kept whole,
    // unless it is taller than a page less the heading room.
    private List<string> Pieces(string text, XFont font, double lineHeight, double indent, bool whole)
    {
        if (whole && Wrap(text, font, Width - indent).Count * lineHeight <= TallBlock)
            return [text];
        var sentences = SentenceEnd().Split(text).Where(s => s.Length > 0).ToList();
        return sentences.Count > 0 ? sentences : [text];
    }

    /// <summary>
    /// A table row of cells, each wrapped inside its column; the row moves to a new page whole. Call between
    /// <c>Begin(PdfBlockLevelElementTag.Table)</c> and <see cref="End"/>.
    /// </summary>
    public void Row(IReadOnlyList<string> cells, IReadOnlyList<double> columnFractions, XFont font, double lineHeight, bool header, double keepWithNext = 0)
    {
        const double Gap = 6;
        var wrapped = new List<IReadOnlyList<string>>(cells.Count);
        for (int c = 0; c < cells.Count; c++)
            wrapped.Add(Wrap(GlyphCoverage.Fit(cells[c]), font, (Width * columnFractions[c]) - Gap));
        int lineCount = wrapped.Max(w => w.Count);
        KeepTogether((lineCount * lineHeight) + 4 + keepWithNext);
        _tags.BeginElement(PdfBlockLevelElementTag.TableRow);
        double x = Left;
        for (int c = 0; c < cells.Count; c++)
        {
            _tags.BeginElement(header ? PdfBlockLevelElementTag.TableHeaderCell : PdfBlockLevelElementTag.TableDataCell);
            double y = Y;
            foreach (var line in wrapped[c].Where(l => l.Length > 0))
            {
                Graphics.DrawString(line + " ", font, XBrushes.Black, x, y - Y + Baseline(font, lineHeight));
                y += lineHeight;
            }

            _tags.End();
            x += Width * columnFractions[c];
        }

        _tags.End();
        Y += lineCount * lineHeight;
        if (header)
        {
            Rule(Y + 1.5, 0.75);
            Y += 4;
        }
    }

    /// <summary>
    /// A box <paramref name="width"/> points wide drawn to size with a heavy black border, holding
    /// <paramref name="characters"/> drawn at <paramref name="font"/>'s size every <paramref name="pitch"/> points from
    /// its left edge plus <paramref name="padding"/>, on one baseline (a space leaves its place empty). Tagged as a figure whose alternative text is
    /// <paramref name="altText"/>; moves to a new page whole.
    /// </summary>
    public void Window(double width, double height, string characters, XFont font, double pitch, double border, double padding, string altText)
    {
        KeepTogether(height + border * 2);
        double top = Y + border / 2;
        _tags.BeginElement(PdfIllustrationElementTag.Figure, altText, new XRect(Left, Y, width, height + border));
        Graphics.DrawRectangle(new XPen(XColors.Black, border), Left + border / 2, top, width - border, height);
        double baseline = top + (height / 2) + (font.Size * 0.25);
        for (int n = 0; n < characters.Length; n++)
        {
            if (characters[n] != ' ')
                Graphics.DrawString(characters[n].ToString(), font, XBrushes.Black, Left + border + padding + (pitch * n), baseline);
        }

        _tags.End();
        Y += height + border * 2;
    }

    /// <summary>A drawing <paramref name="height"/> points tall across the text column, tagged as a figure with its alternative text.</summary>
    public void Figure(double height, string altText, Action<XGraphics, XRect> draw)
    {
        KeepTogether(height);
        var area = new XRect(Left, Y, Width, height);
        _tags.BeginElement(PdfIllustrationElementTag.Figure, altText, area);
        draw(Graphics, area);
        _tags.End();
        Y += height;
    }

    /// <summary>
    /// The gap factor to lay a document out with so that its last page is not nearly empty: the usual gaps when the
    /// last page is at least <paramref name="nearlyEmpty"/> full; else tighter gaps (which may save the page) or wider
    /// ones (which carry more onto it), preferring fewer pages.
    /// </summary>
    /// <param name="layout">Lays the document out with a gap factor and returns its page count and last-page fill.</param>
    /// <param name="nearlyEmpty">The fill below which a last page counts as nearly empty.</param>
    public static (double Spacing, int Pages) ChooseSpacing(Func<double, (int Pages, double LastFill)> layout, double nearlyEmpty)
    {
        var usual = layout(1);
        if (usual.Pages == 1 || usual.LastFill >= nearlyEmpty)
            return (1, usual.Pages);
        var tried = new List<(double Spacing, int Pages, double Fill)> { (1, usual.Pages, usual.LastFill) };
        foreach (var spacing in new[] { 0.3, 0.6, 1.4, 1.8, 2.6 })
        {
            var (pages, fill) = layout(spacing);
            tried.Add((spacing, pages, fill));
        }

        var best = tried.Where(t => t.Pages < usual.Pages || t.Fill >= nearlyEmpty).OrderBy(t => t.Pages).ThenBy(t => Math.Abs(t.Spacing - 1)).FirstOrDefault();
        return best.Pages > 0 ? (best.Spacing, best.Pages) : (1, usual.Pages);
    }

    /// <summary>The number of pages laid out so far.</summary>
    public int PageCount => _document.PageCount;

    public void Dispose()
    {
        _graphics?.Dispose();
        _graphics = null;
    }

    private void Footer(PdfPage page, int number)
    {
        double baseline = page.Height.Point - _margin - (_footerHeight * 0.25);
        double rule = baseline - (_footerFont.Size * 1.3);
        var pages = string.Create(System.Globalization.CultureInfo.InvariantCulture, $"Page {number} of {_pageCount ?? 0}");
        // At very large sizes the footer keeps the page number and drops the rest rather than run off the sheet.
        var text = Measure(pages + "  ·  " + _footerText, _footerFont) <= Width ? pages + "  ·  " + _footerText : pages;
        _tags.BeginArtifact();
        Graphics.DrawLine(new XPen(XColors.Black, 1), _margin, rule, page.Width.Point - _margin, rule);
        Graphics.DrawString(GlyphCoverage.Fit(text), _footerFont, XBrushes.Black, _margin, baseline);
        _tags.End();
    }

    private void Rule(double y, double thickness)
    {
        _tags.BeginArtifact();
        Graphics.DrawLine(new XPen(XColors.Black, thickness), Left, y, Left + Width, y);
        _tags.End();
    }

    private double Baseline(XFont font, double lineHeight) => Y + ((lineHeight - font.Size) / 2) + (font.Size * 0.8);

    private double Measure(string text, XFont font) => Graphics.MeasureString(text, font).Width;

    private List<string> Wrap(string text, XFont font, double width)
    {
        var lines = new List<string>();
        foreach (var paragraph in text.Split('\n'))
        {
            var line = string.Empty;
            foreach (var word in KeepUnits(paragraph.Split(' ', StringSplitOptions.RemoveEmptyEntries)))
            {
                var candidate = line.Length == 0 ? word : line + " " + word;
                if (Measure(candidate, font) <= width)
                {
                    line = candidate;
                    continue;
                }

                if (line.Length > 0)
                    lines.Add(line);
                line = word;
                while (line.Length > 1 && Measure(line, font) > width)
                {
                    int fit = line.Length - 1;
                    while (fit > 1 && Measure(line[..fit], font) > width)
                        fit--;
                    lines.Add(line[..fit]);
                    line = line[fit..];
                }
            }

            lines.Add(line);
        }

        return lines;
    }

    // A unit stays on the line of its number ("+12 D", "8.3 cm", "1.0M"): the two are wrapped as one word.
    private static List<string> KeepUnits(string[] words)
    {
        var joined = new List<string>(words.Length);
        foreach (var word in words)
        {
            if (joined.Count > 0 && char.IsDigit(joined[^1][^1]) && Units.Contains(word.TrimEnd('.', ',', ';', ':', ')')))
                joined[^1] += " " + word;
            else
                joined.Add(word);
        }

        return joined;
    }

    private static readonly HashSet<string> Units = ["D", "cm", "mm", "m", "M", "pt", "in", "inches", "feet", "×", "Δ", "%"];

    private void NewPage()
    {
        // The page is added before the last page's graphics are closed: the tagging ends that page's marked content then.
        var page = _document.AddPage();
        _graphics?.Dispose();
        page.Size = _paper == PaperSize.Letter ? PdfSharp.PageSize.Letter : PdfSharp.PageSize.A4;
        _graphics = XGraphics.FromPdfPage(page);
        Y = _margin;
        Footer(page, _document.PageCount);
    }

    [System.Text.RegularExpressions.GeneratedRegex(@"(?<=[.!?]) +")]
    private static partial System.Text.RegularExpressions.Regex SentenceEnd();
}
