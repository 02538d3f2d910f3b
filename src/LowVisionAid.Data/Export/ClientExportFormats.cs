using System.Globalization;
using System.Text.Json;
using CsvHelper;

namespace LowVisionAid.Data.Export;

/// <summary>A client's whole record written as JSON (nested, as stored) or CSV (one line per stored field).</summary>
public static class ClientExportFormats
{
    public const string FormatName = "LowVisionAid client record";
    public const int FormatVersion = 1;

    private static readonly JsonWriterOptions Indented = new() { Indented = true };

    private static readonly CsvWriterOptions CsvOptions = new()
    {
        Injection = CsvInjection.Escape,
        WriteByteOrderMark = true,
        NewLine = "\r\n",
        FormatProvider = CultureInfo.InvariantCulture,
    };

    public static byte[] ToJson(RecordRow record, DateTime exportedUtc)
    {
        ArgumentNullException.ThrowIfNull(record);
        using var stream = new MemoryStream();
        using (var writer = new Utf8JsonWriter(stream, Indented))
        {
            writer.WriteStartObject();
            writer.WriteString("format", FormatName);
            writer.WriteNumber("formatVersion", FormatVersion);
            writer.WriteString("exportedUtc", exportedUtc.ToString("O", CultureInfo.InvariantCulture));
            writer.WritePropertyName("client");
            WriteRow(writer, record);
            writer.WriteEndObject();
        }

        return stream.ToArray();
    }

    /// <summary>
    /// CSV with the header <c>table,id,parent_table,parent_id,field,value</c>: every stored field of every row of
    /// the record on its own line, so the file holds exactly what the JSON holds, in a form a spreadsheet opens.
    /// Written by CsvHelper (RFC 4180, UTF-8 with a byte order mark) with its formula guard: text that starts with
    /// <c>=</c>, <c>+</c>, <c>-</c>, <c>@</c>, a tab or a carriage return gets an apostrophe in front, so a spreadsheet
    /// shows it as text and never runs it; numbers are written as numbers (a logMAR of -0.1 stays -0.1).
    /// </summary>
    public static byte[] ToCsv(RecordRow record)
    {
        ArgumentNullException.ThrowIfNull(record);
        using var stream = new MemoryStream();
        using (var csv = CsvWriter.Create(stream, CsvOptions, leaveOpen: true))
        {
            csv.WriteRecord(["table", "id", "parent_table", "parent_id", "field", "value"]);
            WriteCsv(csv, record, parent: null);
        }

        return stream.ToArray();
    }

    /// <summary>The stored value as invariant text (what the CSV holds and what tests compare).</summary>
    public static string? AsText(object? value) => value switch
    {
        null => null,
        byte[] bytes => Convert.ToBase64String(bytes),
        IFormattable formattable => formattable.ToString(value is double ? "R" : null, CultureInfo.InvariantCulture),
        _ => value.ToString(),
    };

    private static void WriteRow(Utf8JsonWriter writer, RecordRow row)
    {
        writer.WriteStartObject();
        writer.WriteString("table", row.Table);
        writer.WritePropertyName("fields");
        writer.WriteStartObject();
        foreach (var (name, value) in row.Fields)
        {
            switch (value)
            {
                case null: writer.WriteNull(name); break;
                case long l: writer.WriteNumber(name, l); break;
                case double d: writer.WriteNumber(name, d); break;
                case byte[] b: writer.WriteBase64String(name, b); break;
                default: writer.WriteString(name, AsText(value)); break;
            }
        }

        writer.WriteEndObject();
        foreach (var group in row.Children.GroupBy(c => c.Table, StringComparer.Ordinal))
        {
            writer.WritePropertyName(group.Key);
            writer.WriteStartArray();
            foreach (var child in group)
            {
                WriteRow(writer, child);
            }

            writer.WriteEndArray();
        }

        writer.WriteEndObject();
    }

    private static void WriteCsv(CsvWriter csv, RecordRow row, RecordRow? parent)
    {
        foreach (var (name, value) in row.Fields)
        {
            csv.WriteField(row.Table);
            csv.WriteField(row.Id);
            csv.WriteField(parent?.Table);
            csv.WriteField(parent?.Id);
            csv.WriteField(name);
            switch (value)
            {
                case long l: csv.WriteField(l); break;
                case int i: csv.WriteField(i); break;
                case double d: csv.WriteField(d); break;
                case decimal m: csv.WriteField(m); break;
                default: csv.WriteField(AsText(value)); break;
            }

            csv.EndRecord();
        }

        foreach (var child in row.Children)
        {
            WriteCsv(csv, child, row);
        }
    }
}
