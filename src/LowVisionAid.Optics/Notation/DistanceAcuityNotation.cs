using System.Text.RegularExpressions;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>
/// Reads a distance acuity as a clinician types it and writes it back in any notation. Accepted forms:
/// Snellen fractions in metres, feet or over a 4 m chart ("6/60", "20/200", "4/40", "6/7.5", "1/60"), with letters
/// missed or gained on the line ("6/60 -2", "6/60+1", "20/70-2": 0.02 logMAR a letter on a 5-letter line, methods §1.1);
/// decimal acuity with its word ("dec 0.5", "0.5 decimal"); logMAR with its word ("logMAR 0.30", "0.30 logMAR");
/// VAS ("VAS 85"); ETDRS letters ("85 letters", "ETDRS 85"); letter-by-letter scoring ("top 1.0, 12 letters").
/// A number on its own is read by <see cref="DistanceAcuityOptions.BareNumbers"/> (refused by default).
/// Counting fingers, hand movements and light perception are recognised and refused as an acuity for calculation,
/// with a message that says what to measure instead (<see cref="NonChartVisionNotation"/> records them). Case, spaces, "." or "," decimals and Unicode look-alikes are tolerated.
/// </summary>
public static partial class DistanceAcuityNotation
{
    /// <summary>Parses with the default options (bare numbers refused). Never throws.</summary>
    public static ParseResult<Acuity> Parse(string? text, IFormatProvider? provider) =>
        Parse(text, provider, DistanceAcuityOptions.Default);

    /// <summary>
    /// Parses a distance acuity. Never throws: any input gives a value or a message naming the accepted forms.
    /// A null <paramref name="provider"/> means the current culture; it only decides which of "." and "," can be
    /// a thousands separator (both are read as decimal marks).
    /// </summary>
    public static ParseResult<Acuity> Parse(string? text, IFormatProvider? provider, DistanceAcuityOptions? options)
    {
        options ??= DistanceAcuityOptions.Default;
        var normalised = NotationText.Normalise(text, out var error, ParseMessages.DistanceAcuityExpected);
        if (normalised is null)
        {
            return ParseResult.Fail<Acuity>(error!);
        }

        if (NonChartVisionNotation.TryRecognise(normalised, provider, out var vision, out _))
        {
            return ParseResult.Fail<Acuity>(ParseMessages.NotChartAcuity(vision.Level));
        }

        if (NonChartPrefix().IsMatch(normalised))
        {
            return ParseResult.Fail<Acuity>(ParseMessages.NotChartAcuity(LevelFromPrefix(normalised)));
        }

        Match match;
        if ((match = SnellenPattern().Match(normalised)).Success)
        {
            return ReadSnellen(match, provider, ParseMessages.SnellenOutOfRange);
        }

        if ((match = DecimalPattern().Match(normalised)).Success)
        {
            return Read(match, provider, v => v > 0 ? Acuity.LogMarOfDecimal(v) : double.NaN, ParseMessages.DecimalOutOfRange);
        }

        if ((match = LogMarPattern().Match(normalised)).Success)
        {
            return Read(match, provider, v => v, ParseMessages.LogMarOutOfRange);
        }

        if ((match = VasPattern().Match(normalised)).Success)
        {
            // VAS 0–125 is logMAR 2.0 to −0.5 (the inverse formula lives in Acuity).
            return Read(match, provider, v => v is >= 0 and <= 125 ? Acuity.LogMarOfVisualAcuityScore(v) : double.NaN, ParseMessages.VasOutOfRange);
        }

        if ((match = EtdrsPattern().Match(normalised)).Success)
        {
            // ETDRS letters 1–110 is logMAR 1.68 to −0.5 (the inverse formula lives in Acuity). 0 letters is a floor,
            // worse than the top line, not exactly logMAR 1.7 (methods §11).
            if (NotationText.TryNumber(match.Groups["v"].Value, provider, out var letters, out _) && letters == 0)
            {
                return ParseResult.Fail<Acuity>(ParseMessages.EtdrsZeroIsAFloor);
            }

            return Read(match, provider, v => v is >= 0 and <= 110 ? Acuity.LogMarOfEtdrsLetters(v) : double.NaN, ParseMessages.EtdrsOutOfRange);
        }

        if ((match = LetterScorePattern().Match(normalised)).Success)
        {
            if (!NotationText.TryNumber(match.Groups["top"].Value, provider, out var top, out var topError))
            {
                return ParseResult.Fail<Acuity>(topError!);
            }

            var letters = match.Groups["n"].Value.Length > 4 ? int.MaxValue : int.Parse(match.Groups["n"].Value, System.Globalization.CultureInfo.InvariantCulture);
            return FromLetterScore(top, letters, options.LettersPerLine);
        }

        if ((match = NotationText.BareNumberPattern().Match(normalised)).Success)
        {
            return ReadBareNumber(match.Value, provider, options.BareNumbers);
        }

        return ParseResult.Fail<Acuity>(normalised.Contains('/', StringComparison.Ordinal)
            ? ParseMessages.SnellenExpected
            : ParseMessages.DistanceAcuityExpected);
    }

