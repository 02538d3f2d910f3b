using System.Net;
using LowVisionAid.Optics.Options;
using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Web.Plans;
using LowVisionAid.Web.Pages.Visits;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Tests.Pages.Visits;

/// <summary>
/// Case: Ms K, 17, a student at 6/60 (0.1 decimal) with both eyes, wants to see the classroom whiteboard from her
/// desk 8 m away at 6/12. A distance goal is entered with its own viewing distance, and the plan is made for it.
/// </summary>
public sealed class GoalViewingDistanceTests
{
    private static readonly VisitInputValidator Validator = new(new ClinicCalendar(new FixedClock(new DateTimeOffset(2026, 6, 1, 12, 0, 0, TimeSpan.Zero)), TimeZoneInfo.Utc));

    private static VisitInput Whiteboard(string viewingDistance) => new VisitInput
    {
        VisitDate = "2026-05-30",
        DistanceBoth = "6/60",
        Goals = [new GoalInput { Task = "Whiteboard", TargetPrint = "6/12", ViewingDistance = viewingDistance }],
    }.WithBlankRows();

    [Fact]
    public void A_whiteboard_at_8_m_is_accepted()
    {
        Assert.True(Validator.Validate(Whiteboard("8 m")).IsValid);
    }

    [Fact]
    public void A_whiteboard_at_50_cm_is_refused_with_the_range_and_what_to_type()
    {
        // Common practice: a whiteboard is seen from about 1 m (the front desk) to the back of a classroom (20 m).
        var result = Validator.Validate(Whiteboard("50 cm"));

        var failure = Assert.Single(result.Errors);
        Assert.Equal("Goals[0].ViewingDistance", failure.PropertyName);
        Assert.Equal("For distance viewing, enter a viewing distance between 1 m and 20 m, e.g. 4 m (50 cm is outside that range).", failure.ErrorMessage);
    }

    [Fact]
    public void A_viewing_distance_that_cannot_be_read_is_refused_on_its_field()
    {
        var failure = Assert.Single(Validator.Validate(Whiteboard("far")).Errors);
        Assert.Equal("Goals[0].ViewingDistance", failure.PropertyName);
    }

    [Fact]
    public void A_near_task_refuses_a_viewing_distance_and_points_to_the_working_distance()
    {
        var input = Whiteboard("");
        input.WorkingDistance = "25 cm";
        input.Goals[0] = new GoalInput { Task = "Newspaper", TargetPrint = "1M", ViewingDistance = "40 cm" };

        var failure = Assert.Single(Validator.Validate(input).Errors);

        Assert.Equal("Goals[0].ViewingDistance", failure.PropertyName);
        Assert.Equal(VisitInputValidator.NearGoalDistance, failure.ErrorMessage);
        Assert.Contains("preferred working distance", failure.ErrorMessage, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_whiteboard_at_8_m_is_kept_shown_and_planned_at_8_m()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var clientId = await app.ClientAsync("G-1");
        var form = Records.VisitForm();
        form["Input.Goals[0].Task"] = "Whiteboard";
        form["Input.Goals[0].Detail"] = "maths lessons";
        form["Input.Goals[0].TargetPrint"] = "6/12";
        form["Input.Goals[0].ViewingDistance"] = "8 m";

        // Saved as typed beside the number.
        var created = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", form);
        Assert.Equal(HttpStatusCode.Redirect, created.StatusCode);
        var goal = await app.WithDbAsync(db => db.Set<LowVisionAid.Data.Entities.VisitGoal>().SingleAsync());
        Assert.Equal("8 m", goal.ViewingDistanceText);
        Assert.Equal(8.0, goal.ViewingDistance!.Value.Metres, 9);

        // Shown on the visit page and offered again on the edit form.
        var visitUrl = created.Headers.Location!.OriginalString;
        var visitPage = await browser.GetStringAsync(new Uri(visitUrl, UriKind.Relative));
        Assert.Contains("target 6/12 at 8 m", visitPage, StringComparison.Ordinal);
        var edit = await browser.GetStringAsync(new Uri(visitUrl + "/Edit", UriKind.Relative));
        Assert.Contains("value=\"8 m\"", edit, StringComparison.Ordinal);

        // The plan is made for 8 m, not the assumed 4 m.
        var planned = await browser.SubmitAsync(visitUrl, new Dictionary<string, string>(), visitUrl + "?handler=Plan");
        Assert.Equal(HttpStatusCode.Redirect, planned.StatusCode);
        var stored = await app.WithDbAsync(db => db.Plans.SingleAsync());
        var inputs = PlanJson.Read<PlanInputs>(stored.InputsJson);
        Assert.Equal(8.0, Assert.Single(inputs.Goals).ViewingDistanceMetres!.Value, 9);
        var typed = PlanJson.Read<TypedPlan>(stored.OutputsJson);
        Assert.DoesNotContain(PlanText.Assumptions(typed), a => a.Contains("assumed viewing distance", StringComparison.Ordinal));
        var plan = Assert.Single(typed.Goals);
        Assert.Equal("Whiteboard or board (maths lessons) at 8 m", PlanText.GoalTitle(plan, typed.Imperial));

        // Derived (methods §2.7, relative distance: M = old distance ÷ new distance): 6/60 to 6/12 needs 60 / 12 = 5×;
        // from 8 m she must sit at 8 / 5 = 1.6 m (at the assumed 4 m it would be 0.8 m).
        var closer = Assert.Single(plan.Options, o => o.Option.Kind == OptionKind.MovingCloser).Option;
        Assert.Equal(1.6, closer.WorkingDistance.Metres, 9);
        Assert.Equal("160 cm", Assert.Single(PlanText.Figures(closer, typed.Imperial), f => f.Label == "Working distance").Value);
        // A telescope's magnification is the same 5× at any distance (methods §3.5: M = acuity now ÷ acuity wanted).
        var telescope = plan.Options.First(o => o.Option.Kind is OptionKind.DistanceTelescope or OptionKind.SpectacleTelescope).Option;
        Assert.Contains("(5× needed)", Assert.Single(PlanText.Figures(telescope, typed.Imperial), f => f.Label == "Magnification").Value, StringComparison.Ordinal);
        // The plan page names the distance in the goal's heading.
        var planPage = await browser.GetStringAsync(new Uri($"/Plans/{stored.Id}", UriKind.Relative));
        Assert.Contains("Whiteboard or board (maths lessons) at 8 m", planPage, StringComparison.Ordinal);
    }
}
