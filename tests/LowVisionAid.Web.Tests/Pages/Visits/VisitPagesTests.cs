using System.Net;
using System.Text.Encodings.Web;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Web.Pages.Visits;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Tests.Pages.Visits;

public class VisitPagesTests
{
    [Fact]
    public async Task A_new_visit_keeps_what_was_typed_beside_the_value_it_was_read_as()
    {
        using var app = new ClinicApp();
        var clientId = await app.ClientAsync("V-1");
        using var browser = app.Browser();

        var response = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", Records.VisitForm());

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var visit = await app.WithDbAsync(db => db.Visits.Include(v => v.Goals).Include(v => v.ReadingSpeeds).SingleAsync());
        Assert.Equal($"/Visits/{visit.Id}", response.Headers.Location?.OriginalString);
        Assert.Equal("6/60", visit.DistanceRightText);
        // 6/60 is logMAR 1.0 and 20/400 is logMAR 1.3 (methods.md §1.1 table, Bailey and Lovie 1976); tolerance 1e-9.
        Assert.Equal(1.0, visit.DistanceRight!.Value.LogMar, 9);
        Assert.Equal(1.30103, visit.DistanceLeft!.Value.LogMar, 5);
        Assert.Equal(0.40, visit.NearTestDistance!.Value.Metres, 9);
        Assert.Equal(4.0, visit.NearThreshold!.Value.M, 9);
        var goal = Assert.Single(visit.Goals);
        Assert.Equal("1M", goal.TargetText);
        Assert.Equal(90, Assert.Single(visit.ReadingSpeeds).WordsPerMinute);
    }

