using System.Globalization;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Pdf;
using PdfSharp.Drawing;
using PdfSharp.UniversalAccessibility;

namespace LowVisionAid.Reports.Summaries;

/// <summary>
/// Renders the clinician summary for the clinical record, in normal print (10.5 pt): inputs, each method's
/// estimate, the chosen options with every figure and its reasons, trials and outcomes, and the method version.
/// </summary>
/// <param name="formatProvider">Culture for numbers and dates; the invariant culture when null.</param>
public sealed class ClinicianSummaryRenderer(IFormatProvider? formatProvider = null) : IReportRenderer<ClinicianSummary>
{
    /// <summary>The body size of the summary, in points.</summary>
    public const double BodyPoints = 10.5;

    /// <summary>The closing statement printed on every summary.</summary>
    public const string StartingPointNote =
        "These figures are starting points calculated from published methods. The device choice rests on the trial with the client's own material and on the practitioner's judgement.";

    private const double Margin = 50;
    private readonly IFormatProvider _culture = formatProvider ?? CultureInfo.InvariantCulture;
    private readonly SummaryText _text = new(formatProvider);

    // A last page less full than this is laid out again with tighter gaps between blocks.
    private const double NearlyEmpty = 0.2;

    /// <inheritdoc/>
    public ReportResult Render(ClinicianSummary model)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (Validate(model) is { } error)
            return ReportResult.Fail(error);

