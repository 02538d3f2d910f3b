using CsCheck;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>Generators of hostile text: random strings, near-misses of real notations, huge and non-finite numbers,
/// negative distances, unusual Unicode and overlong fields.</summary>
public static class BadInput
{
    private const string Ascii = "0123456789 ./,-+eE:;xX×MmNnJjDdcminftlogMARCSPTt\"'\t\r\n%$#@!?*()[]{}<>=&|\\^~`_";

    private static readonly string[] Odd =
    [
        "\u0660\u0663", "\uFF16/\uFF16\uFF10", "\u00A0", "\u200B", "\u202E", "\u0301", "\uD83D\uDC53", "\uFEFF", "\u2212", "\u2044", "\u00BD",
        "İ", "ß", "\u0000", "\uFFFD", "６", "𝟔", "⁶", "₆", "Ⅵ",
    ];

    private static readonly string[] Numbers =
    [
        "NaN", "nan", "Infinity", "-Infinity", "∞", "1e308", "1e309", "-1e309", "4.9e-324", "0", "-0", "0.0000001", "99999999999999999999999",
        "-25", "-0.4", "1,5", "1.5.5", "١٫٥", "0x10", "1_000", "+-1", "--2", ".5", "5.", "1e", "e5",
    ];

    private static readonly string[] Units = ["", " ", "M", "N", "J", "cm", "m", "mm", "in", "ft", "\"", "D", "logMAR", "logCS", "pt", "/", " / ", "x", "CF", "HM", "LP", "NLP"];

    public static readonly Gen<string> Number = Gen.OneOf(
        Gen.OneOf(Numbers),
        Gen.Double.Select(d => d.ToString("R", CultureInfo.InvariantCulture)),
        Gen.Int.Select(i => i.ToString(CultureInfo.InvariantCulture)),
        Gen.Double[-1000, 1000].Select(d => d.ToString("0.###", CultureInfo.InvariantCulture)));

    /// <summary>Text shaped like a reading (number, unit, fraction) with noise around it.</summary>
    public static readonly Gen<string> NearMiss = Gen.OneOf(
        Gen.Select(Number, Gen.OneOf(Units), (n, u) => n + u),
        Gen.Select(Gen.OneOf(Units), Number, (u, n) => u + n),
        Gen.Select(Number, Gen.OneOf("/", " / ", "⁄", "\\", "//"), Number, (a, s, b) => a + s + b),
        Gen.Select(Number, Gen.OneOf(Units), Gen.OneOf(Odd), (n, u, o) => o + n + u),
        Gen.Select(Number, Gen.OneOf(Units), Gen.OneOf(Odd), (n, u, o) => n + o + u));

    public static readonly Gen<string> Random = Gen.OneOf(
        Gen.String[Gen.Char[Ascii], 0, 30],
        Gen.String[Gen.Char, 0, 30],
        Gen.Select(Gen.OneOf(Odd).Array[1, 6], parts => string.Concat(parts)));

    public static readonly Gen<string> Overlong = Gen.OneOf(
        Gen.Int[1_000, 20_000].Select(n => new string('9', n)),
        Gen.Int[1_000, 20_000].Select(n => string.Concat(Enumerable.Repeat("6/", n / 2))),
        Gen.Int[500, 5_000].Select(n => string.Concat(Enumerable.Repeat("\uD83D\uDC53", n))));

    /// <summary>The mix used for every parser and every form field: mostly near-misses and random text, some overlong.</summary>
    public static readonly Gen<string> Any = Gen.Frequency((5, NearMiss), (4, Random), (1, Overlong));
}
