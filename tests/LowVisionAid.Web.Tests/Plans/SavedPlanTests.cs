using System.Net;
using System.Text.Json;
using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Handouts;
using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Web.Plans;
using LowVisionAid.Web.Tests.Support;
using Microsoft.AspNetCore.Hosting;

namespace LowVisionAid.Web.Tests.Plans;

public class SavedPlanTests
{
    /// <summary>
    /// The outputs as the release before the typed plan wrote them (schema 1: a display-text snapshot, every figure
    /// already formatted), made here from today's planner for the same inputs, so the old row is what that release
    /// stored for them.
    /// </summary>
    private static string OldSnapshot(TypedPlan plan) => JsonSerializer.Serialize(new
    {
        plan.MethodVersion,
        Assumptions = PlanText.Assumptions(plan),
        Goals = plan.Goals.Select(g => new
        {
            Title = PlanText.GoalTitle(g, plan.Imperial),
            Target = g.TargetText,
            Task = PlanText.PlannedAs(g.PlannedAs),
            Problems = g.Problems,
            RequiredPower = g.RequiredPower is { } p ? PlanText.Power(p) : null,
            RequiredPowerFrom = PlanText.RequiredPowerFrom(g),
            Options = g.Options.Select(o => new
            {
                o.Position,
                Kind = PlanText.Kind(o.Option.Kind),
                KitCode = (string?)null,
                KitName = (string?)null,
                Summary = o.Option.Summary(System.Globalization.CultureInfo.InvariantCulture),
                Usable = Optics.Planning.OptionUse.IsUsable(o.Option),
                Notes = PlanText.Notes(o.Option),
                Figures = PlanText.Figures(o.Option, false),
                Reasons = o.Reasons.Select(r => new { r.Text, r.InFavour }),
            }),
            KitDevices = Array.Empty<object>(),
            Cautions = g.Cautions.Select(c => new { c.Id, c.Text }),
        }),
    });

    private static PlanInputs Inputs() => TypedPlanTests.Inputs() with { Kit = [] };

    /// <summary>Saves a plan row as given, with the first option of the first goal chosen, and the clinic's settings.</summary>
    private static Task<int> SaveChosenPlanAsync(ClinicApp app, string clientCode, string methodVersion, string inputsJson, string outputsJson) =>
        app.WithDbAsync(async db =>
        {
            var settings = Demo.DemoClinic.DefaultSettings("Test Clinic (invented)", hasDemoData: false);
            settings.ClinicContact = "000 1111 2222 (invented)";
            db.Settings.Add(settings);
            var client = new Client { Code = clientCode };
            var visit = new Visit { VisitDate = new DateOnly(2026, 11, 20) };
            visit.Plans.Add(new Plan
            {
                MethodVersion = methodVersion,
                InputsJson = inputsJson,
                OutputsJson = outputsJson,
                Choices = PlanChoices.None.With(new PlanOptionRef(0, PlanOptionList.Options, 0)),
                ChosenUtc = new DateTime(2026, 11, 20, 10, 0, 0, DateTimeKind.Utc),
            });
            client.Visits.Add(visit);
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            return visit.Plans[0].Id;
        });

