using System.Text;
using CsvHelper;
using LowVisionAid.Kit;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Kit.Tests;

/// <summary>
/// The catalogue file is safe to open in a spreadsheet (no formula runs), keeps every letter of the encoding it was
/// saved in, and refuses characters that cannot be stored, naming row and column.
/// </summary>
public class KitCsvSafetyTests
{
    private const string Header = "id,name,kind,power_d,notes";

    // The leading characters a spreadsheet reads as the start of a formula: =, +, -, @, tab and carriage return
    // (OWASP, "CSV Injection", owasp.org/www-community/attacks/CSV_Injection).
    public static TheoryData<string> FormulaLeads() => new() { "=1+1", "+x", "-2+3", "@SUM(1)", "\t=1+1", "\r=1+1" };

    [Theory]
    [MemberData(nameof(FormulaLeads))]
    public void Text_that_a_spreadsheet_would_run_as_a_formula_is_exported_behind_an_apostrophe(string text)
    {
        var device = new KitDevice { Id = text, Name = text, Kind = DeviceKind.HandMagnifier, Power = Power.FromDioptres(12), Notes = text };

        var fields = ExportRow(device);

        Assert.Equal("'" + text, fields["id"]);
        Assert.Equal("'" + text, fields["name"]);
        Assert.Equal("'" + text, fields["notes"]);
    }

    [Fact]
    public void Numbers_are_written_as_plain_numbers_without_an_apostrophe()
    {
        var device = new KitDevice { Id = "H-12", Name = "Hand lens", Kind = DeviceKind.HandMagnifier, Power = Power.FromDioptres(12.5), Aperture = Distance.FromMillimetres(50) };

        var fields = ExportRow(device);

        Assert.Equal("12.5", fields["power_d"]);
        Assert.Equal("50", fields["aperture_mm"]);
    }

    [Theory]
    [InlineData("=1+1")]
    [InlineData("+x")]
    [InlineData("-2+3")]
    [InlineData("@SUM(1)")]
    public void A_guarded_export_reads_back_as_the_text_that_was_stored(string text)
    {
        var device = new KitDevice { Id = "SA-1", Name = text, Kind = DeviceKind.SpectacleAdd, Power = Power.FromDioptres(10), Notes = text };
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        KitCsv.Export([device], writer);

        var read = KitCsv.Import(new StringReader(writer.ToString()));

        Assert.True(read.Success, string.Join("; ", read.Errors));
        Assert.Equal(text, read.Devices[0].Name);
        Assert.Equal(text, read.Devices[0].Notes);
    }

    // ü is 0xFC and é is 0xE9 in both ISO 8859-1 and Windows-1252; € is 0x80 in Windows-1252 only
    // (Unicode Consortium mapping table CP1252.TXT).
    [Fact]
    public void A_file_saved_as_Windows_1252_keeps_its_letters()
    {
        var bytes = Encoding.ASCII.GetBytes(Header + "\nH-1,Loupe f").Concat(new byte[] { 0xFC }).Concat(Encoding.ASCII.GetBytes("nf ")).Concat(new byte[] { 0xE9, 0x20, 0x80 })
            .Concat(Encoding.ASCII.GetBytes(",spectacle-add,10,\n")).ToArray();

        var read = KitCsv.Import(bytes);

        Assert.True(read.Success, string.Join("; ", read.Errors));
        Assert.Equal("Loupe fünf é €", read.Devices[0].Name);
        Assert.Equal(KitCsvText.Windows1252, read.Encoding);
    }

    [Fact]
    public void A_file_saved_as_UTF_8_with_or_without_a_byte_order_mark_or_as_UTF_16_keeps_its_letters()
    {
        const string text = Header + "\nH-1,Loupe fünf é €,spectacle-add,10,\n";

        var plain = KitCsv.Import(Encoding.UTF8.GetBytes(text));
        var marked = KitCsv.Import([.. Encoding.UTF8.GetPreamble(), .. Encoding.UTF8.GetBytes(text)]);
        var utf16 = KitCsv.Import([.. Encoding.Unicode.GetPreamble(), .. Encoding.Unicode.GetBytes(text)]);

        Assert.All(new[] { plain, marked, utf16 }, r => Assert.Equal("Loupe fünf é €", Assert.Single(r.Devices).Name));
        Assert.Equal(KitCsvText.Utf8, plain.Encoding);
        Assert.Equal(KitCsvText.Utf16, utf16.Encoding);
    }

    [Fact]
    public void A_file_in_no_encoding_we_can_tell_is_refused_naming_the_encoding_to_save_it_in()
    {
        // 0x81 is undefined in Windows-1252 (CP1252.TXT) and not valid UTF-8 on its own.
        var bytes = Encoding.ASCII.GetBytes(Header + "\nH-1,Loupe ").Concat(new byte[] { 0x81, 0xFC }).Concat(Encoding.ASCII.GetBytes(",spectacle-add,10,\n")).ToArray();

        var read = KitCsv.Import(bytes);

        Assert.False(read.Success);
        Assert.Contains("CSV UTF-8", Assert.Single(read.Errors).Message, StringComparison.Ordinal);
        Assert.Empty(read.Devices);
    }

    [Theory]
    [InlineData("H-1,Lo\0upe,spectacle-add,10,", 2, "name", "U+0000")]
    [InlineData("H\u001B1,Loupe,spectacle-add,10,", 2, "id", "U+001B")]
    [InlineData("H-1,Loupe,spectacle-add,10,a\u0007bell", 2, "notes", "U+0007")]
    [InlineData("H-1,\"Lou\npe\",spectacle-add,10,", 2, "name", "U+000A")]
    public void A_control_character_is_refused_with_its_row_and_column(string row, int fileRow, string column, string code)
    {
        var read = KitCsv.Import(Encoding.UTF8.GetBytes(Header + "\n" + row + "\n"));

        var error = Assert.Single(read.Errors);
        Assert.Equal(fileRow, error.Row);
        Assert.Equal(column, error.Column);
        Assert.Contains(code, error.Message, StringComparison.Ordinal);
        Assert.Empty(read.Devices);
    }

    [Fact]
    public void Notes_may_keep_line_breaks_and_tabs()
    {
        var read = KitCsv.Import(Encoding.UTF8.GetBytes(Header + "\nH-1,Loupe,spectacle-add,10,\"Shelf 2\r\nleft\tside\"\n"));

        Assert.True(read.Success, string.Join("; ", read.Errors));
        Assert.Equal("Shelf 2\r\nleft\tside", read.Devices[0].Notes);
    }

    private static Dictionary<string, string> ExportRow(KitDevice device)
    {
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        KitCsv.Export([device], writer);
        using var csv = CsvReader.Create(new StringReader(writer.ToString()), new CsvReaderOptions { HasHeader = true }, leaveOpen: false);
        csv.ReadHeader();
        var header = csv.Headers;
        Assert.True(csv.Read());
        return header.Select((name, i) => (name, i)).ToDictionary(c => c.name, c => csv.GetString(c.i) ?? "", StringComparer.Ordinal);
    }
}
