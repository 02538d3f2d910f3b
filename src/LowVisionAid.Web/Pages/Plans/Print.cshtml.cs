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
        Summary = reports.Summary(plan);
        Figures = reports.Figures(plan, "print");
        return Page();
    }

    public static string Cm(Optics.Quantities.Distance d) =>
        Optics.Notation.DistanceNotation.Format(d.Abs(), System.Globalization.CultureInfo.InvariantCulture);

    public static string Inches(Optics.Quantities.Distance d) =>
        Optics.Notation.DistanceNotation.Format(d.Abs(), System.Globalization.CultureInfo.InvariantCulture, "in");

    public static string FontFamily => HyperlegibleFont.FamilyName;
}
