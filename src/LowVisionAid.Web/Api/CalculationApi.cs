using System.Text.Json.Serialization;

namespace LowVisionAid.Web.Api;

/// <summary>
/// The JSON API for the calculation: a plan from its inputs and the notation conversions, under <c>/api</c>, with
/// its OpenAPI document at <c>/openapi/v1.json</c>. Errors are ProblemDetails (see docs/api.md).
/// </summary>
public static class CalculationApi
{
    /// <summary>The OpenAPI document's title.</summary>
    public const string Title = "LowVisionAid calculation API";

    public static IServiceCollection AddCalculationApi(this IServiceCollection services)
    {
        services.AddOpenApi(options => options.AddDocumentTransformer((document, _, _) =>
        {
            document.Info.Title = Title;
            document.Info.Description =
                "Conversions between acuity and print-size notations, and a starting magnifier plan from measured " +
                "acuity, target print and working distance. Every result is a starting point for a licensed " +
                "eye-care practitioner, not a prescription. Errors are RFC 9457 problem details.";
            return Task.CompletedTask;
        }));
        services.ConfigureHttpJsonOptions(options => options.SerializerOptions.Converters.Add(new JsonStringEnumConverter()));
        return services;
    }

    public static WebApplication MapCalculationApi(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        app.MapOpenApi();
        return app;
    }
}
