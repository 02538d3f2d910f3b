using System.Globalization;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Fonts;

namespace LowVisionAid.Reports.Handouts;

/// <summary>How large the handout's body text is, and whether paper can be made large enough for this client.</summary>
/// <param name="BodyPoints">The body size the handout is printed at.</param>
/// <param name="Needed">The print the client needs at the handout's reading distance, or null when not measured.</param>
/// <param name="NeededPoints">That print in points of the embedded face, or null.</param>
/// <param name="FitsOnPaper">False when the client needs more than <see cref="HandoutPrint.LargestOnPaper"/>.</param>
/// <param name="ClinicianNote">What the clinician should know and offer instead, or null when the print is large enough.</param>
/// <param name="ShortText">True from <see cref="HandoutPrint.ShortTextFrom"/>: the handout holds only the essentials.</param>
public sealed record HandoutPrintFit(double BodyPoints, PrintSize? Needed, double? NeededPoints, bool FitsOnPaper, string? ClinicianNote, bool ShortText = false);

/// <summary>
/// The handout's body size: at least the print the client reads comfortably at the handout's reading distance, and
/// never below the clinic's minimum. Past <see cref="LargestOnPaper"/> a sheet of A4 or Letter holds too few words a
/// line to be read as text, so the handout stays at that size and the clinician is told to offer other forms.
/// </summary>
public static class HandoutPrint
{
    /// <summary>The largest body size laid out on A4 or Letter (about 15 letters a line at 48 pt): 48 pt.</summary>
    public const double LargestOnPaper = ClientHandout.MaximumBodyPoints;

    /// <summary>
    /// The print the client needs at the handout's reading distance: the critical print size, else the threshold
    /// times the fluent reserve (2:1 when none is given), scaled from the test distance to the reading distance.
    /// </summary>
    /// <param name="reader">The client's measured print, or null.</param>
    public static PrintSize? Needed(HandoutReader? reader)
    {
        if (reader is null || !(reader.TestDistance.Metres > 0) || !(reader.ReadingDistance.Metres > 0))
            return null;
        PrintSize? comfortable = reader.CriticalPrint is { IsValid: true } critical
            ? critical // the CPS already holds the reserve (methods.md §2.5)
            : reader.Threshold is { IsValid: true } threshold
                ? threshold.Scale((reader.FluentReserve ?? AcuityReserve.Fluent).Ratio) // threshold × reserve (methods.md §2.3)
                : null;
        // The same angle at another distance: M = d × MAR-angle, so M scales with distance (methods.md §1.2, derived).
        return comfortable?.Scale(reader.ReadingDistance.Metres / reader.TestDistance.Metres);
    }

    /// <summary>
    /// From this body size the handout holds only the essentials (device, distances, glasses, one or two safety
    /// lines, contact): at 36 pt an A4 line holds about 24 letters and a page about 11 lines, so the full text runs to
    /// well over a dozen pages, more than a client can handle as a sheet to keep (measured on the demo plans,
    /// docs/reports.md). The clinician is told to offer the whole text in large print or audio.
    /// </summary>
    public const double ShortTextFrom = 36;

    /// <summary>The body size for <paramref name="model"/> and whether it meets the client's need on paper.</summary>
    /// <param name="model">The handout.</param>
    /// <param name="formatProvider">Culture for the note's numbers; invariant when null.</param>
    public static HandoutPrintFit Fit(ClientHandout model, IFormatProvider? formatProvider = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        return Fit(model.Reader, model.BodyPoints, formatProvider);
    }

    /// <summary>
    /// The body size for a client who reads <paramref name="reader"/> at a clinic whose smallest handout size is
    /// <paramref name="minimumPoints"/>, with what the clinician should offer besides (for the summary and the plan
    /// page as well as the handout).
    /// </summary>
    /// <param name="reader">The client's measured print, or null.</param>
    /// <param name="minimumPoints">The clinic's smallest body size in points.</param>
    /// <param name="formatProvider">Culture for the note's numbers; invariant when null.</param>
    public static HandoutPrintFit Fit(HandoutReader? reader, double minimumPoints, IFormatProvider? formatProvider = null)
    {
        var culture = formatProvider ?? CultureInfo.InvariantCulture;
        if (Needed(reader) is not { } needed)
            return Sized(minimumPoints, null, null, true, null);
        double points = needed.ToPoints(HyperlegibleFont.XHeightRatio);
        var needs = string.Create(culture, $"This client needs print of about {needed.M:0.#}M ({points:0} pt) at {reader!.ReadingDistance.Centimetres:0} cm to read fluently");
        if (points > LargestOnPaper)
        {
            return Sized(LargestOnPaper, needed, points, false, needs + string.Create(culture,
                $", more than a paper handout can hold: it is printed at {LargestOnPaper:0} pt, the largest that fits a line of words on the page, in a short version (device, distances, glasses, two safety lines, contact). ")
                + OtherFormats);
        }

        double body = Math.Max(minimumPoints, Math.Ceiling(points));
        return body >= ShortTextFrom
            ? Sized(body, needed, points, true, needs + string.Create(culture,
                $": the handout is printed at {body:0} pt in a short version (device, distances, glasses, two safety lines, contact). ") + OtherFormats)
            : Sized(body, needed, points, true, null);
    }

    private static HandoutPrintFit Sized(double body, PrintSize? needed, double? points, bool fits, string? note) =>
        new(body, needed, points, fits, note, body >= ShortTextFrom);

    /// <summary>What to offer a client who cannot read the paper handout.</summary>
    public const string OtherFormats =
        "Offer the whole text as large-print or audio alternatives: read aloud from the PDF by a screen reader (it is tagged), as an audio recording, enlarged on the client's video magnifier or tablet, or read through with a relative or carer.";
}
