using System.Globalization;
using LowVisionAid.Reports;
using LowVisionAid.Reports.Figures;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Summaries;

using LowVisionAid.Web.Handouts;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>The reports of a saved plan: handout and summary PDFs, the trade-off figures and the print view.</summary>
internal static class HandoutsSetup
{
    public static WebApplicationBuilder AddPlanHandouts(this WebApplicationBuilder builder)
    {
        // The renderers are stateless and thread-safe; wording is English, numbers invariant like the plan page.
        var culture = CultureInfo.InvariantCulture;
        builder.Services.AddSingleton<IReportRenderer<ClientHandout>>(new ClientHandoutRenderer(culture));
        builder.Services.AddSingleton<IReportRenderer<ClinicianSummary>>(new ClinicianSummaryRenderer(culture));
        builder.Services.AddSingleton(new TradeOffFigures(culture));
        builder.Services.AddScoped<StoredPlanReader>();
        builder.Services.AddScoped<PlanReports>();
        return builder;
    }
}