    /// <summary>
    /// Parses with the default options; false when the text is not a distance acuity. The default options never
    /// produce a warning (bare numbers are refused), so nothing is dropped.
    /// </summary>
    public static bool TryParse(string? text, IFormatProvider? provider, out Acuity acuity) =>
        Parse(text, provider).TryGetValue(out acuity);

    /// <summary>
    /// A recorded vision level: a chart acuity (its value), or counting fingers, hand movements, light perception or
    /// no light perception (recognised, with no value: never used in a calculation). Never throws; fails with the
    /// chart acuity's message when the text is neither.
    /// </summary>
    public static ParseResult<Acuity?> ParseRecordedVision(string? text, IFormatProvider? provider)
    {
        var acuity = Parse(text, provider);
        if (acuity.Success)
        {
            return ParseResult.Ok<Acuity?>(acuity.Value, acuity.Warning);
        }

        return NonChartVisionNotation.Parse(text, provider).Success
            ? ParseResult.Ok<Acuity?>(null)
            : ParseResult.Fail<Acuity?>(acuity.Error);
    }

    /// <summary>
    /// Letter-by-letter scoring (Bailey–Lovie and ETDRS charts; methods §1.1):
    /// logMAR = top line attempted + 0.1 − (0.1 / letters a line) × letters read correctly from that line down,
    /// which is 0.02 a letter on a 5-letter line. Fails with a message when a number is out of range.
    /// </summary>
    /// <param name="topLineLogMar">logMAR of the top (largest) line attempted, −0.5 to 3.0.</param>
    /// <param name="lettersCorrect">Total letters read correctly from that line down, 1 or more.</param>
    /// <param name="lettersPerLine">Letters on each line of the chart, 1 to 10; 5 by default.</param>
    public static ParseResult<Acuity> FromLetterScore(double topLineLogMar, int lettersCorrect, int lettersPerLine = 5)
    {
        if (lettersPerLine is < 1 or > 10)
        {
            return ParseResult.Fail<Acuity>(ParseMessages.LettersPerLineOutOfRange);
        }

        if (!(topLineLogMar >= Acuity.BestLogMar && topLineLogMar <= Acuity.WorstLogMar))
        {
            return ParseResult.Fail<Acuity>(ParseMessages.TopLineOutOfRange);
        }

        if (lettersCorrect < 1 || lettersCorrect > 1000)
        {
            return ParseResult.Fail<Acuity>(ParseMessages.LettersCorrectOutOfRange);
        }

        // Per-letter scoring: logMAR = top + 0.1 − (0.1/n) × letters (Bailey–Lovie; ISO 8596:2017/Amd 1:2019).
        var logMar = topLineLogMar + 0.1 - 0.1 / lettersPerLine * lettersCorrect;
        return InRange(logMar)
            ? ParseResult.Ok(Acuity.FromLogMar(logMar))
            : ParseResult.Fail<Acuity>(ParseMessages.LetterScoreOutOfRange);
    }

    /// <summary>
    /// Writes an acuity for display in the given notation with the caller's culture. Snellen forms use the chart
    /// label (methods §1.1 table) when the value is within 0.005 logMAR of a standard line, and otherwise the exact
    /// denominator, to one decimal below 10 and whole above ("6/36", "20/70", "6/8.2").
    /// Display forms are rounded; use <see cref="FormatCanonical"/> to store a value.
    /// </summary>
    public static string Format(Acuity acuity, AcuityNotation notation, IFormatProvider? provider) => notation switch
    {
        AcuityNotation.SnellenMetres => "6/" + Denominator(acuity, 6, feet: false, provider),
        AcuityNotation.SnellenFeet => "20/" + Denominator(acuity, 20, feet: true, provider),
        AcuityNotation.DecimalAcuity => FormatDecimal(acuity.DecimalValue, provider) + " decimal",
        AcuityNotation.VisualAcuityScore => "VAS " + NotationText.Show(NoNegativeZero(Math.Round(acuity.VisualAcuityScore)), "0", provider),
        AcuityNotation.EtdrsLetters => NotationText.Show(NoNegativeZero(Math.Round(acuity.EtdrsLetters)), "0", provider) + " letters",
        _ => NotationText.Show(NoNegativeZero(Math.Round(acuity.LogMar, 2)), "0.00", provider) + " logMAR",
    };

