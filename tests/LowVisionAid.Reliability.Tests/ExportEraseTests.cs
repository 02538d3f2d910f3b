using System.Net;
using System.Text;
using System.Text.Json;
using LowVisionAid.Data.Audit;
using LowVisionAid.Reliability.Tests.Support;

namespace LowVisionAid.Reliability.Tests;

/// <summary>One client's whole record out as JSON and CSV; erasure of everything about them after confirmation.</summary>
public sealed class ExportEraseTests
{
    [Fact]
    public async Task The_json_and_csv_exports_hold_every_stored_field_of_every_row_of_the_client()
    {
        using var app = new ClinicApp("export", loadDemo: false);
        using var client = app.NewClient();
        var id = await ClinicForms.AddClientAsync(client, "EX-0001", "Invented \"Quoted\", Person", "1941", "=SUM(A1) line one\nline two");
        await ClinicForms.AddVisitAsync(client, id, ("Input.DistanceBoth", "6/36"), ("Input.Goals[0].Task", "Newspaper"), ("Input.Goals[0].TargetPrint", "1M"));
        await ClinicForms.AddVisitAsync(client, id, ("Input.DistanceRight", "20/200"));
        var other = await ClinicForms.AddClientAsync(client, "EX-OTHER", "Someone Else");
        await ClinicForms.AddVisitAsync(client, other, ("Input.DistanceBoth", "6/9"));
        var stored = DatabaseDump.Read(app);

        using var json = await client.PostFormAsync($"/Clients/{id}/Export", [], handler: "Json");
        using var csv = await client.PostFormAsync($"/Clients/{id}/Export", [], handler: "Csv");
        var document = JsonDocument.Parse(await json.Content.ReadAsByteArrayAsync());
        var csvText = Encoding.UTF8.GetString(await csv.Content.ReadAsByteArrayAsync()).TrimStart('\uFEFF');

        // Every row of the client's own tables in the database, with every column, appears in the JSON.
        var exportedRows = new List<string>();
        Collect(document.RootElement.GetProperty("client"), exportedRows);
        var expected = new[] { "Clients", "Visits", "VisitGoals" }
            .SelectMany(t => stored[t].Where(r => BelongsTo(t, r, id, stored)).Select(r => t + ":" + r)).ToList();
        Assert.Equal(expected.Order(StringComparer.Ordinal), exportedRows.Order(StringComparer.Ordinal));
        Assert.DoesNotContain("Someone Else", document.RootElement.GetRawText(), StringComparison.Ordinal);
        Assert.Equal("attachment", json.Content.Headers.ContentDisposition?.DispositionType);

        // The CSV has one line per stored field, quoted where needed, and formulas disarmed.
        var fieldCount = exportedRows.Sum(r => r.Split('|').Length);
        var records = CsvRecords(csvText);
        Assert.Equal(["table", "id", "parent_table", "parent_id", "field", "value"], records[0]);
        Assert.Equal(fieldCount, records.Count - 1);
        Assert.Contains(records, r => r[4] == "Name" && r[5] == "Invented \"Quoted\", Person");
        Assert.Contains(records, r => r[4] == "Notes" && r[5] == "'=SUM(A1) line one\nline two");
    }

