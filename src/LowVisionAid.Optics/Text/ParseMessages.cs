using LowVisionAid.Optics.Notation;

namespace LowVisionAid.Optics.Text;

/// <summary>
/// Every message the parsers return, in one place. Each names what to type instead, with an example.
/// Tests assert these members, so a wording change is made once, here.
/// </summary>
public static class ParseMessages
{
    // ---- Shared ---------------------------------------------------------------------------------------------

    /// <summary>The entry was longer than any notation needs; <paramref name="expected"/> is the family's message.</summary>
    public static string TooLong(string expected) => "That entry is too long to be a measurement. " + expected;

    /// <summary>A number too long or too large to be a measurement.</summary>
    public const string NumberTooLong =
        "A number in that entry is too long or too large to be a measurement. Type a short number such as 6/60, 40 cm or 1.0M.";

    /// <summary>A number such as "1,000" whose mark could be a thousands separator or a decimal mark.</summary>
    public static string AmbiguousThousands(string token) =>
        $"“{token}” could be read as a thousand or as a number with a decimal part. Type it without a thousands separator (1000), or with one or two decimals (1.0).";

    // ---- Distance ---------------------------------------------------------------------------------------------

    /// <summary>Empty or unreadable distance.</summary>
    public const string DistanceExpected =
        "Type a distance with its unit, such as 40 cm, 0.4 m, 400 mm or 16 in.";

    /// <summary>A distance typed without a unit.</summary>
    public static string DistanceNeedsUnit(string number) =>
        $"“{number}” needs a unit: type it as {number} cm, {number} m, {number} mm or {number} in.";

    /// <summary>A distance outside 1 mm to 100 m.</summary>
    public const string DistanceOutOfRange =
        "A distance must be between 1 mm and 100 m, such as 40 cm.";

    // ---- Distance acuity --------------------------------------------------------------------------------------

    /// <summary>Empty or unreadable distance acuity: the accepted forms.</summary>
    public const string DistanceAcuityExpected =
        "Type a distance acuity such as 6/60, 20/200, 4/40, logMAR 1.0, dec 0.1, VAS 50, 35 letters, or a letter score such as top 1.0, 12 letters.";

    /// <summary>Something with a slash that is not a Snellen fraction.</summary>
    public const string SnellenExpected =
        "Type a Snellen fraction as test distance / letter size, such as 6/60, 20/200 or 4/40; decimals are allowed, as in 6/7.5.";

    /// <summary>Letters missed or gained on a Snellen line outside 1 to 4.</summary>
    public const string LettersOnLineOutOfRange =
        "Type 1 to 4 letters missed or gained on the line, such as 6/60 -2 or 6/60 +1; with 5 or more, type the next line's fraction.";

    /// <summary>A Snellen fraction with a zero in it.</summary>
    public const string SnellenZero =
        "Neither number of a Snellen fraction can be zero. Type a fraction such as 6/60 or 20/200.";

    /// <summary>A Snellen fraction outside the range the tool works with.</summary>
    public const string SnellenOutOfRange =
        "That fraction is outside the range the tool works with (6/1.9 to 6/6000, or 20/6.3 to 20/20000). Check that the test distance comes first, as in 6/60 or 20/200.";

    /// <summary>A decimal acuity outside 0.001 to 3.16.</summary>
    public const string DecimalOutOfRange =
        "A decimal acuity must be between 0.001 and 3.16, such as dec 0.1 (6/60).";

    /// <summary>A logMAR outside −0.5 to 3.0.</summary>
    public const string LogMarOutOfRange =
        "A logMAR value must be between -0.5 and 3.0, such as logMAR 1.0 (6/60).";

    /// <summary>A VAS outside 0 to 125.</summary>
    public const string VasOutOfRange =
        "A visual acuity score must be between 0 and 125, such as VAS 50 (6/60).";

    /// <summary>An ETDRS score of 0 letters: a floor, not a measurement.</summary>
    public const string EtdrsZeroIsAFloor =
        "0 ETDRS letters means worse than the top line (worse than logMAR 1.7), not an acuity to calculate with. Test at a closer distance and type the fraction, such as 1/60, or record counting fingers or hand movements.";

