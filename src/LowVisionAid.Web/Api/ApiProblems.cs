using Microsoft.AspNetCore.Http;

namespace LowVisionAid.Web.Api;

/// <summary>
/// Puts a sentence that says what to send into the API's problem details that the framework writes without one: a
/// body that is not a readable JSON object (400), a body not sent as JSON (415), the wrong method (405), an unknown
/// address (404). Refusals of a typed value already carry the parser's message in <c>errors</c> and are left alone.
/// </summary>
internal static class ApiProblems
{
    public const string Example = "{\"distanceAcuity\": \"6/60\", \"targetPrint\": \"1M\", \"workingDistance\": \"25 cm\", \"handsFree\": false}";

    public const string PlanUnreadable =
        "The request could not be read as a plan. Send one JSON object, with the header Content-Type: application/json, whose " +
        "measurements are text in quotes and whose constraints (handsFree, tremor, oneUsefulEye) are true or false, e.g. " + Example +
        ". docs/api.md and /openapi/v1.json list every field.";

    public const string ConversionUnreadable =
        "Give the text to convert once, as ?value=…, e.g. /api/convert/acuity?value=6%2F60 or /api/convert/distance?value=25%20cm.";

    public const string WrongMethod =
        "Use POST for /api/plan (a JSON body) and GET for /api/convert/acuity, /print-size, /near-acuity or /distance (?value=…); /openapi/v1.json describes each.";

    public const string UnknownAddress =
        "There is no such address in the API. Use POST /api/plan or GET /api/convert/acuity?value=6%2F60 (also print-size, near-acuity, distance); /openapi/v1.json lists them.";

    public const string Fault =
        "Something went wrong on our side and nothing was stored. Send the request again; if it happens again, note the time and tell the clinic's administrator.";

    public static void Explain(ProblemDetailsContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var problem = context.ProblemDetails;
        if (!string.IsNullOrEmpty(problem.Detail) || problem is HttpValidationProblemDetails { Errors.Count: > 0 }
            || !context.HttpContext.Request.Path.StartsWithSegments("/api", StringComparison.OrdinalIgnoreCase))
        {
            return;
        }

        var plan = context.HttpContext.Request.Path.StartsWithSegments("/api/plan", StringComparison.OrdinalIgnoreCase);
        problem.Detail = problem.Status switch
        {
            StatusCodes.Status400BadRequest or StatusCodes.Status415UnsupportedMediaType => plan ? PlanUnreadable : ConversionUnreadable,
            StatusCodes.Status405MethodNotAllowed => WrongMethod,
            StatusCodes.Status404NotFound => UnknownAddress,
            >= 500 => Fault,
            _ => null,
        };
    }
}