        HyperlegibleFont.EnsureRegistered();
        // Laid out to count the pages (and see how full the last is), then again with the count in the footers.
        var (spacing, pages) = PageFlow.ChooseSpacing(gaps => Layout(model, gaps, null).Count, NearlyEmpty);
        var pdf = Layout(model, spacing, pages).Pdf;
        return ReportResult.Ok(pdf, FileNames.For("summary", model.ClientCode));
    }

    private ((byte[] Bytes, int Pages) Pdf, (int Pages, double LastFill) Count) Layout(ClinicianSummary model, double spacing, int? pageCount)
    {
        using var document = PdfOutput.Create("Clinician summary, client " + model.ClientCode, model.Clinic.Name, model.AssessedOn);
        const double Line = BodyPoints * 1.35;
        var regular = new XFont(HyperlegibleFont.FamilyName, BodyPoints, XFontStyleEx.Regular);
        var bold = new XFont(HyperlegibleFont.FamilyName, BodyPoints, XFontStyleEx.Bold);
        var heading = new XFont(HyperlegibleFont.FamilyName, 13, XFontStyleEx.Bold);
        var title = new XFont(HyperlegibleFont.FamilyName, 17, XFontStyleEx.Bold);
        (int, double) count;

        using (var flow = new PageFlow(document, model.Paper, Margin, BodyPoints * 3, "Clinician summary, client " + model.ClientCode + "  ·  " + model.MethodVersion, regular, pageCount))
        {
            void Heading(string text, PdfBlockLevelElementTag level = PdfBlockLevelElementTag.Heading2)
            {
                flow.Space(Line * 0.8 * spacing);
                flow.Paragraph(text, level == PdfBlockLevelElementTag.Heading2 ? heading : bold, heading.Size * 1.4, tag: level, keepWithNext: Line * 3);
            }

            void Table(double[] columns, string[] header, IEnumerable<string[]> rows)
            {
                flow.Begin(PdfBlockLevelElementTag.Table);
                flow.Row(header, columns, bold, Line, header: true, keepWithNext: Line * 2);
                foreach (var row in rows)
                    flow.Row(row, columns, regular, Line, header: false);
                flow.End();
            }

            void Bullets(string label, IReadOnlyList<string> items)
            {
                if (items.Count == 0)
                    return;
                flow.Paragraph(label, bold, Line, tag: PdfBlockLevelElementTag.Heading4, keepWithNext: keepWithHeight(items[0]));
                flow.Begin(PdfBlockLevelElementTag.List);
                foreach (var item in items)
                    flow.Paragraph(item, regular, Line, indent: BodyPoints * 1.5, marker: "•");
                flow.End();
            }

            double keepWithHeight(string text) => flow.Height(text, regular, Line, BodyPoints * 1.5, whole: true);

            flow.Paragraph(SummaryText.Title, title, title.Size * 1.3, tag: PdfBlockLevelElementTag.Heading1);
            flow.Paragraph(SummaryText.ClinicLine(model), regular, Line);
            flow.Space(Line * 0.3);
            Table([0.25, 0.75], ["Record", string.Empty], _text.Record(model));

            if (_text.Acuity(model) is { Count: > 0 } acuity)
            {
                Heading("Acuity");
                Table([0.3, 0.3, 0.4], [.. SummaryText.AcuityColumns], acuity);
            }

            if (model.ReadingCurve is { } curve)
                ReadingCurve(flow, curve, Heading, Table, regular, Line);

            if (model.Inputs.Count > 0)
            {
                Heading("Other inputs");
                Table([0.35, 0.65], ["Input", "Value"], model.Inputs.Select(i => new[] { i.Label, i.Value }));
            }

            Heading("Equivalent power by method");
            Table([0.22, 0.15, 0.12, 0.11, 0.40], [.. SummaryText.EstimateColumns], _text.Estimates(model));

            Heading(SummaryText.ChosenHeading(model));
            foreach (var option in model.ChosenOptions)
            {
                flow.Space(Line * 0.4 * spacing);
                flow.Paragraph(SummaryText.OptionHeading(option), bold, Line,
                    tag: PdfBlockLevelElementTag.Heading3, keepWithNext: Line * 4);
                Table([0.35, 0.65], ["Figure", "Value"], _text.Figures(option).Select(f => new[] { f.Label, f.Value }));
                flow.Space(Line * 0.3 * spacing);
                Bullets("Reasons", SummaryText.Reasons(option));
                Bullets("Cautions", option.Cautions);
            }

            // What the client takes home, and what to offer besides when the print is very large.
            if (_text.Handout(model) is { } handout)
            {
                Heading("Client handout");
                flow.Paragraph(handout, regular, Line);
            }

            Heading("Trials and outcomes");
            if (model.Trials.Count == 0)
                flow.Paragraph("No trial recorded yet.", regular, Line);
            else
                Table([0.14, 0.24, 0.2, 0.28, 0.14], [.. SummaryText.TrialColumns], SummaryText.Trials(model));

            foreach (var figure in model.FigureTables ?? [])
            {
                if (figure.Columns.Count == 0)
                    continue;
                Heading(figure.Caption);
                var columns = Enumerable.Repeat(1.0 / figure.Columns.Count, figure.Columns.Count).ToArray();
                Table(columns, [.. figure.Columns], figure.Rows.Select(r => Enumerable.Range(0, figure.Columns.Count).Select(c => c < r.Count ? r[c] : string.Empty).ToArray()));
            }

            flow.Space(Line * spacing);
            flow.Paragraph(StartingPointNote, regular, Line);
            count = (flow.PageCount, flow.LastPageFill);
        }

        return (pageCount is null ? default : PdfOutput.Save(document), count);
    }

    // The reading curve: its results in words, the points as a table, and a small plot of speed against print size
    // (log scale, as the MNREAD chart steps in 0.1 log units; methods.md §2.5) with the critical print size marked.
    private void ReadingCurve(PageFlow flow, ReadingCurveRecord curve, Action<string, PdfBlockLevelElementTag> heading,
        Action<double[], string[], IEnumerable<string[]>> table, XFont regular, double line)
    {
        heading("Reading curve", PdfBlockLevelElementTag.Heading2);
        var points = SummaryText.CurvePoints(curve).ToList();
        string result = _text.CurveResult(curve);
        flow.Paragraph(result, regular, line);
        if (points.Count < 2)
            return;

        flow.Space(line * 0.3);
        var small = new XFont(HyperlegibleFont.FamilyName, 8.5, XFontStyleEx.Regular);
        flow.Figure(150, "Reading speed against print size. " + result, (g, area) => Plot(g, area, points, curve, small));
        flow.Space(line * 0.3);
        table([0.3, 0.3, 0.4], [.. _text.CurveColumns(curve)], _text.CurveRows(curve));
    }

    private void Plot(XGraphics g, XRect area, List<ReadingCurvePoint> points, ReadingCurveRecord curve, XFont font)
    {
        const double AxisLeft = 46, AxisBottom = 26, PlotWidth = 300;
        double x0 = area.Left + AxisLeft, y0 = area.Bottom - AxisBottom, height = area.Height - AxisBottom - 8;
        double logMin = points.Min(p => Math.Log10(p.Print.M)), logMax = points.Max(p => Math.Log10(p.Print.M));
        if (logMax - logMin < 0.1)
            logMax = logMin + 0.1;
        double speedMax = Math.Max(10, Math.Ceiling(points.Max(p => p.WordsPerMinute) / 50) * 50);
        double X(PrintSize m) => x0 + ((Math.Log10(m.M) - logMin) / (logMax - logMin) * PlotWidth);
        double Y(double wpm) => y0 - (wpm / speedMax * height);
        var axis = new XPen(XColors.Black, 0.75);
        g.DrawLine(axis, x0, y0, x0 + PlotWidth, y0);
        g.DrawLine(axis, x0, y0, x0, y0 - height);
        g.DrawString("0", font, XBrushes.Black, x0 - 12, y0 + 3);
        g.DrawString(speedMax.ToString("0", _culture), font, XBrushes.Black, area.Left, Y(speedMax) + 3);
        g.DrawString("words a minute", font, XBrushes.Black, x0 + 4, Y(speedMax) - 2);
        g.DrawString(points[^1].Print.ToString(null, _culture), font, XBrushes.Black, X(points[^1].Print) - 8, y0 + 12);
        g.DrawString(points[0].Print.ToString(null, _culture), font, XBrushes.Black, X(points[0].Print) - 12, y0 + 12);
        g.DrawString("print size (log scale)", font, XBrushes.Black, x0 + (PlotWidth / 2) - 35, y0 + 22);
        var line = new XPen(XColors.Black, 1.25);
        for (int i = 1; i < points.Count; i++)
            g.DrawLine(line, X(points[i - 1].Print), Y(points[i - 1].WordsPerMinute), X(points[i].Print), Y(points[i].WordsPerMinute));
        foreach (var p in points)
            g.DrawEllipse(XBrushes.Black, X(p.Print) - 2.5, Y(p.WordsPerMinute) - 2.5, 5, 5);
        if (curve.CriticalPrint is { } cps && cps.M >= points[^1].Print.M && cps.M <= points[0].Print.M)
        {
            var dashed = new XPen(XColors.Black, 1) { DashStyle = XDashStyle.Dash };
            g.DrawLine(dashed, X(cps), y0, X(cps), y0 - height);
            g.DrawString("critical print size " + cps.ToString(null, _culture), font, XBrushes.Black, X(cps) + 3, y0 - height + 8);
        }

        if (curve.MaximumReadingSpeed is { } mrs)
        {
            var dotted = new XPen(XColors.Black, 0.75) { DashStyle = XDashStyle.Dot };
            g.DrawLine(dotted, x0, Y(mrs), x0 + PlotWidth, Y(mrs));
        }
    }

    private static string? Validate(ClinicianSummary model)
    {
        if (ReportMessages.MissingCommon(model.ChosenOptions?.Select(o => o?.Name), model.ClientCode, model.Clinic) is { } missing)
            return missing;
        if (string.IsNullOrWhiteSpace(model.MethodVersion))
            return ReportMessages.NoMethodVersion;
        return null;
    }
}