    /// <summary>
    /// The stored form: "logMAR " and the shortest exact digits, invariant. <see cref="Parse(string?, IFormatProvider?)"/>
    /// reads it back to exactly the same value in any culture.
    /// </summary>
    public static string FormatCanonical(Acuity acuity) => "logMAR " + NotationText.Exact(acuity.LogMar);

    private static ParseResult<Acuity> ReadSnellen(Match match, IFormatProvider? provider, string outOfRange)
    {
        if (!NotationText.TryNumber(match.Groups["num"].Value, provider, out var numerator, out var error)
            || !NotationText.TryNumber(match.Groups["den"].Value, provider, out var denominator, out error))
        {
            return ParseResult.Fail<Acuity>(error!);
        }

        if (numerator == 0 || denominator == 0)
        {
            return ParseResult.Fail<Acuity>(ParseMessages.SnellenZero);
        }

        // Decimal acuity = numerator ÷ denominator (Snellen); logMAR through Acuity's one conversion.
        var logMar = Acuity.LogMarOfDecimal(numerator / denominator);
        if (match.Groups["letters"].Success)
        {
            var letters = int.Parse(match.Groups["letters"].Value, System.Globalization.CultureInfo.InvariantCulture);
            if (letters is < 1 or > MostLettersOnALine)
            {
                return ParseResult.Fail<Acuity>(ParseMessages.LettersOnLineOutOfRange);
            }

            // Letters missed (−) or gained (+) on the line: 0.1 / 5 = 0.02 logMAR a letter on a 5-letter line (methods §1.1).
            logMar += (match.Groups["sign"].Value == "-" ? 1 : -1) * LogMarPerLetter * letters;
        }

        return InRange(logMar) ? ParseResult.Ok(Acuity.FromLogMar(logMar)) : ParseResult.Fail<Acuity>(outOfRange);
    }

    /// <summary>logMAR a letter on a 5-letter line: 0.1 / 5 = 0.02 (methods §1.1).</summary>
    public const double LogMarPerLetter = 0.02;

    // A 5-letter line: more than 4 letters missed or gained is another line.
    private const int MostLettersOnALine = 4;

    private static ParseResult<Acuity> Read(Match match, IFormatProvider? provider, Func<double, double> toLogMar, string outOfRange)
    {
        if (!NotationText.TryNumber(match.Groups["v"].Value, provider, out var value, out var error))
        {
            return ParseResult.Fail<Acuity>(error!);
        }

        var logMar = toLogMar(value);
        return InRange(logMar) ? ParseResult.Ok(Acuity.FromLogMar(logMar)) : ParseResult.Fail<Acuity>(outOfRange);
    }

    private static ParseResult<Acuity> ReadBareNumber(string token, IFormatProvider? provider, BareNumberReading reading)
    {
        // "6,60" or "20,200" is a fraction typed with a comma, not a decimal: say so rather than guess.
        var comma = token.IndexOf(',', StringComparison.Ordinal);
        if (comma > 0 && int.TryParse(token.AsSpan(0, Math.Min(comma, 6)), System.Globalization.NumberStyles.AllowLeadingSign, System.Globalization.CultureInfo.InvariantCulture, out var whole) && whole >= 4)
        {
            return ParseResult.Fail<Acuity>(ParseMessages.BareNumberNotAnAcuity(token));
        }

        if (!NotationText.TryNumber(token, provider, out var value, out var error))
        {
            return ParseResult.Fail<Acuity>(error!);
        }

        var asLogMar = InRange(value) ? Acuity.FromLogMar(value) : (Acuity?)null;
        var asDecimal = value > 0 && InRange(Acuity.LogMarOfDecimal(value)) ? Acuity.FromDecimal(value) : (Acuity?)null;
        if (asLogMar is null && asDecimal is null)
        {
            return ParseResult.Fail<Acuity>(ParseMessages.BareNumberNotAnAcuity(token));
        }

        switch (reading)
        {
            case BareNumberReading.LogMar when asLogMar is { } logMar:
                return ParseResult.Ok(logMar, ParseMessages.BareNumberReadAsLogMar(token, Snellen(logMar, provider)));
            case BareNumberReading.DecimalAcuity when asDecimal is { } dec:
                return ParseResult.Ok(dec, ParseMessages.BareNumberReadAsDecimal(token, Snellen(dec, provider)));
            case BareNumberReading.LogMar:
                return ParseResult.Fail<Acuity>(ParseMessages.LogMarOutOfRange);
            case BareNumberReading.DecimalAcuity:
                return ParseResult.Fail<Acuity>(ParseMessages.DecimalOutOfRange);
            default:
                return ParseResult.Fail<Acuity>(ParseMessages.BareNumberIsAmbiguous(
                    token,
                    asDecimal is { } d ? Snellen(d, provider) : null,
                    asLogMar is { } l ? Snellen(l, provider) : null));
        }
    }

