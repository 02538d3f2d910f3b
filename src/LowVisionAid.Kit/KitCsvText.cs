using System.Text;

namespace LowVisionAid.Kit;

/// <summary>
/// Turns the bytes of an uploaded catalogue into text without losing a letter: UTF-8 (with or without a byte order
/// mark) and UTF-16 with a byte order mark are read as such; other bytes are read as Windows-1252, the Western
/// European code page spreadsheets use when they save "CSV" on Windows (its letters include every Latin-1 letter).
/// A file that is none of these is refused with the encoding to save it in.
/// </summary>
public static class KitCsvText
{
    public const string Utf8 = "UTF-8";
    public const string Utf16 = "UTF-16";
    public const string Windows1252 = "Windows-1252 (Western European)";

    /// <summary>What to do with a file that is not text in an encoding we can tell.</summary>
    public const string SaveAsUtf8 =
        "The file is not text in UTF-8 or Windows-1252 (Western European), so its letters cannot be read without guessing. " +
        "Open it in the spreadsheet and save it again as \"CSV UTF-8 (comma delimited)\", then import that file.";

    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    // The five byte values Windows-1252 leaves undefined: a file with them is not Windows-1252 text.
    private static readonly byte[] Undefined1252 = [0x81, 0x8D, 0x8F, 0x90, 0x9D];

    /// <summary>The text of <paramref name="bytes"/> and the encoding it was read as, or null and <see cref="SaveAsUtf8"/>.</summary>
    public static (string? Text, string Encoding) Decode(ReadOnlySpan<byte> bytes)
    {
        if (bytes.StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]))
        {
            return TryUtf8(bytes[3..]);
        }

        if (bytes.StartsWith((ReadOnlySpan<byte>)[0xFF, 0xFE]) || bytes.StartsWith((ReadOnlySpan<byte>)[0xFE, 0xFF]))
        {
            var utf16 = bytes[0] == 0xFF ? Encoding.Unicode : Encoding.BigEndianUnicode;
            return (utf16.GetString(bytes[2..]), Utf16);
        }

        var utf8 = TryUtf8(bytes);
        if (utf8.Text is not null)
        {
            return utf8;
        }

        // UTF-16 without a byte order mark has NUL bytes between ASCII letters; that is not Windows-1252 text either.
        if (bytes.IndexOfAny(Undefined1252) >= 0 || bytes.IndexOf((byte)0) >= 0)
        {
            return (null, SaveAsUtf8);
        }

        return (CodePagesEncodingProvider.Instance.GetEncoding(1252)!.GetString(bytes), Windows1252);
    }

    private static (string? Text, string Encoding) TryUtf8(ReadOnlySpan<byte> bytes)
    {
        try
        {
            return (StrictUtf8.GetString(bytes), Utf8);
        }
        catch (DecoderFallbackException)
        {
            return (null, SaveAsUtf8);
        }
    }
}