    [Fact]
    public async Task A_plan_saved_in_the_old_display_text_form_still_opens_and_prints()
    {
        // Arrange: a database row as the current release writes it, with a choice made for the first goal.
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var inputs = Inputs();
        var old = OldSnapshot(PlanBuilder.Build(inputs));
        var planId = await SaveChosenPlanAsync(app, "OLD-1", Optics.Planning.Planner.MethodVersion, PlanJson.Write(inputs), old);
        Assert.Equal(1, LegacyPlanReader.SchemaOf(old));

        // Act
        var page = WebUtility.HtmlDecode(await browser.GetStringAsync(new Uri($"/Plans/{planId}", UriKind.Relative)));
        var handout = await browser.GetAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative));
        var summary = await browser.GetAsync(new Uri($"/Plans/{planId}/Summary", UriKind.Relative));

        // Assert: the figures the old row showed are on the page, and both documents are made.
        using var stored = JsonDocument.Parse(old);
        var goal = stored.RootElement.GetProperty("Goals")[0];
        Assert.Contains(goal.GetProperty("RequiredPower").GetString()!, page, StringComparison.Ordinal);
        Assert.Contains(goal.GetProperty("Options")[0].GetProperty("Summary").GetString()!, page, StringComparison.Ordinal);
        Assert.DoesNotContain("saved by an earlier release", page, StringComparison.Ordinal);
        Assert.Equal("application/pdf", handout.Content.Headers.ContentType?.MediaType);
        Assert.Equal("application/pdf", summary.Content.Headers.ContentType?.MediaType);
    }

    // A row as the release before the typed plan writes it today (method 2026.12.3, with the reserve fields, the
    // reference estimate and the once-listed reasons issue 10 added), written out by hand in that release's shape.
    private const string MainInputsJson =
        """{"VisitId":7,"AgeYears":80,"DistanceLogMar":1,"NearThresholdM":4,"NearTestDistanceMetres":0.4,"ReadingSpeeds":[],"LogContrastSensitivity":1.5,"DimLighting":true,"AddWornDioptres":2.5,"MeasuredAmplitudeDioptres":null,"WorkingDistanceMetres":0.25,"HandsFree":false,"Tremor":false,"UsefulEyes":2,"SpotReserve":1,"FluentReserve":2,"SustainedReserve":3,"CharacterPitch":1.1,"Imperial":false,"Goals":[{"Task":"Newspaper","Detail":null,"TargetText":"1M","TargetM":1,"GoalLogMar":null,"ViewingDistanceMetres":null},{"Task":"Television","Detail":null,"TargetText":"6/12","TargetM":null,"GoalLogMar":0.3,"ViewingDistanceMetres":null}],"Kit":[]}""";

    private const string MainOutputsJson =
        """{"MethodVersion":"2026.12.3","Assumptions":["Television is planned at 3 m, an assumed viewing distance; measure the client's own."],"Goals":[{"Title":"Newspaper","Target":"1M","Task":"Sustained reading","Problems":[],"RequiredPower":"+20.00 D","RequiredPowerFrom":"From the Near acuity (equivalent viewing distance) estimate.","Estimates":[{"Method":"Kestenbaum's rule with reserve","EquivalentPower":"+20.00 D","ViewingDistance":"5 cm","Magnification":"5.0× (re 25 cm)","Reserve":"2:1","LogUnits":"1.30","Assumptions":[]}],"MethodsDisagree":false,"Disagreements":[],"ReadingCurveNote":null,"Options":[],"KitDevices":[],"NotConsidered":[],"Cautions":[],"Reserve":"2:1","ReserveWhy":"Acuity reserve 2:1, the usual reserve for sustained reading: 2:1 gives fluent reading for most readers.","ReferenceEstimates":[{"Method":"Kestenbaum's rule (1M at threshold)","EquivalentPower":"+10.00 D","ViewingDistance":"10 cm","Magnification":"2.5× (re 25 cm)","Reserve":"1:1","LogUnits":"1.00","Assumptions":[]}],"PossibleReasons":[]}]}""";

    [Fact]
    public async Task A_plan_row_as_the_display_text_release_writes_it_today_opens_with_its_reserve_and_prints()
    {
        // Arrange: 6/60 (1.0 logMAR), 4M read at 40 cm, newspaper 1M at 25 cm, and television to 6/12.
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await SaveChosenPlanAsync(app, "OLD-2", "2026.12.3", MainInputsJson, MainOutputsJson);
        Assert.Equal(1, LegacyPlanReader.SchemaOf(MainOutputsJson));

        // Act
        var page = WebUtility.HtmlDecode(await browser.GetStringAsync(new Uri($"/Plans/{planId}", UriKind.Relative)));
        var handout = await browser.GetAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative));
        var summary = await browser.GetAsync(new Uri($"/Plans/{planId}/Summary", UriKind.Relative));

        // Assert: fluent reading at 2:1 (Cheong, Lovie-Kitchin and Bowers 2002): near method 4 × 2 / (0.40 × 1) = +20 D
        // (derived, methods §2.2); Kestenbaum as published 1 / 0.1 = +10 D for reference only (methods §2.6); the
        // television goal at the task's typical 3 m, stated as an assumption (common practice).
        Assert.Contains("Reserve used: 2:1.", page, StringComparison.Ordinal);
        Assert.Contains("+20.00 D", page, StringComparison.Ordinal);
        Assert.Contains("For reference, not compared: Kestenbaum's rule as published (1M at threshold, no reserve) gives +10.00 D", page, StringComparison.Ordinal);
        Assert.Contains("Television is planned at 3 m, an assumed viewing distance", page, StringComparison.Ordinal);
        Assert.DoesNotContain("saved by an earlier release", page, StringComparison.Ordinal);
        Assert.Equal("application/pdf", handout.Content.Headers.ContentType?.MediaType);
        Assert.Equal("application/pdf", summary.Content.Headers.ContentType?.MediaType);
    }

    [Fact]
    public void An_old_plan_made_by_other_methods_is_marked_as_rebuilt()
    {
        var inputs = Inputs();
        var old = OldSnapshot(PlanBuilder.Build(inputs));

        var read = LegacyPlanReader.Read(old, PlanJson.Write(inputs), "0.9-earlier");

        Assert.Equal("0.9-earlier", read.RebuiltFromMethodVersion);
    }

    [Fact]
    public void The_handout_date_is_the_clinics_day_not_the_utc_day()
    {
        // 20:30 UTC on 2 December is 09:30 on 3 December in New Zealand (UTC+13 in summer; IANA tz database).
        var clock = new FixedClock(new DateTimeOffset(2026, 12, 2, 20, 30, 0, TimeSpan.Zero));
        var calendar = new ClinicCalendar(clock, TimeZoneInfo.FindSystemTimeZoneById("Pacific/Auckland"));
        var inputs = Inputs();
        var plan = new Plan
        {
            Id = 1,
            MethodVersion = Optics.Planning.Planner.MethodVersion,
            CreatedUtc = clock.GetUtcNow().UtcDateTime,
            InputsJson = PlanJson.Write(inputs),
            OutputsJson = PlanJson.Write(PlanBuilder.Build(inputs)),
        };

        var data = StoredPlanReader.Read(plan, new Visit { VisitDate = new DateOnly(2026, 12, 3) }, new Client { Code = "NZ-1" },
            Demo.DemoClinic.DefaultSettings("Test clinic", hasDemoData: false), calendar);

        Assert.Equal(new DateOnly(2026, 12, 3), data.IssuedOn);
        Assert.Equal(new DateOnly(2026, 12, 3), calendar.Today);
        Assert.Equal("09:30", calendar.TimeOf(plan.CreatedUtc));
    }

    [Fact]
    public async Task The_plan_page_shows_when_it_was_made_in_the_clinics_time_without_utc()
    {
        // 23:30 UTC on 2 December is 18:30 the same day in New York (UTC−5 in winter; IANA tz database).
        using var app = new ClinicApp();
        using var configured = app.WithWebHostBuilder(b => b.UseSetting(ClinicCalendar.TimeZoneKey, "America/New_York"));
        using var browser = configured.CreateClient();
        var inputs = Inputs();
        var planId = await app.WithDbAsync(async db =>
        {
            var client = new Client { Code = "NY-1" };
            var visit = new Visit { VisitDate = new DateOnly(2026, 12, 2) };
            visit.Plans.Add(new Plan
            {
                MethodVersion = Optics.Planning.Planner.MethodVersion,
                CreatedUtc = new DateTime(2026, 12, 2, 23, 30, 0, DateTimeKind.Utc),
                InputsJson = PlanJson.Write(inputs),
                OutputsJson = PlanJson.Write(PlanBuilder.Build(inputs)),
            });
            client.Visits.Add(visit);
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            return visit.Plans[0].Id;
        });

        var page = WebUtility.HtmlDecode(await browser.GetStringAsync(new Uri($"/Plans/{planId}", UriKind.Relative)));

        Assert.Contains("Made 2 Dec 2026 18:30", page, StringComparison.Ordinal);
        Assert.DoesNotContain("UTC", page, StringComparison.Ordinal);
    }
}
