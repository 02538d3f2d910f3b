using LowVisionAid.Reports;
using LowVisionAid.Web.Handouts;

namespace LowVisionAid.Web.Pages.Plans;

/// <summary>The client's large-print handout as a PDF, or, when it cannot be printed, the reason on screen.</summary>
public sealed class HandoutModel(PlanReports reports) : PlanPdfPage(reports)
{
    protected override ReportResult Render(PlanReports reports, PlanReportData plan) => reports.RenderHandout(plan);
}
