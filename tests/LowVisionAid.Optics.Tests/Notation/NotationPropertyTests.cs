using CsCheck;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

/// <summary>Round-trip and robustness properties over generated values (CsCheck).</summary>
public class NotationPropertyTests
{
    // CsCheck_Iter (10,000 in the full run, scripts/test.sh); CsCheck's default of 100 in the fast loop.
    private static long Many => Check.Iter;

    private static readonly CultureInfo[] Cultures =
    [
        CultureInfo.InvariantCulture,
        CultureInfo.GetCultureInfo("en-US"),
        CultureInfo.GetCultureInfo("de-DE"),
        CultureInfo.GetCultureInfo("fr-FR"),
    ];

    private static readonly Gen<CultureInfo> AnyCulture = Gen.OneOf(Cultures);

    // Display rounding limits (logMAR): Snellen denominators whole from 10 up or to 0.1 below (≤ log₁₀(1 + 0.05/1.9)),
    // decimal to 2 dp or 2 significant figures (≤ log₁₀(1.05)), logMAR to 0.01, VAS and letters to 1 point (0.02/2).
    private static readonly (AcuityNotation Notation, double Tolerance, double Worst)[] DisplayForms =
    [
        (AcuityNotation.LogMar, 0.005 + 1e-9, 2.95),
        (AcuityNotation.SnellenMetres, 0.025, 2.95),
        (AcuityNotation.SnellenFeet, 0.025, 2.95),
        (AcuityNotation.DecimalAcuity, 0.025, 2.95),
        (AcuityNotation.VisualAcuityScore, 0.01 + 1e-9, 1.95),
        (AcuityNotation.EtdrsLetters, 0.01 + 1e-9, 1.65),
    ];

    [Fact]
    public void Canonical_acuity_reads_back_to_exactly_the_same_value() =>
        Gen.Double[Acuity.BestLogMar, Acuity.WorstLogMar].Sample(logMar =>
        {
            // Stored forms are invariant and are read back with the invariant culture
            // (a German reader could fairly take "1.025" for 1025, so canonical text is not read with de-DE).
            var acuity = Acuity.FromLogMar(logMar);
            Assert.Equal(acuity, DistanceAcuityNotation.Parse(DistanceAcuityNotation.FormatCanonical(acuity), CultureInfo.InvariantCulture).Value);
        }, iter: Many);

    [Fact]
    public void Every_display_form_reads_back_within_its_rounding() =>
        Gen.Select(Gen.Double[-0.45, 2.95], Gen.Int[0, DisplayForms.Length - 1], AnyCulture).Sample((logMar, form, culture) =>
        {
            var (notation, tolerance, worst) = DisplayForms[form];
            var acuity = Acuity.FromLogMar(Math.Min(logMar, worst));
            var text = DistanceAcuityNotation.Format(acuity, notation, culture);
            var back = DistanceAcuityNotation.Parse(text, culture);
            Assert.True(back.Success, $"{text}: {back.Error}");
            Assert.True(Math.Abs(back.Value.LogMar - acuity.LogMar) <= tolerance, $"{notation} {text}: {acuity.LogMar} → {back.Value.LogMar}");
        }, iter: Many);

    [Fact]
    public void Notation_A_to_B_to_A_returns_to_the_same_display() =>
        Gen.Select(Gen.Double[-0.4, 1.6], Gen.Int[0, DisplayForms.Length - 1], Gen.Int[0, DisplayForms.Length - 1], AnyCulture).Sample((logMar, a, b, culture) =>
        {
            // A value shown in A, re-read, shown in B, re-read and shown in A again drifts by at most both roundings.
            var (notationA, toleranceA, _) = DisplayForms[a];
            var (notationB, toleranceB, _) = DisplayForms[b];
            var first = DistanceAcuityNotation.Parse(DistanceAcuityNotation.Format(Acuity.FromLogMar(logMar), notationA, culture), culture).Value;
            var viaB = DistanceAcuityNotation.Parse(DistanceAcuityNotation.Format(first, notationB, culture), culture).Value;
            var again = DistanceAcuityNotation.Parse(DistanceAcuityNotation.Format(viaB, notationA, culture), culture).Value;
            Assert.True(Math.Abs(again.LogMar - first.LogMar) <= toleranceA + toleranceB + 1e-9, $"{notationA}→{notationB}→{notationA}: {first.LogMar} → {again.LogMar}");
        }, iter: Many);