    /// <summary>An ETDRS letter score outside 0 to 110.</summary>
    public const string EtdrsOutOfRange =
        "An ETDRS letter score must be between 0 and 110, such as 35 letters (6/60).";

    /// <summary>Letter scoring: letters a line outside 1 to 10.</summary>
    public const string LettersPerLineOutOfRange =
        "A chart line holds 1 to 10 letters; most logMAR charts have 5.";

    /// <summary>Letter scoring: top line outside the logMAR range.</summary>
    public const string TopLineOutOfRange =
        "The top line attempted must be a logMAR line between -0.5 and 3.0, such as top 1.0, 12 letters.";

    /// <summary>Letter scoring: letter count not positive or absurdly large.</summary>
    public const string LettersCorrectOutOfRange =
        "The letters read must be a whole number from 1 up, counted from the top line attempted, such as top 1.0, 12 letters.";

    /// <summary>Letter scoring whose result falls outside the logMAR range.</summary>
    public const string LetterScoreOutOfRange =
        "That letter score gives an acuity outside logMAR -0.5 to 3.0. Check the top line and the count, as in top 1.0, 12 letters.";

    /// <summary>A number on its own that is neither a decimal acuity nor a logMAR (such as "60" or "6,60").</summary>
    public static string BareNumberNotAnAcuity(string token) =>
        $"“{token}” on its own is not an acuity. Type a Snellen fraction with a slash, such as 6/60, or the number with its word, such as logMAR 1.0 or dec 0.1.";

    /// <summary>
    /// A number on its own that could be decimal acuity or logMAR. The readings are Snellen forms
    /// ("6/12, 20/40"), or null where that reading is out of range.
    /// </summary>
    public static string BareNumberIsAmbiguous(string token, string? asDecimal, string? asLogMar) => (asDecimal, asLogMar) switch
    {
        ({ } d, { } l) => $"“{token}” on its own could be decimal acuity ({d}) or logMAR ({l}). Type dec {token} or logMAR {token}.",
        (null, { } l) => $"“{token}” on its own is not read as an acuity. If it is logMAR ({l}), type logMAR {token}.",
        ({ } d, null) => $"“{token}” on its own is not read as an acuity. If it is decimal acuity ({d}), type dec {token}.",
        _ => BareNumberNotAnAcuity(token),
    };

    /// <summary>Warning: a bare number was read as logMAR by the clinic's setting.</summary>
    public static string BareNumberReadAsLogMar(string token, string snellen) =>
        $"“{token}” was read as logMAR {token} ({snellen}). If you meant decimal acuity, type dec {token}.";

    /// <summary>Warning: a bare number was read as decimal acuity by the clinic's setting.</summary>
    public static string BareNumberReadAsDecimal(string token, string snellen) =>
        $"“{token}” was read as decimal acuity {token} ({snellen}). If you meant logMAR, type logMAR {token}.";

    /// <summary>
    /// Counting fingers, hand movements or light perception: recognised, but never used in a calculation.
    /// Says why, and what to measure instead.
    /// </summary>
    public static string NotChartAcuity(NonChartVisionLevel level) => level switch
    {
        NonChartVisionLevel.CountingFingers =>
            "Counting fingers is recorded, but it is not a chart acuity and cannot be used to calculate magnification. Measure acuity on a chart held closer, and write the distance first: 6/60 read at 1 m is 1/60.",
        NonChartVisionLevel.HandMovements =>
            "Hand movements is recorded, but it is not a chart acuity and cannot be used to calculate magnification. Try a chart held closer (6/60 read at 1 m is 1/60, at 50 cm 0.5/60); if no letters can be read, the plan needs the practitioner's assessment.",
        NonChartVisionLevel.LightPerception =>
            "Light perception is recorded, but no letter acuity can be calculated from it, so there is no magnification to calculate. Plan with the practitioner, for example for non-visual aids.",
        _ =>
            "No light perception is recorded; there is no vision for magnification to help. Plan with the practitioner, for example for non-visual aids.",
    };

