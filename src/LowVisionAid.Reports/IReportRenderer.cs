namespace LowVisionAid.Reports;

/// <summary>Renders one kind of report from its plain input model.</summary>
/// <typeparam name="TModel">The report's input model, holding values already computed.</typeparam>
public interface IReportRenderer<in TModel>
{
    /// <summary>Checks the model and renders it; bad input gives a failed result with a message, never an empty document.</summary>
    /// <param name="model">The values to print.</param>
    ReportResult Render(TModel model);
}
