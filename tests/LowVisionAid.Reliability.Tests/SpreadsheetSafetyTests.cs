using System.Net;
using System.Text;
using CsvHelper;
using LowVisionAid.Data.Export;
using LowVisionAid.Data;
using LowVisionAid.Reliability.Tests.Support;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// Both CSV exports (a client's record and the kit) open in a spreadsheet without running anything typed into the
/// app, and numbers stay numbers; the kit import keeps the letters of a file saved in Windows-1252 and refuses
/// control characters.
/// </summary>
public sealed class SpreadsheetSafetyTests
{
    // The leading characters a spreadsheet reads as the start of a formula: =, +, -, @, tab and carriage return
    // (OWASP, "CSV Injection", owasp.org/www-community/attacks/CSV_Injection).
    private static readonly string[] FormulaTexts = ["=1+1", "+x", "-2+3", "@SUM(1)", "\t=1+1", "\r=1+1"];

    [Fact]
    public void The_client_record_CSV_puts_an_apostrophe_before_formula_text_and_none_before_numbers()
    {
        var fields = FormulaTexts.Select((t, i) => new KeyValuePair<string, object?>("Text" + i, t))
            .Append(new("LogMar", -0.1))
            .Append(new("Count", -3L))
            .Append(new("Plain", "Newspaper"))
            .ToList();
        var record = new RecordRow("Clients", 7, fields, []);

        var values = Read(Encoding.UTF8.GetString(ClientExportFormats.ToCsv(record)).TrimStart('\uFEFF'))
            .Skip(1).ToDictionary(r => r[4], r => r[5], StringComparer.Ordinal);

        for (var i = 0; i < FormulaTexts.Length; i++)
        {
            Assert.Equal("'" + FormulaTexts[i], values["Text" + i]);
        }

        Assert.Equal("-0.1", values["LogMar"]);
        Assert.Equal("-3", values["Count"]);
        Assert.Equal("Newspaper", values["Plain"]);
    }

    [Fact]
    public async Task The_kit_CSV_export_disarms_a_device_code_name_and_notes_that_look_like_formulas()
    {
        using var app = new ClinicApp("kit-export-formulas", loadDemo: false);
        using var client = app.NewClient();
        var csv = "id,name,kind,power_d,notes\n=1+1,@SUM(1),spectacle-add,10,+x\n-5,Loupe,spectacle-add,10,-notes\n";
        using (var import = await ImportAsync(client, Encoding.UTF8.GetBytes(csv)))
        {
            Assert.Equal(HttpStatusCode.Redirect, import.StatusCode);
        }

        using var export = await client.Http.GetAsync(new Uri("/Kit?handler=Export", UriKind.Relative));
        var rows = Read(await export.Content.ReadAsStringAsync());
        var header = rows[0].ToList();
        string Field(string[] row, string column) => row[header.IndexOf(column)];
        var first = rows.Single(r => Field(r, "name") == "'@SUM(1)");
        var second = rows.Single(r => Field(r, "name") == "Loupe");

        Assert.Equal("'=1+1", Field(first, "id"));
        Assert.Equal("'+x", Field(first, "notes"));
        Assert.Equal("10", Field(first, "power_d"));
        Assert.Equal("'-5", Field(second, "id"));
        Assert.Equal("'-notes", Field(second, "notes"));
    }

    // ü is 0xFC and é is 0xE9 in Windows-1252 (Unicode Consortium mapping table CP1252.TXT).
    [Fact]
    public async Task A_kit_file_saved_as_Windows_1252_is_imported_with_its_letters()
    {
        using var app = new ClinicApp("kit-import-1252", loadDemo: false);
        using var client = app.NewClient();
        byte[] bytes = [.. Encoding.ASCII.GetBytes("id,name,kind,power_d\nH-1,Loupe f"), 0xFC, .. Encoding.ASCII.GetBytes("nf "), 0xE9, .. Encoding.ASCII.GetBytes(",spectacle-add,10\n")];

        using var import = await ImportAsync(client, bytes);
        var page = WebUtility.HtmlDecode(await client.GetPageAsync("/Kit"));

        Assert.Equal(HttpStatusCode.Redirect, import.StatusCode);
        Assert.Contains("Loupe fünf é", page, StringComparison.Ordinal);
        Assert.Contains("read as Windows-1252", page, StringComparison.Ordinal);
        Assert.Equal(0, await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().KitDevices.CountAsync(k => EF.Functions.Like(k.Name, "%\uFFFD%"))));   // no replacement character stored
    }

    [Fact]
    public async Task A_kit_file_with_a_NUL_in_a_device_name_is_refused_with_its_row_and_column_and_nothing_is_stored()
    {
        using var app = new ClinicApp("kit-import-nul", loadDemo: false);
        using var client = app.NewClient();

        using var import = await ImportAsync(client, Encoding.UTF8.GetBytes("id,name,kind,power_d\nH-1,Loupe,spectacle-add,10\nH-2,Lo\0upe,spectacle-add,10\n"));
        var body = WebUtility.HtmlDecode(await import.Content.ReadAsStringAsync());

        Assert.Equal(HttpStatusCode.OK, import.StatusCode);
        Assert.Contains("Nothing was imported", body, StringComparison.Ordinal);
        Assert.Contains("U+0000", body, StringComparison.Ordinal);
        Assert.Matches("<th scope=\"row\">3</th><td data-label=\"Column\">[^<]*name", body);
        Assert.Equal(0, DatabaseDump.Scalar(app, "SELECT COUNT(*) FROM \"KitDevices\""));
    }

    private static async Task<HttpResponseMessage> ImportAsync(FormClient client, byte[] bytes)
    {
        var page = await client.GetPageAsync("/Kit");
        using var form = new MultipartFormDataContent();
        form.Add(new StringContent(FormClient.Token(page)!), FormClient.TokenField);
        form.Add(new ByteArrayContent(bytes), "file", "kit.csv");
        return await client.Http.PostAsync(new Uri("/Kit?handler=Import", UriKind.Relative), form);
    }

    private static List<string[]> Read(string text)
    {
        using var csv = CsvReader.Create(new StringReader(text), new CsvReaderOptions { HasHeader = false }, leaveOpen: false);
        var rows = new List<string[]>();
        while (csv.Read())
        {
            rows.Add([.. Enumerable.Range(0, csv.FieldCount).Select(i => csv.GetString(i) ?? "")]);
        }

        return rows;
    }
}
