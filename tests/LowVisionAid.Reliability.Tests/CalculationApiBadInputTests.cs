using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;
using CsCheck;
using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.TestSupport;
using Microsoft.Extensions.Logging;
using Xunit.Abstractions;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// Property-based bad input at scale for the JSON API: <see cref="InputsPerEndpoint"/> generated requests per endpoint (10,000 in the full run) (the plan and
/// each conversion) with random strings, huge and non-finite numbers, negative distances, unusual Unicode, overlong
/// fields, wrong JSON types and malformed JSON. No answer is a server error, nothing escapes as an exception (no error
/// in the log), an answer is JSON, and every refusal is a ProblemDetails whose message says what to type.
/// </summary>
// The calculation API holds no state: its handler reads neither the database nor the clinic's settings.
[Trait("Category", TestServer.NoDatabaseCategory)]
public sealed partial class CalculationApiBadInputTests(ITestOutputHelper output)
{
    /// <summary>CsCheck's iteration count: CsCheck_Iter, which scripts/test.sh sets to 10,000; CsCheck's default (100) otherwise.</summary>
    public static long InputsPerEndpoint => Check.Iter;

    private static readonly string[] Fields = ["distanceAcuity", "nearAcuity", "targetPrint", "workingDistance", "reserve", "task", "goalDistanceAcuity", "age"];
    private static readonly string[] Flags = ["handsFree", "tremor", "oneUsefulEye"];

    // Entries a clinician would type, so that most requests reach the planner and one or two hostile fields are read there.
    private static readonly Dictionary<string, string[]> Plausible = new(StringComparer.Ordinal)
    {
        ["distanceAcuity"] = ["6/60", "20/200", "logMAR 1.0", "6/24", "3/60"],
        ["nearAcuity"] = ["4M at 40 cm", "N24 at 25 cm", "0.40/2.0M"],
        ["targetPrint"] = ["1M", "N10", "0.8M", "N5"],
        ["workingDistance"] = ["25 cm", "40 cm", "10 in", "3 m"],
        ["reserve"] = ["UsualForTask", "Spot", "Fluent", "Sustained"],
        ["task"] = ["SpotReading", "SustainedReading", "Writing", "Screen", "DistanceViewing"],
        ["goalDistanceAcuity"] = ["6/12", "6/9"],
        ["age"] = ["78", "12", "45"],
    };

    public static TheoryData<string> Conversions() => ["acuity", "print-size", "near-acuity", "distance"];

    [Trait("Category", "Slow")]
    [Theory]
    [MemberData(nameof(Conversions))]
    public async Task A_conversion_given_ten_thousand_hostile_values_answers_each_without_a_server_error_and_explains_every_refusal(string kind)
    {
        using var app = new ClinicApp("api-fuzz-" + kind, loadDemo: false) { LogCaptureLevel = LogLevel.Warning };   // errors are all it reads
        using var client = app.CreateClient();
        var tally = new Tally();

        Query.Sample(query =>
        {
            using var response = client.GetAsync(new Uri($"/api/convert/{kind}{query}", UriKind.Relative)).GetAwaiter().GetResult();
            return tally.Judge(response);
        }, iter: InputsPerEndpoint, print: q => Printable(q) + " → " + string.Join(" | ", tally.Wrong));

        output.WriteLine($"/api/convert/{kind}: {tally}");
        Assert.True(tally.Tried >= InputsPerEndpoint);
        app.Logs.AssertNoError();
    }

    [Trait("Category", "Slow")]
    [Fact]
    public async Task The_plan_given_ten_thousand_hostile_requests_answers_each_without_a_server_error_and_explains_every_refusal()
    {
        using var app = new ClinicApp("api-fuzz-plan", loadDemo: false) { LogCaptureLevel = LogLevel.Warning };   // errors are all it reads
        using var client = app.CreateClient();
        var tally = new Tally();

        PlanRequest.Sample(request =>
        {
            using var message = new HttpRequestMessage(request.Method, new Uri("/api/plan", UriKind.Relative));
            if (request.Body is not null)
            {
                message.Content = new ByteArrayContent(request.Body);
                if (request.ContentType is not null)
                {
                    message.Content.Headers.ContentType = MediaTypeHeaderValue.Parse(request.ContentType);
                }
            }

            using var response = client.SendAsync(message).GetAwaiter().GetResult();
            return tally.Judge(response);
        }, iter: InputsPerEndpoint, print: r => $"{r.Method} {r.ContentType}: {Printable(r.Body is null ? "(no body)" : Encoding.UTF8.GetString(r.Body))} → {string.Join(" | ", tally.Wrong)}");

        output.WriteLine($"/api/plan: {tally}");
        Assert.True(tally.Tried >= InputsPerEndpoint);
        app.Logs.AssertNoError();
    }