    [Fact]
    public void Typed_Snellen_fractions_give_numerator_over_denominator() =>
        Gen.Select(Gen.OneOf(1.0, 2.0, 3.0, 4.0, 6.0, 10.0, 20.0), Gen.Double[2.0, 1000.0], AnyCulture).Sample((numerator, denominator, culture) =>
        {
            var typed = numerator.ToString("0", culture) + "/" + denominator.ToString("0.#", culture);
            var decimalValue = numerator / double.Parse(denominator.ToString("0.#", culture), culture);
            var result = DistanceAcuityNotation.Parse(typed, culture);
            if (-Math.Log10(decimalValue) is >= Acuity.BestLogMar and <= Acuity.WorstLogMar)
            {
                Assert.True(Math.Abs(result.Value.DecimalValue - decimalValue) <= 1e-12 * decimalValue, typed);
            }
            else
            {
                Assert.Equal(ParseMessages.SnellenOutOfRange, result.Error);
            }
        }, iter: Many);

    [Fact]
    public void Canonical_distance_print_size_and_near_acuity_read_back_exactly() =>
        Gen.Select(Gen.Double[0.001, 100.0], Gen.Double[0.05, 100.0]).Sample((metres, m) =>
        {
            var culture = CultureInfo.InvariantCulture;
            var distance = Distance.FromMetres(metres);
            Assert.Equal(distance, DistanceNotation.Parse(DistanceNotation.FormatCanonical(distance), culture).Value);
            var size = PrintSize.FromM(m);
            Assert.Equal(size, PrintSizeNotation.Parse(PrintSizeNotation.FormatCanonical(size), culture).Value);
            var near = NearAcuityNotation.FromMeasurement(size, distance);
            if (near.Success)
            {
                Assert.Equal(near.Value, NearAcuityNotation.Parse(NearAcuityNotation.FormatCanonical(near.Value), culture).Value);
            }
            else
            {
                Assert.Equal(ParseMessages.NearAcuityOutOfRange, near.Error);
            }
        }, iter: Many);

    [Fact]
    public void Near_display_form_reads_back_within_its_rounding() =>
        Gen.Select(Gen.Double[-0.4, 1.9], Gen.Int[20, 100], AnyCulture).Sample((logMar, centimetres, culture) =>
        {
            // "1.6M at 25 cm": M to 0.1 (0.01 below 1M) and whole centimetres here, so M is back within half a step.
            // M = d × 10^logMAR keeps the measurement, and its rounded display, inside the accepted range.
            var m = centimetres / 100.0 * Math.Pow(10, logMar);
            var near = NearAcuityNotation.FromMeasurement(PrintSize.FromM(m), Distance.FromCentimetres(centimetres)).Value;
            var back = NearAcuityNotation.Parse(NearAcuityNotation.Format(near, culture), culture).Value;
            Assert.True(Math.Abs(back.Threshold.M - m) <= (m < 1 ? 0.005 : 0.05) + 1e-9, $"{m} → {back.Threshold.M}");
            Assert.Equal(near.TestDistance.Metres, back.TestDistance.Metres, 12);
        }, iter: Many);

    // Characters that the notations use, so generated garbage often comes close to a real entry.
    private const string NotationAlphabet = "0123456789./,-+ :;@\"emcMNJjtopinflgavrsdhVAS\u2212\u2044\u2033\u00a0\uff16";

    private static readonly Gen<string> NearMisses = Gen.Char[NotationAlphabet].Array[0, 30].Select(chars => new string(chars));

    private static readonly Gen<string> Garbage = Gen.OneOf(NearMisses, Gen.String, Gen.String[0, 200]);

    [Fact]
    public void Generated_garbage_never_throws_and_always_gives_a_value_or_a_message() =>
        Gen.Select(Garbage, AnyCulture).Sample((text, culture) =>
        {
            AssertValueOrMessage(DistanceAcuityNotation.Parse(text, culture), text);
            AssertValueOrMessage(DistanceAcuityNotation.Parse(text, culture, new DistanceAcuityOptions { BareNumbers = BareNumberReading.LogMar }), text);
            AssertValueOrMessage(NearAcuityNotation.Parse(text, culture), text);
            AssertValueOrMessage(PrintSizeNotation.Parse(text, culture), text);
            AssertValueOrMessage(DistanceNotation.Parse(text, culture), text);
            AssertValueOrMessage(NonChartVisionNotation.Parse(text, culture), text);
        }, iter: Many);

    [Fact]
    public void Lone_surrogates_and_control_characters_give_a_message()
    {
        foreach (var text in new[] { "\uD800", "6/6\uDC00", "\0", "6/\u0007", "\u202E6/60" })
        {
            var result = DistanceAcuityNotation.Parse(text, CultureInfo.InvariantCulture);
            Assert.False(result.Success, text);
            Assert.False(string.IsNullOrWhiteSpace(result.Error));
        }
    }

    private static void AssertValueOrMessage<T>(ParseResult<T> result, string text)
    {
        if (result.Success)
        {
            Assert.NotNull(result.Value);
            Assert.Null(result.Error);
        }
        else
        {
            Assert.False(string.IsNullOrWhiteSpace(result.Error), $"no message for “{text}”");
        }
    }
}
