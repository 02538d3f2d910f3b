using System.Globalization;
using System.Text.Json;
using System.Text.Json.Serialization;
using LowVisionAid.Web.Pages.Calculator;
using Microsoft.AspNetCore.Http.HttpResults;

namespace LowVisionAid.Web.Api;

/// <summary>
/// The JSON API for the calculation: a plan from its inputs and the notation conversions, under <c>/api</c>, with
/// its OpenAPI document at <c>/openapi/v1.json</c>. Errors are ProblemDetails (see docs/api.md).
/// </summary>
public static class CalculationApi
{
    /// <summary>The OpenAPI document's title.</summary>
    public const string Title = "LowVisionAid calculation API";

    /// <summary>The API's documents and error shapes; its handler (<see cref="QuickPlanHandler"/>) is registered with the pages'.</summary>
    public static IServiceCollection AddCalculationApi(this IServiceCollection services)
    {
        services.Configure<ProblemDetailsOptions>(options => options.CustomizeProblemDetails = ApiProblems.Explain);
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

        var api = app.MapGroup("/api");

        api.MapPost("/plan", Plan)
            .WithName("Plan")
            .WithTags("Plan")
            .WithSummary("A starting magnifier plan from typed measurements")
            .WithDescription("Every field is text as a clinician would type it (\"6/60\", \"4M at 40 cm\", \"25 cm\"). The result holds each input as understood, the required power by each method with any disagreement flagged, the ranked options with every figure, and the cautions.");

        var convert = api.MapGroup("/convert").WithTags("Conversions");
        convert.MapGet("/acuity", ([AsParameters] ConversionQuery q) => Conversions.Acuity(q.Value))
            .WithName("ConvertAcuity").WithSummary("A distance acuity (6/60, 20/200, 0.1 decimal, logMAR 1.0, VAS 50) in every notation")
            .Produces<AcuityConversion>().ProducesValidationProblem();
        convert.MapGet("/print-size", ([AsParameters] ConversionQuery q) => Conversions.PrintSize(q.Value))
            .WithName("ConvertPrintSize").WithSummary("A print size (1M, N8, 12 pt, 1.5 mm) in M units, x-height and approximate points")
            .Produces<PrintSizeConversion>().ProducesValidationProblem();
        convert.MapGet("/near-acuity", ([AsParameters] ConversionQuery q) => Conversions.NearAcuity(q.Value))
            .WithName("ConvertNearAcuity").WithSummary("A near acuity (4M at 40 cm, N8 at 25 cm, 0.40/1.0M) and the logMAR it implies")
            .Produces<NearAcuityConversion>().ProducesValidationProblem();
        convert.MapGet("/distance", ([AsParameters] ConversionQuery q) => Conversions.Distance(q.Value))
            .WithName("ConvertDistance").WithSummary("A distance (25 cm, 0.4 m, 10 in) in metres, centimetres and inches")
            .Produces<DistanceConversion>().ProducesValidationProblem();
        return app;
    }

    private static Results<Ok<QuickPlanView>, ValidationProblem> Plan(QuickPlanInput input, QuickPlanHandler handler)
    {
        var outcome = handler.Handle(input, CultureInfo.InvariantCulture);
        if (outcome.Plan is { } plan)
        {
            return TypedResults.Ok(plan);
        }

        // Keys are the JSON property names of the request ("distanceAcuity"), or "" for the request as a whole.
        var errors = outcome.Errors.ToDictionary(
            e => JsonNamingPolicy.CamelCase.ConvertName(e.Key),
            e => new[] { e.Value },
            StringComparer.Ordinal);
        return TypedResults.ValidationProblem(errors, title: "The plan could not be worked out from these inputs.");
    }

    /// <summary>The text to convert.</summary>
    /// <param name="Value">What was typed, e.g. "6/60".</param>
    internal sealed record ConversionQuery(string? Value);
}
