using LowVisionAid.Reports;
using LowVisionAid.Web.Handouts;

namespace LowVisionAid.Web.Pages.Plans;

/// <summary>The clinician summary for the record as a PDF, or, when it cannot be printed, the reason on screen.</summary>
public sealed class SummaryModel(PlanReports reports) : PlanPdfPage(reports)
{
    protected override ReportResult Render(PlanReports reports, PlanReportData plan) => reports.RenderSummary(plan);
}