    [Fact]
    public async Task Erasure_after_confirmation_removes_every_row_and_every_trace_of_the_text_and_keeps_one_audit_line()
    {
        using var app = new ClinicApp("erase", loadDemo: false);
        using var client = app.NewClient();
        var id = await ClinicForms.AddClientAsync(client, "ER-0001", "Invented Erasable Zebulon", "1952", "unique-erasure-notes-qwx");
        await ClinicForms.AddVisitAsync(client, id, ("Input.DistanceBoth", "6/60"), ("Input.Practitioner", "Practitioner Xanthippe"),
            ("Input.Goals[0].Task", "Newspaper"), ("Input.Goals[0].TargetPrint", "1M"), ("Input.ReadingSpeeds[0].PrintSize", "2M"), ("Input.ReadingSpeeds[0].WordsPerMinute", "80"));
        var keep = await ClinicForms.AddClientAsync(client, "ER-KEEP", "Invented Keeper");
        await ClinicForms.AddVisitAsync(client, keep, ("Input.DistanceBoth", "6/12"));
        var before = DatabaseDump.Read(app);

        using var wrong = await client.PostFormAsync($"/Clients/{id}/Erase", [new("Confirmation", "ER-0002")]);
        var wrongBody = await wrong.Content.ReadAsStringAsync();
        Assert.Contains("Type the client", wrongBody, StringComparison.Ordinal);
        Assert.Equal(before["Clients"], DatabaseDump.Read(app)["Clients"]);

        using var erase = await client.PostFormAsync($"/Clients/{id}/Erase", [new("Confirmation", "er-0001")]);
        var after = DatabaseDump.Read(app);

        Assert.Contains("was erased", await erase.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        Assert.Equal(1, DatabaseDump.Scalar(app, "SELECT COUNT(*) FROM \"Clients\""));
        Assert.Equal(1, DatabaseDump.Scalar(app, "SELECT COUNT(*) FROM \"Visits\""));
        Assert.Equal(0, DatabaseDump.Scalar(app, "SELECT COUNT(*) FROM \"VisitGoals\""));
        Assert.Equal(0, DatabaseDump.Scalar(app, "SELECT COUNT(*) FROM \"ReadingSpeeds\""));
        Assert.Equal(before["Clients"].Where(r => !r.StartsWith("Id=" + id + "|", StringComparison.Ordinal)), after["Clients"]);
        Assert.Single(after[AuditEntry.Table], l => l.Contains("Action=Erased", StringComparison.Ordinal) && l.Contains("RecordId=" + id, StringComparison.Ordinal));

        var erasedTexts = new[] { "Invented Erasable Zebulon", "unique-erasure-notes-qwx", "Practitioner Xanthippe", "ER-0001" };
        if (app.ServerDatabase is null)
        {
            // secure_delete and the checkpoint leave no copy of the erased text in the database file or its log.
            foreach (var file in new[] { app.Data.DatabasePath, app.Data.DatabasePath + "-wal" }.Where(File.Exists))
            {
                var bytes = await File.ReadAllBytesAsync(file);
                foreach (var text in erasedTexts)
                {
                    Assert.True(bytes.AsSpan().IndexOf(Encoding.UTF8.GetBytes(text)) < 0, $"'{text}' is still in {Path.GetFileName(file)}.");
                }
            }
        }
        else
        {
            // On a server the dead rows' space is the server's (its vacuum); no live row of any table holds the text.
            foreach (var (table, rows) in after)
            {
                Assert.DoesNotContain(rows, r => erasedTexts.Any(t => r.Contains(t, StringComparison.Ordinal)));
            }
        }

        Assert.True(after["AuditEntries"].All(l => !l.Contains("Zebulon", StringComparison.Ordinal)));
    }

    private static bool BelongsTo(string table, string row, int clientId, SortedDictionary<string, List<string>> stored)
    {
        string Field(string r, string name) => r.Split('|').First(f => f.StartsWith(name + "=", StringComparison.Ordinal))[(name.Length + 1)..];
        var visitIds = stored["Visits"].Where(v => Field(v, "ClientId") == clientId.ToString(CultureInfo.InvariantCulture)).Select(v => Field(v, "Id")).ToHashSet();
        return table switch
        {
            "Clients" => Field(row, "Id") == clientId.ToString(CultureInfo.InvariantCulture),
            "Visits" => Field(row, "ClientId") == clientId.ToString(CultureInfo.InvariantCulture),
            _ => visitIds.Contains(Field(row, "VisitId")),
        };
    }

    private static void Collect(JsonElement row, List<string> rows)
    {
        var table = row.GetProperty("table").GetString()!;
        var fields = row.GetProperty("fields").EnumerateObject().Select(p => p.Name + "=" + p.Value.ValueKind switch
        {
            JsonValueKind.Null => "NULL",
            JsonValueKind.Number => p.Value.GetRawText(),
            _ => p.Value.GetString(),
        });
        rows.Add(table + ":" + string.Join('|', fields));
        foreach (var child in row.EnumerateObject().Where(p => p.Value.ValueKind == JsonValueKind.Array))
        {
            foreach (var item in child.Value.EnumerateArray())
            {
                Collect(item, rows);
            }
        }
    }

    // RFC 4180 reader, enough for the export's own output.
    private static List<string[]> CsvRecords(string text)
    {
        var records = new List<string[]>();
        var fields = new List<string>();
        var field = new StringBuilder();
        var quoted = false;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < text.Length && text[i + 1] == '"') { field.Append('"'); i++; }
                else if (c == '"') { quoted = false; }
                else { field.Append(c); }
            }
            else if (c == '"') { quoted = true; }
            else if (c == ',') { fields.Add(field.ToString()); field.Clear(); }
            else if (c == '\r' && i + 1 < text.Length && text[i + 1] == '\n') { fields.Add(field.ToString()); field.Clear(); records.Add([.. fields]); fields.Clear(); i++; }
            else { field.Append(c); }
        }

        return records;
    }
}