    private static string Snellen(Acuity acuity, IFormatProvider? provider) =>
        Format(acuity, AcuityNotation.SnellenMetres, provider) + ", " + Format(acuity, AcuityNotation.SnellenFeet, provider);

    private static string Denominator(Acuity acuity, double numerator, bool feet, IFormatProvider? provider)
    {
        // Snellen denominator = numerator × 10^logMAR (methods §1.1); chart labels where on a standard line.
        var denominator = ChartLines.Label(acuity.LogMar, feet) ?? acuity.SnellenDenominator(numerator);
        return NotationText.Show(denominator, denominator < 10 ? "0.#" : "0", provider);
    }

    private static string FormatDecimal(double value, IFormatProvider? provider)
    {
        // Two decimals from 0.1 up; below that, two significant figures (0.050, 0.0063).
        var decimals = Math.Max(2, 1 - (int)Math.Floor(Math.Log10(value)));
        return NotationText.Show(value, "0." + new string('0', decimals), provider);
    }

    private static double NoNegativeZero(double value) => value == 0 ? 0 : value;

    private static bool InRange(double logMar) => logMar >= Acuity.BestLogMar && logMar <= Acuity.WorstLogMar;

    private static NonChartVisionLevel LevelFromPrefix(string normalised) =>
        normalised.StartsWith('h') ? NonChartVisionLevel.HandMovements
        : normalised.StartsWith('n') ? NonChartVisionLevel.NoLightPerception
        : normalised.StartsWith('l') || normalised.StartsWith('p') ? NonChartVisionLevel.LightPerception
        : NonChartVisionLevel.CountingFingers;

    [GeneratedRegex(@"^(?<num>" + NotationText.Number + @")\s*/\s*(?<den>" + NotationText.Number + @")(?:\s*(?<sign>[-+])\s*(?<letters>[0-9]{1,3}))?$", RegexOptions.CultureInvariant)]
    private static partial Regex SnellenPattern();

    [GeneratedRegex(@"^(?:dec(?:imal)?\.?:?\s*(?<v>" + NotationText.Number + @")|(?<v>" + NotationText.Number + @")\s*dec(?:imal)?\.?)$", RegexOptions.CultureInvariant)]
    private static partial Regex DecimalPattern();

    [GeneratedRegex(@"^(?:log\s?mar:?\s*(?<v>" + NotationText.SignedNumber + @")|(?<v>" + NotationText.SignedNumber + @")\s*log\s?mar)$", RegexOptions.CultureInvariant)]
    private static partial Regex LogMarPattern();

    [GeneratedRegex(@"^(?:va[sr]:?\s*(?<v>" + NotationText.Number + @")|(?<v>" + NotationText.Number + @")\s*va[sr])$", RegexOptions.CultureInvariant)]
    private static partial Regex VasPattern();

    [GeneratedRegex(@"^(?:etdrs(?:\s*letters)?:?\s*(?<v>" + NotationText.Number + @")|(?<v>" + NotationText.Number + @")\s*(?:etdrs\s*)?letters?)$", RegexOptions.CultureInvariant)]
    private static partial Regex EtdrsPattern();

    [GeneratedRegex(@"^top(?:\s*line)?:?\s*(?:log\s?mar\s*)?(?<top>" + NotationText.SignedNumber + @")(?:\s*log\s?mar)?\s*[,;+]?\s*(?<n>[0-9]+)\s*letters?(?:\s*(?:correct|read))?$", RegexOptions.CultureInvariant)]
    private static partial Regex LetterScorePattern();


    /// <summary>A non-chart level followed by anything (e.g. a distance that could not be read).</summary>
    [GeneratedRegex(@"^(?:cf|hm|nlp|npl|lp|pl|count(?:ing)? fingers?|hand (?:motions?|movements?)|(?:no )?light perception)\b", RegexOptions.CultureInvariant)]
    private static partial Regex NonChartPrefix();
}
