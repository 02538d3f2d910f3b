using LowVisionAid.TestSupport;
using System.Net;
using System.Text;
using System.Text.RegularExpressions;
using LowVisionAid.Data;
using LowVisionAid.Data.Audit;
using LowVisionAid.Reliability.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Reliability.Tests;

/// <summary>The audit trail says who did what to which record and when, and neither it nor the logs hold clinical content.</summary>
public sealed class AuditAndPrivacyTests
{
    // Invented, distinctive values, so that finding one anywhere means it leaked.
    private const string Code = "ZQ-7781";
    private const string Name = "Quillon Vashti";
    private const string Notes = "xylophone lantern notes";
    private const string Practitioner = "Ombrelle Fenwick";
    private const string Acuity = "6/48";
    private const string NearPrint = "3.2M";
    private const string WorkingDistance = "23 cm";
    private const string Comment = "Marmalade-jar labels";

    private static readonly string[] Secrets = [Code, Name, Notes, Practitioner, Acuity, NearPrint, WorkingDistance, Comment, "1937"];

    [Fact]
    [Trait("Category", "Slow")]
    public async Task The_main_flow_leaves_no_client_name_code_or_clinical_value_in_the_logs_or_the_audit_trail()
    {
        // Arrange
        using var app = new ClinicApp("log-privacy", settings: Accounts.SignInOn);
        using var client = app.NewClient();
        await Accounts.CreateFirstAdministratorAsync(client);

        // Act: the main flow, as a clinician would do it
        var clientId = await ClinicForms.AddClientAsync(client, Code, Name, "1937", Notes);
        await client.GetPageAsync("/Clients?q=" + Uri.EscapeDataString(Name));
        await client.GetPageAsync("/Clients?q=" + Uri.EscapeDataString(Code));
        await client.GetPageAsync($"/Clients/{clientId}");
        var visitId = await ClinicForms.AddVisitAsync(client, clientId,
            ("Input.Practitioner", Practitioner), ("Input.DistanceBoth", Acuity), ("Input.NearThreshold", NearPrint),
            ("Input.NearTestDistance", "40 cm"), ("Input.WorkingDistance", WorkingDistance), ("Input.Notes", Comment));
        await client.GetPageAsync($"/Visits/{visitId}");
        using (var bad = await client.PostFormAsync("/Clients/New", [new("Input.Code", Code), new("Input.Name", Name), new("Input.YearOfBirth", "1937")]))
        {
            Assert.Contains("Another client already has this code", await bad.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        }

        using (var export = await client.PostFormAsync($"/Clients/{clientId}/Export", [], handler: "Json"))
        {
            Assert.Contains(Name, await export.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        }

        using (var erase = await client.PostFormAsync($"/Clients/{clientId}/Erase", [new("Confirmation", Code)]))
        {
            Assert.Equal(HttpStatusCode.OK, erase.StatusCode);
        }

        // Assert
        var logs = app.Logs.Lines.ToList();
        var audit = await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().AuditEntries.AsNoTracking().ToListAsync());
        var auditText = string.Join('\n', audit.Select(a => $"{a.Actor} {a.Action} {a.RecordType} {a.RecordId} {a.Detail}"));
        Assert.True(logs.Count > 100, $"Only {logs.Count} log lines were captured; the capture is not working.");
        foreach (var secret in Secrets)
        {
            var leaks = logs.Where(l => Leaks(l, secret)).ToList();
            Assert.True(leaks.Count == 0, $"'{secret}' appears in {leaks.Count} log line(s), e.g. {leaks.FirstOrDefault()}");
            Assert.DoesNotContain(secret, auditText, StringComparison.OrdinalIgnoreCase);
        }
    }

    // A number on its own (a year of birth) counts only as a number of its own: the start line's build hash and a
    // temp folder's random name are hexadecimal and hold four digits in a row by chance ('…a1937c13…').
    private static bool Leaks(string line, string secret) => secret.All(char.IsAsciiDigit)
        ? Regex.IsMatch(line, "(?<![0-9A-Za-z])" + Regex.Escape(secret) + "(?![0-9A-Za-z])", RegexOptions.None, TimeSpan.FromSeconds(1))
        : line.Contains(secret, StringComparison.OrdinalIgnoreCase);

    [Fact]
    [Trait("Category", "Slow")]
    public async Task Creating_changing_exporting_and_erasing_a_client_each_leave_a_dated_line_naming_who_and_which_record()
    {
        using var app = new ClinicApp("audit", settings: Accounts.SignInOn);
        using var client = app.NewClient();
        await Accounts.CreateFirstAdministratorAsync(client);
        var started = DateTime.UtcNow.AddSeconds(-1);

        var clientId = await ClinicForms.AddClientAsync(client, "AU-0001", "Invented Auditee");
        var visitId = await ClinicForms.AddVisitAsync(client, clientId, ("Input.DistanceBoth", "6/24"));
        var edit = await client.GetPageAsync($"/Visits/{visitId}/Edit");
        using (var saved = await client.PostWithTokenAsync($"/Visits/{visitId}/Edit", null, FormFields.Read(edit, a => a.Contains("post", StringComparison.OrdinalIgnoreCase)).With(("Input.VisitDate", "2026-11-21"), ("Input.DistanceBoth", "6/18"))))
        {
            Assert.Equal(HttpStatusCode.Redirect, saved.StatusCode);
        }

        using (await client.PostFormAsync($"/Clients/{clientId}/Export", [], handler: "Csv"))
        {
        }

        using (await client.PostFormAsync($"/Clients/{clientId}/Erase", [new("Confirmation", "AU-0001")]))
        {
        }

        var lines = await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().AuditEntries.AsNoTracking().Where(e => e.AtUtc >= started).ToListAsync());
        var page = await client.GetPageAsync("/Admin/Audit?type=Client&id=" + clientId.ToString(CultureInfo.InvariantCulture));

        Assert.Contains(lines, l => l is { Action: AuditAction.Created, RecordType: "Client" } && l.RecordId == clientId);
        Assert.Contains(lines, l => l is { Action: AuditAction.Created, RecordType: "Visit" } && l.RecordId == visitId);
        Assert.Contains(lines, l => l is { Action: AuditAction.Changed, RecordType: "Visit" } && l.RecordId == visitId);
        Assert.Contains(lines, l => l is { Action: AuditAction.Exported, RecordType: "Client", Detail: "CSV" } && l.RecordId == clientId);
        var erased = Assert.Single(lines, l => l is { Action: AuditAction.Erased, RecordType: "Client" } && l.RecordId == clientId);
        Assert.Contains("Visits 1", erased.Detail, StringComparison.Ordinal);
        Assert.All(lines.Where(l => (l.RecordType == "Client" && l.RecordId == clientId) || (l.RecordType == "Visit" && l.RecordId == visitId)), l => Assert.Equal(Accounts.AdminName, l.Actor));
        Assert.All(lines, l => Assert.InRange(l.AtUtc, started, DateTime.UtcNow.AddSeconds(1)));
        Assert.Contains("Erased", page, StringComparison.Ordinal);
        Assert.Contains("Exported", page, StringComparison.Ordinal);
        Assert.DoesNotContain("Invented Auditee", page, StringComparison.Ordinal);
    }

