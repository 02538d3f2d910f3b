using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Optics.Notation;

namespace LowVisionAid.Browser.Tests;

/// <summary>
/// The calculation API over real HTTP on the Kestrel server. Check values are published conversions and worked
/// examples, named beside each with its tolerance.
/// </summary>
[Trait("Category", "Browser")]
public sealed class CalculationApiTests(AppServer app) : IClassFixture<AppServer>, IDisposable
{
    private readonly HttpClient _http = new() { BaseAddress = app.BaseAddress };

    public void Dispose() => _http.Dispose();

    [Fact]
    public async Task The_OpenAPI_document_is_served_at_the_framework_default_and_describes_every_endpoint()
    {
        // Act
        using var document = JsonDocument.Parse(await _http.GetStringAsync(new Uri("openapi/v1.json", UriKind.Relative)));

        // Assert
        var root = document.RootElement;
        Assert.StartsWith("3.", root.GetProperty("openapi").GetString(), StringComparison.Ordinal);
        Assert.Equal("LowVisionAid calculation API", root.GetProperty("info").GetProperty("title").GetString());
        var paths = root.GetProperty("paths").EnumerateObject().Select(p => p.Name).ToHashSet(StringComparer.Ordinal);
        Assert.Superset(new HashSet<string>(StringComparer.Ordinal)
        {
            "/api/plan", "/api/convert/acuity", "/api/convert/print-size", "/api/convert/near-acuity", "/api/convert/distance",
        }, paths);
    }

    [Fact]
    public async Task Converts_20_200_to_6_60_logMAR_1_and_VAS_50()
    {
        // Snellen definition and the standard line table (methods §1.1): 20/200 = 6/60 = 0.1 decimal = logMAR 1.0;
        // VAS = 100 − 50 × logMAR = 50 (DICOM PS3.17 Annex RR.2.2). Tolerance 1e-9 (exact arithmetic).
        var body = await GetJsonAsync("api/convert/acuity?value=20%2F200");

        Assert.Equal(1.0, body.GetProperty("logMar").GetDouble(), 9);
        Assert.Equal(0.1, body.GetProperty("decimalAcuity").GetDouble(), 9);
        Assert.Equal("6/60", body.GetProperty("snellenMetres").GetString());
        Assert.Equal(50, body.GetProperty("visualAcuityScore").GetDouble(), 9);
    }

    [Fact]
    public async Task Converts_1M_at_40_cm_to_logMAR_0_40()
    {
        // Colenbrander 2001, 1/V = M × D (methods §1.2 check): 1M at 40 cm → 1/V = 2.5, logMAR log10(2.5) = 0.398.
        // Tolerance 0.001 (the published figure has three decimals).
        var body = await GetJsonAsync("api/convert/near-acuity?value=1M%20at%2040%20cm");

        Assert.Equal(0.398, body.GetProperty("logMar").GetDouble(), 0.001);
        Assert.Equal(40, body.GetProperty("testDistanceCentimetres").GetDouble(), 9);
    }

    [Fact]
    public async Task Converts_1M_to_an_x_height_of_1_4544_mm()
    {
        // Sloan 1959 (methods §1.2): 1M x-height = 1000 mm × tan(5′) = 1.4544 mm. Tolerance 0.0001 mm.
        var body = await GetJsonAsync("api/convert/print-size?value=1M");

        Assert.Equal(1.4544, body.GetProperty("xHeightMillimetres").GetDouble(), 0.0001);
        Assert.Equal(JsonValueKind.Null, body.GetProperty("warning").ValueKind);
    }

    [Fact]
    public async Task A_point_size_is_converted_with_its_approximate_warning()
    {
        // Law 1951 with the 1M ≈ N8 convention (methods §1.3): N8 ≈ 0.97M at an x-height ratio of 0.50 (derived).
        var body = await GetJsonAsync("api/convert/print-size?value=N8");

        Assert.Equal(0.970, body.GetProperty("m").GetDouble(), 0.001);
        Assert.Equal(PrintSizeNotation.Parse("N8", CultureInfo.InvariantCulture).Warning, body.GetProperty("warning").GetString());
    }

    [Fact]
    public async Task A_value_the_parser_cannot_read_gives_a_validation_problem_with_the_parsers_own_message()
    {
        // Act: a bare 0.5 is ambiguous (decimal 6/12 or logMAR 6/19), so the parser refuses it.
        using var response = await _http.GetAsync(new Uri("api/convert/acuity?value=0.5", UriKind.Relative));

        // Assert
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        using var problem = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        var expected = DistanceAcuityNotation.Parse("0.5", CultureInfo.InvariantCulture).Error;
        Assert.Equal(expected, problem.RootElement.GetProperty("errors").GetProperty("value")[0].GetString());
        Assert.Equal(400, problem.RootElement.GetProperty("status").GetInt32());
    }

    [Fact]
    public async Task A_plan_for_Baileys_example_gives_15_6_D_and_ranked_options_with_their_cautions()
    {
        // Bailey, "Prescribing magnification" (methods §2.2): 4M at 32 cm, target 0.8M, no reserve → EVD 6.4 cm,
        // Feq 15.625 D (published). Tolerance 1e-9 (exact arithmetic on the published inputs).
        var request = new
        {
            nearAcuity = "4M at 32 cm",
            targetPrint = "0.8M",
            workingDistance = "25 cm",
            reserve = "Spot",
            task = "SustainedReading",
        };

        // Act
        using var response = await _http.PostAsJsonAsync(new Uri("api/plan", UriKind.Relative), request);

        // Assert
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        using var plan = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        var root = plan.RootElement;
        var near = root.GetProperty("estimates").EnumerateArray().Single(e => e.GetProperty("method").GetString() == "NearAcuity");
        Assert.Equal(15.625, near.GetProperty("equivalentPowerDioptres").GetDouble(), 9);
        Assert.Equal(6.4, near.GetProperty("equivalentViewingDistanceCm").GetDouble(), 9);
        Assert.Equal(15.625, root.GetProperty("plannedForDioptres").GetDouble(), 9);
        var options = root.GetProperty("options").EnumerateArray().ToList();
        Assert.True(options.Count >= 5, $"Expected the options of a near task, got {options.Count}.");
        Assert.Equal(Enumerable.Range(1, options.Count), options.Select(o => o.GetProperty("position").GetInt32()));
        Assert.All(options, o => Assert.NotEmpty(o.GetProperty("reasons").EnumerateArray()));
        var cautions = root.GetProperty("cautions").EnumerateArray().Select(c => c.GetProperty("id").GetString()).ToList();
        Assert.Contains("starting-point", cautions);
        Assert.Contains("referral", cautions);
    }

    [Fact]
    public async Task A_plan_without_its_inputs_gives_a_validation_problem_naming_each_missing_field()
    {
        // Act
        using var response = await _http.PostAsJsonAsync(new Uri("api/plan", UriKind.Relative), new { task = "SustainedReading", reserve = "Fluent" });

        // Assert
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        using var problem = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        var errors = problem.RootElement.GetProperty("errors");
        Assert.Equal(
            ["distanceAcuity", "targetPrint", "workingDistance"],
            errors.EnumerateObject().Select(e => e.Name).Order(StringComparer.Ordinal));
        Assert.StartsWith("Enter the distance the client wants to work at", errors.GetProperty("workingDistance")[0].GetString(), StringComparison.Ordinal);
    }

    private async Task<JsonElement> GetJsonAsync(string path)
    {
        using var response = await _http.GetAsync(new Uri(path, UriKind.Relative));
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        using var document = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        return document.RootElement.Clone();
    }
}
