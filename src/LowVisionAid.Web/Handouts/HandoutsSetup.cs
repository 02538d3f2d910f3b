using System.Globalization;
using LowVisionAid.Reports;
using LowVisionAid.Reports.Figures;
using LowVisionAid.Reports.Fonts;
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

    /// <summary>
    /// Serves the handout face to the browser at <c>/fonts/…</c> (the four TTFs and <c>OFL.txt</c>) from the
    /// Reports assembly, so the repository keeps one copy of the fonts (src/LowVisionAid.Reports/Fonts) and the
    /// print view and the figures use exactly the face the PDFs embed. Open to everyone, like the static files.
    /// </summary>
    public static WebApplication MapHandoutFonts(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        app.MapGet("/fonts/{file}", (string file, HttpContext http) =>
        {
            if (string.Equals(file, "OFL.txt", StringComparison.Ordinal))
            {
                return Results.Text(HyperlegibleFont.LicenceText, "text/plain", System.Text.Encoding.UTF8);
            }

            if (!HyperlegibleFont.FaceFiles.TryGetValue(file, out var face))
            {
                return Results.NotFound();
            }

            http.Response.Headers.CacheControl = "public, max-age=86400";
            return Results.Bytes(HyperlegibleFont.GetFontBytes(face.Bold, face.Italic), "font/ttf");
        }).AllowAnonymous().ExcludeFromDescription();
        return app;
    }
}
