using LowVisionAid.Reports;
using LowVisionAid.Reports.Figures;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Web.Handouts;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Plans;

/// <summary>
/// The handout (<c>?for=client</c>) or the clinician summary (<c>?for=clinician</c>) as a page to print from the
/// browser, with the same wording and figures as the PDFs.
/// </summary>
public sealed class PrintModel(PlanReports reports) : PageModel
{
    public const string ForClient = "client";
    public const string ForClinician = "clinician";

    [FromQuery(Name = "for")]
    public string? For { get; set; }

    public bool IsForClient => !string.Equals(For, ForClinician, StringComparison.OrdinalIgnoreCase);

    public int PlanId { get; private set; }

    public string? Problem { get; private set; }

    public PlanReportData Plan { get; private set; } = null!;

    public ClientHandout Handout { get; private set; } = null!;

    public Reports.Summaries.ClinicianSummary Summary { get; private set; } = null!;

    public IReadOnlyList<TradeOffFigure> Figures { get; private set; } = [];

    /// <summary>The summary's words, the same as the PDF's.</summary>
    public Reports.Summaries.SummaryText SummaryText { get; } = new();

    /// <summary>The handout's body size and version for this reader, the same as the PDF's (<see cref="HandoutPrint.Fit(ClientHandout, IFormatProvider?)"/>).</summary>
    public HandoutPrintFit? Fit { get; private set; }

    /// <summary>The body's classes: the handout's, with its size in whole points (print.css has one rule a point).</summary>
    public string BodyClass => !IsForClient || Fit is null
        ? (IsForClient ? "print-client" : "print-clinician")
        : string.Create(System.Globalization.CultureInfo.InvariantCulture,
            $"print-client body-{Math.Clamp(Math.Ceiling(Fit.BodyPoints), ClientHandout.DefaultBodyPoints, ClientHandout.MaximumBodyPoints):0}{(Fit.ShortText ? " short-text" : "")}");

    /// <summary>The short handout's lines (very large print), a list's points gathered under one entry.</summary>
    public IReadOnlyList<(ShortHandoutPart Part, IReadOnlyList<string> Texts)> ShortBlocks { get; private set; } = [];

    /// <summary>The check line's size in points, from the handout's target print (same conversion as the PDF).</summary>
    public double CheckLinePoints => ClientHandoutRenderer.PointsFor(Handout.TargetPrint);

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var plan = await reports.LoadAsync(id, ct).ConfigureAwait(false);
        if (plan is null)
        {
            return NotFound();
        }

        PlanId = id;
        Plan = plan;
        if (!plan.HasChosenOption)
        {
            Problem = ReportMessages.NoChosenOption;
            return Page();
        }

        Handout = PlanReports.Handout(plan);
        Fit = HandoutPrint.Fit(Handout, System.Globalization.CultureInfo.InvariantCulture);
        if (Fit.ShortText)
        {
            ShortBlocks = Gather(ShortHandout.Lines(Handout, System.Globalization.CultureInfo.InvariantCulture));
        }

        Summary = reports.Summary(plan);
        Figures = reports.Figures(plan, "print");
        return Page();
    }

    private static List<(ShortHandoutPart, IReadOnlyList<string>)> Gather(IReadOnlyList<ShortHandoutLine> lines)
    {
        var blocks = new List<(ShortHandoutPart Part, IReadOnlyList<string> Texts)>();
        foreach (var (part, text) in lines)
        {
            if (part == ShortHandoutPart.Point && blocks.Count > 0 && blocks[^1].Part == ShortHandoutPart.Point)
            {
                blocks[^1] = (part, [.. blocks[^1].Texts, text]);
            }
            else
            {
                blocks.Add((part, [text]));
            }
        }

        return blocks;
    }

    public static string Cm(Optics.Quantities.Distance d) =>
        Optics.Notation.DistanceNotation.Format(d.Abs(), System.Globalization.CultureInfo.InvariantCulture);

    public static string Inches(Optics.Quantities.Distance d) =>
        Optics.Notation.DistanceNotation.Format(d.Abs(), System.Globalization.CultureInfo.InvariantCulture, "in");

    public static string FontFamily => HyperlegibleFont.FamilyName;
}

/// <summary>A table of the print view: its header and its rows, the first cell of each a row header.</summary>
public sealed record PrintTable(IReadOnlyList<string> Columns, IReadOnlyList<string[]> Rows);
