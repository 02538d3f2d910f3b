using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// How a typed measurement is read back beside what was typed ("what was understood"), for the quick calculator and
/// the visit form alike, so a typing mistake shows at once.
/// </summary>
internal static class ReadBackText
{
    /// <summary>"1M (x-height 1.45 mm, about N8)": the size in M units, its x-height and the nearest N size.</summary>
    public static string PrintSize(PrintSize size, IFormatProvider provider) =>
        $"{PrintSizeNotation.Format(size, PrintSizeUnit.MUnits, provider)} (x-height {PrintSizeNotation.Format(size, PrintSizeUnit.XHeightMillimetres, provider)}, about {PrintSizeNotation.Format(size, PrintSizeUnit.NNotation, provider)})";
}