    [Theory]
    [InlineData("{\"distanceAcuity\": 6, \"targetPrint\": \"1M\", \"workingDistance\": \"25 cm\"}", "application/json")]   // a number where text is wanted
    [InlineData("{\"distanceAcuity\": \"6/60\", \"targetPrint\": \"1M\"", "application/json")]                            // cut short
    [InlineData("{\"distanceAcuity\": NaN}", "application/json")]                                                        // not JSON
    [InlineData("{\"handsFree\": \"yes\"}", "application/json")]                                                         // a flag as text
    [InlineData("", "application/json")]                                                                                 // empty
    [InlineData("{\"distanceAcuity\": \"6/60\"}", "text/plain")]                                                         // not sent as JSON
    public async Task A_plan_request_that_cannot_be_read_is_a_problem_that_shows_the_shape_to_send(string body, string contentType)
    {
        using var app = new ClinicApp("api-malformed", loadDemo: false);
        using var client = app.CreateClient();
        using var content = new StringContent(body, Encoding.UTF8);
        content.Headers.ContentType = MediaTypeHeaderValue.Parse(contentType);

        using var response = await client.PostAsync(new Uri("/api/plan", UriKind.Relative), content);
        var problem = JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;

        Assert.True((int)response.StatusCode is 400 or 415, $"gave {(int)response.StatusCode}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        var detail = problem.GetProperty("detail").GetString()!;
        Assert.Contains("\"workingDistance\": \"25 cm\"", detail, StringComparison.Ordinal);
    }

    // The query of a conversion: the value escaped as a browser would, sometimes raw (broken escapes), repeated, empty or missing.
    private static readonly Gen<string> Query = Gen.Frequency(
        (14, BadInput.Any.Select(v => "?value=" + Uri.EscapeDataString(v))),
        (2, BadInput.Any.Select(v => "?value=" + v.Replace("#", "%23", StringComparison.Ordinal))),
        (1, Gen.Select(BadInput.Any, BadInput.Any, (a, b) => $"?value={Uri.EscapeDataString(a)}&value={Uri.EscapeDataString(b)}")),
        (1, Gen.OneOf("", "?", "?value", "?value=", "?Value=6%2F60", "?value=%", "?value=%zz", "?value=%C0%AF", "?value=%ED%A0%80", "?value=%00", "?other=6%2F60")));

    private sealed record ApiRequest(HttpMethod Method, string? ContentType, byte[]? Body);

    // A JSON value for a text field: mostly a string, sometimes the wrong JSON type or a token that is not JSON at all.
    private static readonly Gen<string> TextValue = Gen.Frequency(
        (10, BadInput.Any.Select(s => JsonSerializer.Serialize(s))),
        (2, BadInput.Number),
        (1, Gen.OneOf("null", "true", "[]", "{}", "[\"6/60\"]", "{\"value\":\"6/60\"}", "\"\\ud800\"", "\"\\u0000\"", "\"6/60\\", "'6/60'", "6/60")));

    private static readonly Gen<string> FlagValue = Gen.OneOf("true", "false", "null", "\"yes\"", "1", "0", "\"true\"", "[]", "tru");

    // An object with each field absent, plausible or hostile; the flags likewise.
    private static readonly Gen<string> PlanObject =
        Gen.Select(
            Gen.Int[0, 3].Array[Fields.Length],
            TextValue.Array[Fields.Length],
            Gen.Int[0, 4].Array[Fields.Length],
            Gen.Int[0, 2].Array[Flags.Length],
            FlagValue.Array[Flags.Length],
            (mode, hostile, pick, flagMode, flags) =>
            {
                var members = new List<string>();
                for (var i = 0; i < Fields.Length; i++)
                {
                    var name = Fields[i];
                    switch (mode[i])
                    {
                        case 0: break;                                                                            // absent
                        case 1: members.Add($"\"{name}\": {hostile[i]}"); break;                                   // hostile
                        default: members.Add($"\"{name}\": \"{Plausible[name][pick[i] % Plausible[name].Length]}\""); break; // plausible
                    }
                }

                for (var i = 0; i < Flags.Length; i++)
                {
                    if (flagMode[i] > 0)
                    {
                        members.Add($"\"{Flags[i]}\": {(flagMode[i] == 1 ? "true" : flags[i])}");
                    }
                }

                return "{" + string.Join(", ", members) + "}";
            });

    // Whole bodies that are not one readable JSON object.
    private static readonly Gen<string> MalformedBody = Gen.OneOf(
        Gen.Select(PlanObject, Gen.Double[0, 1], (json, cut) => json[..(int)(json.Length * cut)]),                 // cut short
        BadInput.Any,                                                                                               // not JSON
        Gen.Int[1, 5_000].Select(n => new string('[', n) + new string(']', n)),                                    // deeply nested
        Gen.Int[1, 5_000].Select(n => string.Concat(Enumerable.Repeat("{\"a\":", n)) + "1" + new string('}', n)),
        PlanObject.Select(json => "\uFEFF" + json),                                                                 // byte-order mark
        PlanObject.Select(json => json.Replace("}", ", }", StringComparison.Ordinal)),                              // trailing comma
        PlanObject.Select(json => "/* note */ " + json),                                                            // comment
        PlanObject.Select(json => "[" + json + "]"),                                                                // array root
        Gen.OneOf("", " ", "null", "true", "0", "\"6/60\"", "{", "}", "{}", "{\"distanceAcuity\":\"6/60\",\"distanceAcuity\":\"6/6\"}"));

    private static readonly Gen<ApiRequest> PlanRequest = Gen.Frequency(
        (14, PlanObject.Select(json => new ApiRequest(HttpMethod.Post, "application/json", Encoding.UTF8.GetBytes(json)))),
        (4, MalformedBody.Select(body => new ApiRequest(HttpMethod.Post, "application/json", Encoding.UTF8.GetBytes(body)))),
        (1, Gen.Byte.Array[0, 200].Select(bytes => new ApiRequest(HttpMethod.Post, "application/json", bytes))),     // not UTF-8
        (1, Gen.Select(PlanObject, Gen.OneOf<string?>(null, "text/plain", "application/x-www-form-urlencoded", "application/json; charset=utf-16", "application/xml"),
            (json, type) => new ApiRequest(HttpMethod.Post, type, Encoding.UTF8.GetBytes(json)))),
        (1, Gen.OneOf(HttpMethod.Get, HttpMethod.Put, HttpMethod.Delete).Select(m => new ApiRequest(m, null, null))));

    /// <summary>Counts answers by status and judges each: no 5xx, JSON, and a refusal that says what to type.</summary>
    private sealed class Tally
    {
        private readonly System.Collections.Concurrent.ConcurrentDictionary<int, int> _byStatus = new();
        private int _tried;

        public int Tried => _tried;

        /// <summary>The first few answers judged wrong (status and body), to show when a run fails.</summary>
        public System.Collections.Concurrent.ConcurrentQueue<string> Wrong { get; } = new();

        public bool Judge(HttpResponseMessage response)
        {
            var right = IsRight(response, out var body);
            if (!right && Wrong.Count < 5)
            {
                Wrong.Enqueue($"{(int)response.StatusCode} {response.Content.Headers.ContentType}: {Printable(body)}");
            }

            return right;
        }

        private bool IsRight(HttpResponseMessage response, out string body)
        {
            Interlocked.Increment(ref _tried);
            var status = (int)response.StatusCode;
            _byStatus.AddOrUpdate(status, 1, (_, n) => n + 1);
            body = response.Content.ReadAsStringAsync().GetAwaiter().GetResult();
            if (status >= 500)
            {
                return false;
            }

            var type = response.Content.Headers.ContentType?.MediaType;
            if (status < 300)
            {
                return type == "application/json" && IsJson(body);
            }

            if (type != "application/problem+json" || !IsJson(body))
            {
                return false;
            }

            using var problem = JsonDocument.Parse(body);
            var root = problem.RootElement;
            if (!root.TryGetProperty("status", out var s) || s.GetInt32() != status || !root.TryGetProperty("title", out _))
            {
                return false;
            }

            var messages = new List<string>();
            if (root.TryGetProperty("detail", out var detail) && detail.ValueKind == JsonValueKind.String)
            {
                messages.Add(detail.GetString()!);
            }

            if (root.TryGetProperty("errors", out var errors))
            {
                messages.AddRange(errors.EnumerateObject().SelectMany(e => e.Value.EnumerateArray()).Select(m => m.GetString() ?? ""));
            }

            return messages.Count > 0 && messages.All(TellsWhatToType);
        }

        public override string ToString() =>
            $"{_tried} requests; answers by status: {string.Join(", ", _byStatus.OrderBy(kv => kv.Key).Select(kv => $"{kv.Key} × {kv.Value}"))}";
    }

    // A message that says what to do: long enough to be a sentence, with an instruction or an example in it.
    private static bool TellsWhatToType(string message) => message.Length >= 20 && Instruction().IsMatch(message);

    [GeneratedRegex(@"\b(type|enter|choose|send|use|give|leave|write|measure|check|try|add|put|remove|ask|such as|e\.g\.|for example|as in)\b", RegexOptions.IgnoreCase)]
    private static partial Regex Instruction();

    private static bool IsJson(string body)
    {
        try
        {
            using var _ = JsonDocument.Parse(body);
            return true;
        }
        catch (JsonException)
        {
            return false;
        }
    }

    private static string Printable(string text) =>
        string.Concat(text.Take(300).Select(c => char.IsControl(c) || char.IsSurrogate(c) || c > 0x7E ? $"\\u{(int)c:X4}" : c.ToString()));
}
