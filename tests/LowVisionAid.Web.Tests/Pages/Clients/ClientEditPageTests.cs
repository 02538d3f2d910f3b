using System.Net;
using System.Text.Encodings.Web;
using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Entities;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Pages.Clients;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Web.Tests.Pages.Clients;

public class ClientEditPageTests
{
    [Fact]
    public async Task The_client_page_links_to_the_edit_form_which_opens_with_the_saved_details()
    {
        // Arrange
        using var app = new ClinicApp();
        var id = await SavedClientAsync(app);
        using var browser = app.Browser();

        // Act
        var clientPage = await browser.GetStringAsync(new Uri($"/Clients/{id}", UriKind.Relative));
        var html = await browser.GetStringAsync(new Uri($"/Clients/{id}/Edit", UriKind.Relative));

        // Assert
        Assert.Contains($"<a class=\"button\" href=\"/Clients/{id}/Edit\">Edit the client's details</a>", clientPage, StringComparison.Ordinal);
        Assert.Contains("<h1>Edit client E-0001</h1>", html, StringComparison.Ordinal);
        Assert.Equal("E-0001", FormHtml.Value(FormHtml.Input(html, "Input_Code")));
        Assert.Equal("Invented Person", FormHtml.Value(FormHtml.Input(html, "Input_Name")));
        Assert.Equal("1941", FormHtml.Value(FormHtml.Input(html, "Input_YearOfBirth")));
        Assert.Contains(">\nLikes crosswords.</textarea>", html.ReplaceLineEndings("\n"), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Saved_changes_show_on_the_client_page_and_leave_an_audit_line_without_the_details()
    {
        // Arrange
        using var app = new ClinicApp();
        var id = await SavedClientAsync(app);
        using var browser = app.Browser();

        // Act: change the code and the year, clear the name.
        var response = await browser.SubmitAsync($"/Clients/{id}/Edit", new Dictionary<string, string>
        {
            ["Input.Code"] = "E-0002",
            ["Input.Name"] = "",
            ["Input.YearOfBirth"] = "1942",
            ["Input.Notes"] = "Likes crosswords and recipes.",
        });

        // Assert
        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.Equal($"/Clients/{id}", response.Headers.Location?.OriginalString);
        var saved = await app.WithDbAsync(db => db.Clients.AsNoTracking().SingleAsync(c => c.Id == id));
        Assert.Equal("E-0002", saved.Code);
        Assert.Null(saved.Name);
        Assert.Equal(1942, saved.YearOfBirth);
        Assert.Equal("Likes crosswords and recipes.", saved.Notes);
        var page = await browser.GetStringAsync(response.Headers.Location);
        Assert.Contains("<h1>Client E-0002</h1>", page, StringComparison.Ordinal);
        Assert.Contains("<dd>1942</dd>", page, StringComparison.Ordinal);

        await using var scope = app.Services.CreateAsyncScope();
        var audit = await scope.ServiceProvider.GetRequiredService<ClinicDbContext>().AuditEntries.AsNoTracking()
            .Where(a => a.RecordType == nameof(Client) && a.RecordId == id).ToListAsync();
        var changed = Assert.Single(audit, a => a.Action == AuditAction.Changed);
        Assert.Equal(TestServer.InUse ? ClinicHost.ServerPassAccount : AuditActors.LocalUser, changed.Actor);   // sign-in is on with a server database
        var line = $"{changed.Actor} {changed.RecordType} {changed.RecordId} {changed.Detail}";
        Assert.DoesNotContain("E-000", line, StringComparison.Ordinal);
        Assert.DoesNotContain("crosswords", line, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_form_with_errors_saves_nothing_keeps_the_typing_and_links_the_summary_to_the_field()
    {
        // Arrange
        using var app = new ClinicApp();
        var id = await SavedClientAsync(app);
        using var browser = app.Browser();

        // Act
        var response = await browser.SubmitAsync($"/Clients/{id}/Edit", new Dictionary<string, string>
        {
            ["Input.Code"] = "E-0001",
            ["Input.Name"] = "Typed new name",
            ["Input.YearOfBirth"] = "19x1",
            ["Input.Notes"] = "Typed new notes",
        });

        // Assert
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var html = await response.Content.ReadAsStringAsync();
        Assert.Contains("<a href=\"#Input_YearOfBirth\">", html, StringComparison.Ordinal);
        Assert.Contains("id=\"Input_YearOfBirth-error\"", html, StringComparison.Ordinal);
        Assert.Equal("19x1", FormHtml.Value(FormHtml.Input(html, "Input_YearOfBirth")));
        Assert.Equal("Typed new name", FormHtml.Value(FormHtml.Input(html, "Input_Name")));
        Assert.Contains("Typed new notes</textarea>", html, StringComparison.Ordinal);
        var saved = await app.WithDbAsync(db => db.Clients.AsNoTracking().SingleAsync(c => c.Id == id));
        Assert.Equal("Invented Person", saved.Name);
        Assert.Equal(1941, saved.YearOfBirth);
    }

    [Fact]
    public async Task Another_clients_code_is_refused_beside_the_code_field()
    {
        // Arrange
        using var app = new ClinicApp();
        var id = await SavedClientAsync(app);
        await app.ClientAsync("E-0009");
        using var browser = app.Browser();

        // Act
        var response = await browser.SubmitAsync($"/Clients/{id}/Edit", new Dictionary<string, string> { ["Input.Code"] = "E-0009" });

        // Assert
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var html = await response.Content.ReadAsStringAsync();
        Assert.Contains(WebUtility.HtmlEncode(NewClientHandler.CodeTaken), html, StringComparison.Ordinal);
        Assert.Contains("id=\"Input_Code-error\"", html, StringComparison.Ordinal);
        Assert.Equal("E-0001", await app.WithDbAsync(db => db.Clients.Where(c => c.Id == id).Select(c => c.Code).SingleAsync()));
    }

    [Fact]
    public async Task The_second_of_two_editors_is_told_and_keeps_what_they_typed()
    {
        // Arrange: both open the edit form before either saves.
        using var app = new ClinicApp();
        var id = await SavedClientAsync(app);
        using var first = app.Browser();
        using var second = app.Browser();
        var url = $"/Clients/{id}/Edit";
        var firstPage = await first.GetStringAsync(new Uri(url, UriKind.Relative));
        var secondPage = await second.GetStringAsync(new Uri(url, UriKind.Relative));
        var secondEdit = new Dictionary<string, string> { ["Input.Code"] = "E-0001", ["Input.Notes"] = "Typed by the second editor" };

        // Act
        var firstSave = await first.PostFormAsync(url, firstPage, new Dictionary<string, string> { ["Input.Code"] = "E-0001", ["Input.Notes"] = "First editor" });
        var secondSave = await second.PostFormAsync(url, secondPage, secondEdit);

        // Assert: the first save stands, the second is told, and its typing is still in the form.
        Assert.Equal(HttpStatusCode.Redirect, firstSave.StatusCode);
        Assert.Equal(HttpStatusCode.OK, secondSave.StatusCode);
        var conflictPage = await secondSave.Content.ReadAsStringAsync();
        Assert.Contains(HtmlEncoder.Default.Encode(EditModel.ConflictMessage), conflictPage, StringComparison.Ordinal);
        Assert.Contains("Typed by the second editor</textarea>", conflictPage, StringComparison.Ordinal);
        Assert.Equal("First editor", await app.WithDbAsync(db => db.Clients.Select(c => c.Notes).SingleAsync()));

        // Act again: saving from the conflict page deliberately keeps the second version.
        var retry = await second.PostFormAsync(url, conflictPage, secondEdit);
        Assert.Equal(HttpStatusCode.Redirect, retry.StatusCode);
        Assert.Equal("Typed by the second editor", await app.WithDbAsync(db => db.Clients.Select(c => c.Notes).SingleAsync()));
    }

    [Theory]
    [InlineData("GET")]
    [InlineData("POST")]
    public async Task An_unknown_client_id_is_not_found(string method)
    {
        // Arrange: the antiforgery cookie and token come from a real form, so the POST reaches the page.
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var form = await browser.GetStringAsync(new Uri("/Clients/New", UriKind.Relative));

        // Act
        var response = method == "GET"
            ? await browser.GetAsync(new Uri("/Clients/9999/Edit", UriKind.Relative))
            : await browser.PostFormAsync("/Clients/9999/Edit", form, new Dictionary<string, string> { ["Input.Code"] = "E-0001" });

        // Assert
        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
    }

    private static Task<int> SavedClientAsync(ClinicApp app) =>
        app.WithDbAsync(async db =>
        {
            var client = new Client { Code = "E-0001", Name = "Invented Person", YearOfBirth = 1941, Notes = "Likes crosswords." };
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            return client.Id;
        });
}