    [Fact]
    public async Task The_visit_page_shows_each_acuity_as_read_with_its_logMAR()
    {
        using var app = new ClinicApp();
        var clientId = await app.ClientAsync("V-2");
        using var browser = app.Browser();
        var saved = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", Records.VisitForm());

        var html = await browser.GetStringAsync(saved.Headers.Location);

        // 4M at 40 cm is logMAR log10(4/0.4) = 1.00 (Colenbrander 2001, M/d; derived).
        // Each cell carries its column name, so the read-back stacks into label/value lines on a narrow screen.
        Assert.Contains("<td data-label=\"You typed\">4M at 40 cm</td>", html, StringComparison.Ordinal);
        Assert.Contains("<td data-label=\"logMAR\">1.00</td>", html, StringComparison.Ordinal);
        Assert.Contains("6/120", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Checking_the_readings_shows_them_and_saves_nothing()
    {
        using var app = new ClinicApp();
        var clientId = await app.ClientAsync("V-3");
        using var browser = app.Browser();

        var response = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", Records.VisitForm(), $"/Visits/New?clientId={clientId}&handler=Check");

        var html = await response.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains("How the measurements were read", html, StringComparison.Ordinal);
        Assert.Equal(0, await app.WithDbAsync(db => db.Visits.CountAsync()));
    }

    [Fact]
    public async Task A_mistyped_acuity_is_refused_beside_its_field_and_the_typing_is_kept()
    {
        using var app = new ClinicApp();
        var clientId = await app.ClientAsync("V-4");
        using var browser = app.Browser();
        var form = Records.VisitForm();
        form["Input.DistanceRight"] = "6//60";
        form["Input.Goals[1].Task"] = "Phone";

        var response = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", form);

        var html = await response.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains("<a href=\"#Input_DistanceRight\">", html, StringComparison.Ordinal);
        Assert.Contains("id=\"Input_DistanceRight-error\"", html, StringComparison.Ordinal);
        Assert.Contains("value=\"6//60\"", html, StringComparison.Ordinal);
        Assert.Contains("<a href=\"#Input_Goals_1__TargetPrint\">", html, StringComparison.Ordinal);
        Assert.Equal(0, await app.WithDbAsync(db => db.Visits.CountAsync()));
    }

    [Fact]
    public async Task Each_goal_and_reading_speed_row_posts_under_its_own_index_with_its_numbered_label_and_its_error_beside_it()
    {
        using var app = new ClinicApp();
        var clientId = await app.ClientAsync("V-8");
        using var browser = app.Browser();
        var form = Records.VisitForm();
        form["Input.Goals[1].Task"] = "Phone";   // a second goal without its print size

        var response = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", form);

        var page = PageHtml.Parse(await response.Content.ReadAsStringAsync());
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        string? Label(string id) => page.QuerySelector($"label[for='{id}']")?.TextContent;
        for (var g = 0; g < VisitInput.GoalRows; g++)
        {
            foreach (var (field, label) in new[] { ("Task", "task"), ("Detail", "in the client's words (optional)"), ("TargetPrint", "target print size"), ("ViewingDistance", "viewing distance (distance tasks)") })
            {
                var id = $"Input_Goals_{g}__{field}";
                Assert.Equal($"Input.Goals[{g}].{field}", page.GetElementById(id)?.GetAttribute("name"));
                Assert.Equal($"Goal {g + 1}: {label}", Label(id));
            }
        }

        for (var r = 0; r < VisitInput.ReadingSpeedRows; r++)
        {
            Assert.Equal($"Input.ReadingSpeeds[{r}].PrintSize", page.GetElementById($"Input_ReadingSpeeds_{r}__PrintSize")?.GetAttribute("name"));
            Assert.Equal($"Line {r + 1}: words per minute", Label($"Input_ReadingSpeeds_{r}__WordsPerMinute"));
        }

        // What was typed comes back in its own row, and the second goal's error sits beside its print size.
        Assert.Equal("1M", page.GetElementById("Input_Goals_0__TargetPrint")?.GetAttribute("value"));
        Assert.Equal("Phone", page.QuerySelector("#Input_Goals_1__Task option[selected]")?.GetAttribute("value"));
        Assert.Equal("8M", page.GetElementById("Input_ReadingSpeeds_0__PrintSize")?.GetAttribute("value"));
        var missing = page.GetElementById("Input_Goals_1__TargetPrint")!;
        Assert.Equal("true", missing.GetAttribute("aria-invalid"));
        Assert.Contains("Input_Goals_1__TargetPrint-error", missing.GetAttribute("aria-describedby") ?? "", StringComparison.Ordinal);
        Assert.NotEmpty(page.GetElementById("Input_Goals_1__TargetPrint-error")?.TextContent ?? "");
        Assert.Null(page.GetElementById("Input_Goals_0__TargetPrint")?.GetAttribute("aria-invalid"));
    }

    [Fact]
    public async Task A_bare_number_is_not_guessed_and_the_core_message_says_how_to_write_it()
    {
        using var app = new ClinicApp();
        var clientId = await app.ClientAsync("V-6");
        using var browser = app.Browser();
        var form = Records.VisitForm();
        form["Input.DistanceBoth"] = "0.3";

        var response = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", form);

        var html = await response.Content.ReadAsStringAsync();
        var expected = DistanceAcuityNotation.Parse("0.3", CultureInfo.InvariantCulture).Error!;
        Assert.Contains(HtmlEncoder.Default.Encode(expected), html, StringComparison.Ordinal);
        Assert.Contains("id=\"Input_DistanceBoth-error\"", html, StringComparison.Ordinal);
        Assert.Equal(0, await app.WithDbAsync(db => db.Visits.CountAsync()));
    }

    [Fact]
    public async Task An_approximate_notation_is_read_back_with_its_caution()
    {
        using var app = new ClinicApp();
        var clientId = await app.ClientAsync("V-7");
        using var browser = app.Browser();
        var form = Records.VisitForm();
        form["Input.Goals[0].TargetPrint"] = "J5";

        var response = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", form, $"/Visits/New?clientId={clientId}&handler=Check");

        var html = await response.Content.ReadAsStringAsync();
        var warning = PrintSizeNotation.Parse("J5", CultureInfo.InvariantCulture).Warning;
        Assert.NotNull(warning);
        Assert.Contains("<strong>Caution:</strong> " + HtmlEncoder.Default.Encode(warning), html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_second_of_two_editors_is_told_and_keeps_what_they_typed()
    {
        using var app = new ClinicApp();
        var clientId = await app.ClientAsync("V-5");
        using var first = app.Browser();
        using var second = app.Browser();
        var created = await first.SubmitAsync($"/Visits/New?clientId={clientId}", Records.VisitForm());
        var editUrl = created.Headers.Location!.OriginalString + "/Edit";

        // Arrange: both open the edit form before either saves.
        var firstPage = await first.GetStringAsync(new Uri(editUrl, UriKind.Relative));
        var secondPage = await second.GetStringAsync(new Uri(editUrl, UriKind.Relative));
        var firstEdit = Records.VisitForm();
        firstEdit["Input.Practitioner"] = "First editor";
        var secondEdit = Records.VisitForm();
        secondEdit["Input.Practitioner"] = "Second editor";
        secondEdit["Input.Notes"] = "Typed by the second editor";

        // Act
        var firstSave = await first.PostFormAsync(editUrl, firstPage, firstEdit);
        var secondSave = await second.PostFormAsync(editUrl, secondPage, secondEdit);

        // Assert: the first save stands, the second is told, and its typing is still in the form.
        Assert.Equal(HttpStatusCode.Redirect, firstSave.StatusCode);
        Assert.Equal(HttpStatusCode.OK, secondSave.StatusCode);
        var conflictPage = await secondSave.Content.ReadAsStringAsync();
        Assert.Contains(WebUtility.HtmlEncode(EditModel.ConflictMessage), conflictPage, StringComparison.Ordinal);
        Assert.Contains("value=\"Second editor\"", conflictPage, StringComparison.Ordinal);
        Assert.Contains("Typed by the second editor", conflictPage, StringComparison.Ordinal);
        Assert.Equal("First editor", await app.WithDbAsync(db => db.Visits.Select(v => v.Practitioner).SingleAsync()));

        // Act again: saving from the conflict page deliberately keeps the second version.
        var retry = await second.PostFormAsync(editUrl, conflictPage, secondEdit);
        Assert.Equal(HttpStatusCode.Redirect, retry.StatusCode);
        Assert.Equal("Second editor", await app.WithDbAsync(db => db.Visits.Select(v => v.Practitioner).SingleAsync()));
    }

    [Fact]
    public async Task The_new_visit_form_offers_todays_date_in_the_form_a_date_field_accepts()
    {
        // Arrange: a clock stopped on 1 June 2026 (UTC).
        using var app = new ClinicApp(clock: new FixedClock(new DateTimeOffset(2026, 6, 1, 12, 0, 0, TimeSpan.Zero)));
        var clientId = await app.ClientAsync("V-8");
        using var browser = app.Browser();

        // Act
        var html = await browser.GetStringAsync(new Uri($"/Visits/New?clientId={clientId}", UriKind.Relative));

        // Assert: a date input shows (and submits) only year-month-day; anything else renders as an empty field.
        var date = FormHtml.Input(html, "Input_VisitDate");
        Assert.Contains("type=\"date\"", date, StringComparison.Ordinal);
        Assert.Equal("2026-06-01", FormHtml.Value(date));
    }

    [Fact]
    public async Task The_edit_form_opens_with_the_saved_date_and_readings_filled_in()
    {
        // Arrange
        using var app = new ClinicApp(clock: new FixedClock(new DateTimeOffset(2026, 6, 1, 12, 0, 0, TimeSpan.Zero)));
        var clientId = await app.ClientAsync("V-9");
        using var browser = app.Browser();
        var created = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", Records.VisitForm("2026-05-20"));
        Assert.Equal(HttpStatusCode.Redirect, created.StatusCode);

        // Act
        var html = await browser.GetStringAsync(new Uri(created.Headers.Location!.OriginalString + "/Edit", UriKind.Relative));

        // Assert: every text field shows what was saved, so saving the form unchanged keeps the visit as it was.
        Assert.Equal("2026-05-20", FormHtml.Value(FormHtml.Input(html, "Input_VisitDate")));
        Assert.Equal("Test practitioner", FormHtml.Value(FormHtml.Input(html, "Input_Practitioner")));
        Assert.Equal("6/60", FormHtml.Value(FormHtml.Input(html, "Input_DistanceRight")));
        Assert.Equal("20/400", FormHtml.Value(FormHtml.Input(html, "Input_DistanceLeft")));
        Assert.Equal("0.1 decimal", FormHtml.Value(FormHtml.Input(html, "Input_DistanceBoth")));
        Assert.Equal("4M", FormHtml.Value(FormHtml.Input(html, "Input_NearThreshold")));
        Assert.Equal("40 cm", FormHtml.Value(FormHtml.Input(html, "Input_NearTestDistance")));
        Assert.Equal("25 cm", FormHtml.Value(FormHtml.Input(html, "Input_WorkingDistance")));
        Assert.Equal("1M", FormHtml.Value(FormHtml.Input(html, "Input_Goals_0__TargetPrint")));
        Assert.Equal("90", FormHtml.Value(FormHtml.Input(html, "Input_ReadingSpeeds_0__WordsPerMinute")));
    }

    [Fact]
    public async Task Saving_the_edit_form_unchanged_keeps_every_reading()
    {
        // Arrange: open the edit form and post back only what it rendered, as a browser does when nothing is typed.
        using var app = new ClinicApp(clock: new FixedClock(new DateTimeOffset(2026, 6, 1, 12, 0, 0, TimeSpan.Zero)));
        var clientId = await app.ClientAsync("V-10");
        using var browser = app.Browser();
        var created = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", Records.VisitForm("2026-05-20"));
        var editUrl = created.Headers.Location!.OriginalString + "/Edit";
        var html = await browser.GetStringAsync(new Uri(editUrl, UriKind.Relative));
        var rendered = FormHtml.TextValues(html);

        // Act
        var saved = await browser.PostFormAsync(editUrl, html, rendered);

        // Assert
        Assert.Equal(HttpStatusCode.Redirect, saved.StatusCode);
        var visit = await app.WithDbAsync(db => db.Visits.Include(v => v.Goals).SingleAsync());
        Assert.Equal(new DateOnly(2026, 5, 20), visit.VisitDate);
        Assert.Equal("6/60", visit.DistanceRightText);
        Assert.Equal("4M", visit.NearThresholdText);
        Assert.Equal("1M", Assert.Single(visit.Goals).TargetText);
    }

    [Theory]
    [InlineData("/Visits/9999")]
    [InlineData("/Visits/9999/Edit")]
    [InlineData("/Visits/New?clientId=9999")]
    public async Task Unknown_ids_are_not_found(string url)
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.GetAsync(new Uri(url, UriKind.Relative));

        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
    }
}