    [Fact]
    [Trait("Category", TestServer.SqliteFileCategory)]   // sign-in cannot be off with a server database
    public async Task With_sign_in_off_the_audit_names_the_local_user()
    {
        using var app = new ClinicApp("audit-local");
        using var client = app.NewClient();

        var clientId = await ClinicForms.AddClientAsync(client, "AU-LOCAL");

        var line = await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().AuditEntries.AsNoTracking()
            .SingleAsync(e => e.RecordType == "Client" && e.RecordId == clientId));
        Assert.Equal(AuditActors.LocalUser, line.Actor);
        Assert.Equal(AuditAction.Created, line.Action);
    }

    [Fact]
    public async Task A_save_that_fails_leaves_no_audit_line()
    {
        using var app = new ClinicApp("audit-rollback", loadDemo: false);
        using var client = app.NewClient();
        await client.GetPageAsync("/");
        var before = await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().AuditEntries.CountAsync());

        var failed = await app.ServiceAsync(async sp =>
        {
            var db = sp.GetRequiredService<LowVisionAid.Data.ClinicDbContext>();
            db.Clients.Add(new LowVisionAid.Data.Entities.Client { Code = "DUP-1" });
            db.Clients.Add(new LowVisionAid.Data.Entities.Client { Code = "DUP-1" });
            return await Record.ExceptionAsync(() => db.SaveChangesAsync());
        });

        Assert.IsType<DbUpdateException>(failed);
        Assert.Equal(before, await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().AuditEntries.CountAsync()));
        Assert.Equal(0, DatabaseDump.Scalar(app, "SELECT COUNT(*) FROM \"Clients\""));
    }
}
