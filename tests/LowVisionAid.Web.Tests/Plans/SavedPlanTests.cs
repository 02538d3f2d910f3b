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
            Title = PlanText.GoalTitle(g),
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

    [Fact]
    public async Task A_plan_saved_in_the_old_display_text_form_still_opens_and_prints()
    {
        // Arrange: a database row as the current release writes it, with a choice made for the first goal.
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var inputs = Inputs();
        var old = OldSnapshot(PlanBuilder.Build(inputs));
        var planId = await app.WithDbAsync(async db =>
        {
            var settings = Demo.DemoClinic.DefaultSettings("Test Clinic (invented)", hasDemoData: false);
            settings.ClinicContact = "000 1111 2222 (invented)";
            db.Settings.Add(settings);
            var client = new Client { Code = "OLD-1" };
            var visit = new Visit { VisitDate = new DateOnly(2026, 11, 20) };
            visit.Plans.Add(new Plan
            {
                MethodVersion = Optics.Planning.Planner.MethodVersion,
                InputsJson = PlanJson.Write(inputs),
                OutputsJson = old,
                Choices = PlanChoices.None.With(new PlanOptionRef(0, PlanOptionList.Options, 0)),
                ChosenUtc = new DateTime(2026, 11, 20, 10, 0, 0, DateTimeKind.Utc),
            });
            client.Visits.Add(visit);
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            return visit.Plans[0].Id;
        });
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