    // ---- Print size -------------------------------------------------------------------------------------------

    /// <summary>Empty or unreadable print size: the accepted forms.</summary>
    public const string PrintSizeExpected =
        "Type a print size such as 1M, 1.0 M, N8, 12 pt or 1.5 mm (x-height).";

    /// <summary>A print size typed without a unit.</summary>
    public static string PrintSizeNeedsUnit(string number) =>
        $"“{number}” needs a unit: type it as {number}M, N{number}, {number} pt or {number} mm (x-height).";

    /// <summary>A print size outside 0.05M to 100M.</summary>
    public const string PrintSizeOutOfRange =
        "A print size must be between 0.05M and 100M (x-height 0.07 mm to 145 mm), such as 1M.";

    /// <summary>Warning: a point or N size was converted to M through an x-height ratio.</summary>
    public static string ApproximateFromPoints(string typed, string m, string ratio) =>
        $"{typed} is about {m}: a point size measures the font body, not the letters, so this assumes an x-height of {ratio} of the point size. The real size depends on the typeface; measure the x-height in mm for an exact size.";

    /// <summary>A Jaeger label that is not on the table the tool uses.</summary>
    public static string JaegerNotInTable(string label, string labels) =>
        $"{label} is not on the Jaeger table the tool uses ({labels}). Jaeger sizes differ between cards: type the M size printed on the card instead, such as 1M at 40 cm.";

    /// <summary>Warning shown with every Jaeger value: approximate and card-dependent.</summary>
    public static string JaegerApproximate(string label, string m, string snellen, bool assumedDistance) =>
        $"{label} is approximate: Jaeger numbers differ from card to card, by one or two lines. It was read as about {m} ({snellen} at 40 cm on a typical card). Check the M size printed on the card and confirm before using it."
        + (assumedDistance ? " No distance was given, so 40 cm was assumed." : string.Empty);

    // ---- Near acuity ------------------------------------------------------------------------------------------

    /// <summary>Empty or unreadable near acuity: the accepted forms.</summary>
    public const string NearAcuityExpected =
        "Type the smallest print read and the distance, such as 1M at 40 cm, 1.6M @ 25cm, N8 at 25 cm, 20/50 at 40 cm or 0.40/1.0M.";

    /// <summary>
    /// A near card's Snellen label read at a distance other than the card's design distance: what it was read as,
    /// and what to type if the card was designed for another distance.
    /// </summary>
    public static string NearSnellenIsAPrintSize(string label, string m, string design, string readAt) =>
        $"On a near card, {label} names a print size for the card's design distance: read as {m} (its size on a card designed for {design}) held at {readAt}. If the card was designed for another distance (such as 14 in), type the print size in M units printed on the card, such as {m} at {readAt}.";

    /// <summary>A near print size or near Snellen value typed without its distance.</summary>
    public static string NearNeedsDistance(string typed) =>
        $"Add the distance the print was read at, such as {typed} at 40 cm.";

    /// <summary>A near measurement whose equivalent acuity falls outside logMAR −0.5 to 3.0.</summary>
    public const string NearAcuityOutOfRange =
        "That print size and distance give an acuity outside logMAR -0.5 to 3.0. Check both, as in 1M at 40 cm.";

    // ---- Power ------------------------------------------------------------------------------------------------

    /// <summary>Empty or unreadable power, or one outside −40 D to +80 D.</summary>
    public const string PowerExpected =
        "Type a power in dioptres, such as +2.50 or +4 D.";

    // ---- Contrast sensitivity ---------------------------------------------------------------------------------

    /// <summary>Empty or unreadable log contrast sensitivity, or one outside 0 to 2.4.</summary>
    public const string ContrastSensitivityExpected =
        "Type contrast sensitivity in log units between 0 and 2.4, such as 1.05 logCS.";

    // ---- Acuity reserve ---------------------------------------------------------------------------------------

    /// <summary>Empty or unreadable reserve, or one outside 1:1 to 10:1.</summary>
    public const string AcuityReserveExpected =
        "Type the reserve as a ratio from 1:1 to 10:1, such as 2:1.";
}
