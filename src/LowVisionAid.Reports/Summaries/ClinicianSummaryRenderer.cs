using System.Globalization;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Pdf;
using PdfSharp.Drawing;

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

    /// <inheritdoc/>
    public ReportResult Render(ClinicianSummary model)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (Validate(model) is { } error)
            return ReportResult.Fail(error);

        HyperlegibleFont.EnsureRegistered();
        using var document = PdfOutput.Create("Clinician summary, client " + model.ClientCode, model.Clinic.Name, model.AssessedOn);

        const double Line = BodyPoints * 1.35;
        var regular = new XFont(HyperlegibleFont.FamilyName, BodyPoints, XFontStyleEx.Regular);
        var bold = new XFont(HyperlegibleFont.FamilyName, BodyPoints, XFontStyleEx.Bold);
        var heading = new XFont(HyperlegibleFont.FamilyName, 13, XFontStyleEx.Bold);
        var title = new XFont(HyperlegibleFont.FamilyName, 17, XFontStyleEx.Bold);

        using (var flow = new PageFlow(document, model.Paper, Margin, footerHeight: BodyPoints * 3))
        {
            void Heading(string text)
            {
                flow.Space(Line * 0.8);
                flow.KeepTogether(heading.Size * 1.4 + (Line * 3));
                flow.Paragraph(text, heading, heading.Size * 1.4);
            }

            void Table(double[] columns, string[] header, IEnumerable<string[]> rows)
            {
                flow.Row(header, columns, bold, Line, rule: true);
                foreach (var row in rows)
                    flow.Row(row, columns, regular, Line, rule: false);
            }

            void Bullets(string label, IReadOnlyList<string> items)
            {
                if (items.Count == 0)
                    return;
                flow.Paragraph(label, bold, Line);
                foreach (var item in items)
                    flow.Paragraph(item, regular, Line, indent: BodyPoints * 1.5, marker: "•");
            }

            flow.Paragraph("Magnifier plan: clinician summary", title, title.Size * 1.3);
            flow.Paragraph(string.Join("  ·  ", new[] { model.Clinic.Name, model.Clinic.Phone, model.Clinic.Email, model.Clinic.Address }
                .Where(s => !string.IsNullOrWhiteSpace(s))), regular, Line);
            flow.Space(Line * 0.3);
            Table([0.25, 0.75], ["Record", string.Empty],
            [
                ["Client", string.IsNullOrWhiteSpace(model.ClientName) ? model.ClientCode : model.ClientName + " (" + model.ClientCode + ")"],
                ["Assessed on", model.AssessedOn.ToString("d MMMM yyyy", _culture)],
                ["Clinician", model.Clinician ?? "not recorded"],
                ["Method version", model.MethodVersion],
            ]);

            Heading("Inputs");
            Table([0.35, 0.65], ["Input", "Value"], model.Inputs.Select(i => new[] { i.Label, i.Value }));

            Heading("Equivalent power by method");
            Table([0.26, 0.15, 0.14, 0.45], ["Method", "Power", "EVD", "Basis"], model.Estimates.Select(e => new[]
            {
                e.Method,
                e.EquivalentPower is { } p ? p.ToString(null, _culture) : "not available",
                e.EquivalentPower is { Dioptres: > 0 } q ? q.FocalLength.ToString(null, _culture) : "–",
                e.DisagreesWithOthers ? e.Basis + ". Differs from another estimate by more than 0.2 log units." : e.Basis,
            }));

            Heading(model.ChosenOptions.Count == 1 ? "Chosen option" : "Chosen options");
            foreach (var option in model.ChosenOptions)
            {
                flow.Space(Line * 0.4);
                flow.KeepTogether(Line * 4);
                flow.Paragraph(option.Name, bold, Line);
                Table([0.35, 0.65], ["Figure", "Value"], Figures(option).Select(f => new[] { f.Label, f.Value }));
                flow.Space(Line * 0.3);
                Bullets("Reasons", option.Reasons);
                Bullets("Cautions", option.Cautions);
            }

            Heading("Trials and outcomes");
            if (model.Trials.Count == 0)
                flow.Paragraph("No trial recorded yet.", regular, Line);
            else
                Table([0.14, 0.24, 0.2, 0.28, 0.14], ["Date", "Device", "Task", "Result", "Outcome"], model.Trials.Select(t => new[]
                {
                    t.Date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture), t.Device, t.Task, t.Result, t.Outcome,
                }));

            foreach (var figure in model.FigureTables ?? [])
            {
                if (figure.Columns.Count == 0)
                    continue;
                Heading(figure.Caption);
                var columns = Enumerable.Repeat(1.0 / figure.Columns.Count, figure.Columns.Count).ToArray();
                Table(columns, [.. figure.Columns], figure.Rows.Select(r => Enumerable.Range(0, figure.Columns.Count).Select(c => c < r.Count ? r[c] : string.Empty).ToArray()));
            }

            flow.Space(Line);
            flow.Paragraph(StartingPointNote, regular, Line);
            flow.Finish("Clinician summary, client " + model.ClientCode + "  ·  " + model.MethodVersion, regular);
        }

        return ReportResult.Ok(PdfOutput.Save(document), FileNames.For("summary", model.ClientCode));
    }

    private static string? Validate(ClinicianSummary model)
    {
        if (model.ChosenOptions is null || model.ChosenOptions.Count == 0)
            return ReportMessages.NoChosenOption;
        if (model.ChosenOptions.Any(o => o is null || string.IsNullOrWhiteSpace(o.Name)))
            return ReportMessages.UnnamedDevice;
        if (string.IsNullOrWhiteSpace(model.ClientCode))
            return ReportMessages.NoClientCode;
        if (model.Clinic is null || string.IsNullOrWhiteSpace(model.Clinic.Name) || string.IsNullOrWhiteSpace(model.Clinic.Phone))
            return ReportMessages.NoClinicContact;
        if (string.IsNullOrWhiteSpace(model.MethodVersion))
            return ReportMessages.NoMethodVersion;
        return null;
    }

    private IEnumerable<OptionFigure> Figures(ChosenOption option)
    {
        yield return new OptionFigure("Kind", option.Kind);
        yield return new OptionFigure("Equivalent power", option.EquivalentPower.ToString(null, _culture));
        yield return new OptionFigure("Working distance", Length(option.WorkingDistance));
        if (option.Field is { } field)
            yield return new OptionFigure("Field on the page", field.Abs().Millimetres.ToString("0", _culture) + " mm");
        if (option.LettersInView is { } letters)
            yield return new OptionFigure("Letters of target print in view", letters.ToString(_culture));
        foreach (var figure in option.OtherFigures)
            yield return figure;
    }

    private string Length(Distance distance)
    {
        var magnitude = distance.Abs();
        return magnitude.Centimetres.ToString("0.0", _culture) + " cm (" + magnitude.Inches.ToString("0.0", _culture) + " in)";
    }
}
