using System.Globalization;
using System.Text;
using System.Text.Json;

namespace LowVisionAid.Data.Export;

/// <summary>A client's whole record written as JSON (nested, as stored) or CSV (one line per stored field).</summary>
public static class ClientExportFormats
{
    public const string FormatName = "LowVisionAid client record";
    public const int FormatVersion = 1;

    private static readonly JsonWriterOptions Indented = new() { Indented = true };

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
    /// </summary>
    public static byte[] ToCsv(RecordRow record)
    {
        ArgumentNullException.ThrowIfNull(record);
        var text = new StringBuilder();
        text.Append("table,id,parent_table,parent_id,field,value\r\n");
        WriteCsv(text, record, parent: null);
        return new UTF8Encoding(encoderShouldEmitUTF8Identifier: true).GetPreamble().Concat(Encoding.UTF8.GetBytes(text.ToString())).ToArray();
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

    private static void WriteCsv(StringBuilder text, RecordRow row, RecordRow? parent)
    {
        foreach (var (name, value) in row.Fields)
        {
            text.Append(Cell(row.Table)).Append(',')
                .Append(row.Id.ToString(CultureInfo.InvariantCulture)).Append(',')
                .Append(Cell(parent?.Table)).Append(',')
                .Append(parent?.Id.ToString(CultureInfo.InvariantCulture)).Append(',')
                .Append(Cell(name)).Append(',')
                .Append(Cell(AsText(value))).Append("\r\n");
        }

        foreach (var child in row.Children)
        {
            WriteCsv(text, child, row);
        }
    }

    // RFC 4180 quoting; a leading =, +, - or @ is prefixed with an apostrophe so a spreadsheet never runs it as a formula.
    private static string Cell(string? value)
    {
        if (string.IsNullOrEmpty(value))
        {
            return "";
        }

        if (value[0] is '=' or '+' or '-' or '@' or '\t' or '\r')
        {
            value = "'" + value;
        }

        return value.AsSpan().IndexOfAny(",\"\r\n") >= 0 ? "\"" + value.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : value;
    }
}
