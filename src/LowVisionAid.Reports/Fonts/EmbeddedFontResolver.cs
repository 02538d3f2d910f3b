using System.Collections.Concurrent;
using PdfSharp.Fonts;

namespace LowVisionAid.Reports.Fonts;

/// <summary>Serves the embedded Atkinson Hyperlegible faces to PDFsharp; every family name resolves to them.</summary>
internal sealed class EmbeddedFontResolver : IFontResolver
{
    private const string ResourcePrefix = "LowVisionAid.Reports.Fonts.";
    private static readonly ConcurrentDictionary<string, byte[]> Cache = new(StringComparer.Ordinal);

    // Any family resolves to the hyperlegible face, so no report can fall back to an unembedded font.
    public FontResolverInfo ResolveTypeface(string familyName, bool bold, bool italic) => new(FaceName(bold, italic));

    public byte[] GetFont(string faceName) => LoadFace(faceName);

    internal static string FaceName(bool bold, bool italic) => (bold, italic) switch
    {
        (true, true) => "AtkinsonHyperlegible-BoldItalic",
        (true, false) => "AtkinsonHyperlegible-Bold",
        (false, true) => "AtkinsonHyperlegible-Italic",
        _ => "AtkinsonHyperlegible-Regular",
    };

    internal static byte[] LoadFace(string faceName) => Cache.GetOrAdd(faceName, static name =>
    {
        using var stream = typeof(EmbeddedFontResolver).Assembly.GetManifestResourceStream(ResourcePrefix + name + ".ttf")
            ?? throw new InvalidOperationException($"The font face '{name}' is not embedded in LowVisionAid.Reports.");
        using var copy = new MemoryStream();
        stream.CopyTo(copy);
        return copy.ToArray();
    });
}
