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
public sealed record HandoutPrintFit(double BodyPoints, PrintSize? Needed, double? NeededPoints, bool FitsOnPaper, string? ClinicianNote);

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

    /// <summary>The body size for <paramref name="model"/> and whether it meets the client's need on paper.</summary>
    /// <param name="model">The handout.</param>
    /// <param name="formatProvider">Culture for the note's numbers; invariant when null.</param>
    public static HandoutPrintFit Fit(ClientHandout model, IFormatProvider? formatProvider = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        var culture = formatProvider ?? CultureInfo.InvariantCulture;
        if (Needed(model.Reader) is not { } needed)
            return new HandoutPrintFit(model.BodyPoints, null, null, true, null);
        double points = needed.ToPoints(HyperlegibleFont.XHeightRatio);
        if (points <= LargestOnPaper)
            return new HandoutPrintFit(Math.Max(model.BodyPoints, Math.Ceiling(points)), needed, points, true, null);
        var note = string.Create(culture,
            $"This client needs print of about {needed.M:0.#}M ({points:0} pt) at {model.Reader!.ReadingDistance.Centimetres:0} cm to read fluently, more than a paper handout can hold (it is printed at {LargestOnPaper:0} pt, the largest that fits a line of words on the page). ")
            + OtherFormats;
        return new HandoutPrintFit(LargestOnPaper, needed, points, false, note);
    }

    /// <summary>What to offer a client who cannot read the paper handout.</summary>
    public const string OtherFormats =
        "Offer it in another form: read aloud from the PDF by a screen reader (it is tagged), as an audio recording, enlarged on the client's video magnifier or tablet, or read through with a relative or carer.";
}
