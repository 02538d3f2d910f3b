using LowVisionAid.Optics.Quantities;
using PdfSharp.Fonts;

namespace LowVisionAid.Reports.Fonts;

/// <summary>
/// The Atkinson Hyperlegible faces (Braille Institute, SIL Open Font License 1.1) that every report is set in,
/// embedded in this assembly and served to PDFsharp through a font resolver.
/// </summary>
public static class HyperlegibleFont
{
    /// <summary>The family name to ask PDFsharp for.</summary>
    public const string FamilyName = "Atkinson Hyperlegible";

    private static readonly Lock Gate = new();
    private static readonly EmbeddedFontResolver Resolver = new();
    private static readonly Lazy<XHeightRatio> Ratio = new(ReadRatio, LazyThreadSafetyMode.ExecutionAndPublication);

    /// <summary>
    /// The regular face's x-height ÷ point size, read from its OS/2 sxHeight and unitsPerEm (0.496 for the shipped
    /// file). Converting a print size in M units to points goes through this ratio.
    /// </summary>
    public static XHeightRatio XHeightRatio => Ratio.Value;

    /// <summary>
    /// Installs the font resolver in PDFsharp once per process. Safe to call from many threads at once.
    /// </summary>
    /// <exception cref="InvalidOperationException">Another font resolver was installed first.</exception>
    public static void EnsureRegistered()
    {
        lock (Gate)
        {
            var current = GlobalFontSettings.FontResolver;
            if (ReferenceEquals(current, Resolver))
                return;
            if (current is not null)
                throw new InvalidOperationException(
                    "PDFsharp already has a different font resolver; the reports need HyperlegibleFont's resolver. " +
                    "Remove the other assignment to GlobalFontSettings.FontResolver.");
            GlobalFontSettings.FontResolver = Resolver;
        }
    }

    /// <summary>A copy of the bytes of one face (TrueType), e.g. for a web page that serves the same font.</summary>
    /// <param name="bold">Bold face.</param>
    /// <param name="italic">Italic face.</param>
    public static byte[] GetFontBytes(bool bold, bool italic) =>
        [.. EmbeddedFontResolver.LoadFace(EmbeddedFontResolver.FaceName(bold, italic))];

    /// <summary>
    /// The file names of the four faces as a web page asks for them (e.g. <c>AtkinsonHyperlegible-Bold.ttf</c>),
    /// each with its bold and italic flags for <see cref="GetFontBytes"/>.
    /// </summary>
    public static IReadOnlyDictionary<string, (bool Bold, bool Italic)> FaceFiles { get; } =
        new[] { (false, false), (true, false), (false, true), (true, true) }
            .ToDictionary(f => EmbeddedFontResolver.FaceName(f.Item1, f.Item2) + ".ttf", f => f, StringComparer.Ordinal);

    /// <summary>The SIL Open Font License 1.1 text the faces are released under (Fonts/OFL.txt, embedded).</summary>
    public static string LicenceText => Licence.Value;

    private static readonly Lazy<string> Licence = new(() =>
    {
        using var stream = typeof(HyperlegibleFont).Assembly.GetManifestResourceStream("LowVisionAid.Reports.Fonts.OFL.txt")
            ?? throw new InvalidOperationException("The font licence (Fonts/OFL.txt) is not embedded in LowVisionAid.Reports.");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }, LazyThreadSafetyMode.ExecutionAndPublication);

    private static XHeightRatio ReadRatio()
    {
        var fraction = FontFile.XHeightFraction(GetFontBytes(bold: false, italic: false))
            ?? throw new InvalidOperationException("The embedded regular face does not state its x-height (OS/2 sxHeight).");
        return XHeightRatio.FromRatio(fraction);
    }
}
