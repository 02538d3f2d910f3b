using System.Globalization;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// The optics core's parsers as the record forms call them: one per kind of field, in the invariant culture (both
/// decimal marks are read). The rules and their messages live in the core (<see cref="ParseMessages"/>); nothing here
/// reads a figure itself.
/// </summary>
internal static class FormFieldParsers
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public static ParseResult<Acuity> Acuity(string text) => DistanceAcuityNotation.Parse(text, Invariant);

    public static ParseResult<Acuity?> RecordedVision(string text) => DistanceAcuityNotation.ParseRecordedVision(text, Invariant);

    public static ParseResult<PrintSize> PrintSize(string text) => PrintSizeNotation.Parse(text, Invariant);

    public static ParseResult<Distance> Distance(string text) => DistanceNotation.Parse(text, Invariant);

    public static ParseResult<NearAcuity> NearAcuity(string threshold, string testDistance) =>
        NearAcuityNotation.FromParts(threshold, testDistance, Invariant);

    public static ParseResult<Power> Power(string text) => PowerNotation.Parse(text, Invariant);

    public static ParseResult<double> LogContrastSensitivity(string text) => ContrastSensitivityNotation.Parse(text, Invariant);
}
