using System.Globalization;
using System.Numerics;
using System.Security.Cryptography;
using System.Text;
using Microsoft.EntityFrameworkCore.Metadata;

namespace LowVisionAid.Data.Moving;

/// <summary>
/// The count and checksum of a table's rows as read through the model, computed the same way on either provider: each
/// row's values are converted to what the model stores (its value converters, the same on both providers) and written
/// as invariant text, the row's text is hashed with SHA-256, and the row hashes are added modulo 2^256. The sum does
/// not depend on the order the rows come back in, so neither side needs to sort (a text key sorts differently on
/// SQLite and on PostgreSQL); a key makes every row unique, so a changed, missing or extra row changes the sum.
/// </summary>
public sealed class TableChecksum
{
    private static readonly BigInteger Modulus = BigInteger.One << 256;
    private readonly StringBuilder _text = new();
    private BigInteger _sum;

    /// <summary>How many rows were added.</summary>
    public long Rows { get; private set; }

    /// <summary>The sum of the row hashes, 64 hexadecimal digits.</summary>
    public string Hex
    {
        get
        {
            var digits = new byte[32];
            var sum = _sum.ToByteArray(isUnsigned: true, isBigEndian: true);
            sum.CopyTo(digits, digits.Length - sum.Length);
            return Convert.ToHexStringLower(digits);
        }
    }

    /// <summary>Adds one row: <paramref name="values"/> holds one value per entry of <paramref name="properties"/>.</summary>
    public void Add(IReadOnlyList<IProperty> properties, object?[] values)
    {
        ArgumentNullException.ThrowIfNull(properties);
        ArgumentNullException.ThrowIfNull(values);
        _text.Clear();
        for (var i = 0; i < properties.Count; i++)
        {
            var value = values[i];
            if (value is not null && properties[i].GetValueConverter() is { } converter)
            {
                value = converter.ConvertToProvider(value);
            }

            // Length-prefixed, so no value can pass for the end of another; null differs from an empty text.
            var text = Text(value);
            _text.Append(properties[i].Name).Append('=');
            _ = text is null ? _text.Append('N') : _text.Append('V').Append(text.Length).Append(':').Append(text);
            _text.Append(';');
        }

        var hash = SHA256.HashData(Encoding.UTF8.GetBytes(_text.ToString()));
        _sum = (_sum + new BigInteger(hash, isUnsigned: true, isBigEndian: true)) % Modulus;
        Rows++;
    }

    /// <summary>
    /// A stored value as invariant text. Times are written to the microsecond, PostgreSQL's precision
    /// (postgresql.org/docs/current/datatype-datetime.html: "1 microsecond" resolution); the server keeps no finer
    /// fraction, and a time's kind (UTC on the server, unspecified from SQLite, both meaning UTC) is not part of it.
    /// </summary>
    private static string? Text(object? value) => value switch
    {
        null => null,
        string s => s,
        DateTime t => t.ToString("yyyy-MM-dd'T'HH:mm:ss.ffffff", CultureInfo.InvariantCulture),
        DateTimeOffset t => t.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss.ffffff'Z'", CultureInfo.InvariantCulture),
        DateOnly d => d.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture),
        TimeOnly t => t.ToString("HH:mm:ss.ffffff", CultureInfo.InvariantCulture),
        double d => d.ToString("R", CultureInfo.InvariantCulture),
        float f => f.ToString("R", CultureInfo.InvariantCulture),
        decimal m => (m / 1.0000000000000000000000000000m).ToString(CultureInfo.InvariantCulture),   // 1.50 and 1.5 alike
        bool b => b ? "true" : "false",
        Guid g => g.ToString("D"),
        byte[] bytes => Convert.ToBase64String(bytes),
        IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
        _ => value.ToString(),
    };
}
