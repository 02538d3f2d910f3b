using LowVisionAid.Reports.Fonts;
using PdfSharp.Drawing;
using PdfSharp.Pdf;

namespace LowVisionAid.Reports.Pdf;

/// <summary>
/// Lays text down the pages of a document from top to bottom: left-aligned, word-wrapped, black on white, a new
/// page when the next block does not fit. Footers are drawn last, when the page count is known.
/// </summary>
internal sealed class PageFlow : IDisposable
{
    private readonly PdfDocument _document;
    private readonly PaperSize _paper;
    private readonly double _margin;
    private readonly double _footerHeight;
    private XGraphics? _graphics;

    public PageFlow(PdfDocument document, PaperSize paper, double margin, double footerHeight)
    {
        _document = document;
        _paper = paper;
        _margin = margin;
        _footerHeight = footerHeight;
        NewPage();
    }

    public double Y { get; private set; }

    public double Left => _margin;

    public double Width => PageWidth - (2 * _margin);

    private double PageWidth => _document.Pages[^1].Width.Point;

    private double Bottom => _document.Pages[^1].Height.Point - _margin - _footerHeight;

    private XGraphics Graphics => _graphics ?? throw new InvalidOperationException("The page flow is finished.");

    /// <summary>Starts a new page unless <paramref name="height"/> points still fit on this one.</summary>
    public void KeepTogether(double height)
    {
        if (Y + height > Bottom && Y > _margin)
            NewPage();
    }

    public void Space(double points) => Y = Math.Min(Y + points, Bottom);

    /// <summary>Wrapped lines of text. Returns the number of lines drawn.</summary>
    public int Paragraph(string text, XFont font, double lineHeight, double indent = 0, string? marker = null)
    {
        double x = Left + indent;
        double width = Width - indent;
        var lines = Wrap(GlyphCoverage.Fit(text), font, width);
        for (int i = 0; i < lines.Count; i++)
        {
            KeepTogether(lineHeight);
            double baseline = Baseline(font, lineHeight);
            if (i == 0 && marker is not null)
                Graphics.DrawString(marker, font, XBrushes.Black, x - Measure(marker + " ", font), baseline);
            Graphics.DrawString(lines[i], font, XBrushes.Black, x, baseline);
            Y += lineHeight;
        }

        return lines.Count;
    }

    /// <summary>A row of cells, each wrapped inside its column; the row moves to a new page whole.</summary>
    public void Row(IReadOnlyList<string> cells, IReadOnlyList<double> columnFractions, XFont font, double lineHeight, bool rule)
    {
        const double Gap = 6;
        var wrapped = new List<IReadOnlyList<string>>(cells.Count);
        for (int c = 0; c < cells.Count; c++)
            wrapped.Add(Wrap(GlyphCoverage.Fit(cells[c]), font, (Width * columnFractions[c]) - Gap));
        int lineCount = wrapped.Max(w => w.Count);
        KeepTogether((lineCount * lineHeight) + 4);
        double x = Left;
        for (int c = 0; c < cells.Count; c++)
        {
            double y = Y;
            foreach (var line in wrapped[c])
            {
                Graphics.DrawString(line, font, XBrushes.Black, x, y - Y + Baseline(font, lineHeight));
                y += lineHeight;
            }

            x += Width * columnFractions[c];
        }

        Y += lineCount * lineHeight;
        if (rule)
        {
            Graphics.DrawLine(new XPen(XColors.Black, 0.75), Left, Y + 1.5, Left + Width, Y + 1.5);
            Y += 4;
        }
    }

    /// <summary>
    /// A box <paramref name="width"/> points wide drawn to size with a heavy black border, holding
    /// <paramref name="letters"/> drawn at <paramref name="font"/>'s size every <paramref name="pitch"/> points from its
    /// left edge, on one baseline. Moves to a new page whole.
    /// </summary>
    public void Window(double width, double height, string letters, XFont font, double pitch, double border)
    {
        KeepTogether(height + border * 2);
        double top = Y + border / 2;
        Graphics.DrawRectangle(new XPen(XColors.Black, border), Left + border / 2, top, width - border, height);
        double baseline = top + (height / 2) + (font.Size * 0.25);
        for (int n = 0; n < letters.Length; n++)
            Graphics.DrawString(letters[n].ToString(), font, XBrushes.Black, Left + border + (pitch * n), baseline);
        Y += height + border * 2;
    }

    /// <summary>Ends the layout and draws "Page i of n" and <paramref name="footerText"/> at the foot of every page.</summary>
    public void Finish(string footerText, XFont font)
    {
        _graphics?.Dispose();
        _graphics = null;
        int count = _document.PageCount;
        for (int i = 0; i < count; i++)
        {
            var page = _document.Pages[i];
            using var gfx = XGraphics.FromPdfPage(page, XGraphicsPdfPageOptions.Append);
            double baseline = page.Height.Point - _margin - (_footerHeight * 0.25);
            gfx.DrawLine(new XPen(XColors.Black, 1), _margin, baseline - (font.Size * 1.3), page.Width.Point - _margin, baseline - (font.Size * 1.3));
            gfx.DrawString(GlyphCoverage.Fit(Pages(i + 1, count) + "  ·  " + footerText), font, XBrushes.Black, _margin, baseline);
        }
    }

    public void Dispose()
    {
        _graphics?.Dispose();
        _graphics = null;
    }

    private static string Pages(int page, int count) =>
        string.Create(System.Globalization.CultureInfo.InvariantCulture, $"Page {page} of {count}");

    private double Baseline(XFont font, double lineHeight) => Y + ((lineHeight - font.Size) / 2) + (font.Size * 0.8);

    private double Measure(string text, XFont font) => Graphics.MeasureString(text, font).Width;

    private List<string> Wrap(string text, XFont font, double width)
    {
        var lines = new List<string>();
        foreach (var paragraph in text.Split('\n'))
        {
            var line = string.Empty;
            foreach (var word in paragraph.Split(' ', StringSplitOptions.RemoveEmptyEntries))
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

    private void NewPage()
    {
        _graphics?.Dispose();
        var page = _document.AddPage();
        page.Size = _paper == PaperSize.Letter ? PdfSharp.PageSize.Letter : PdfSharp.PageSize.A4;
        _graphics = XGraphics.FromPdfPage(page);
        Y = _margin;
    }
}
