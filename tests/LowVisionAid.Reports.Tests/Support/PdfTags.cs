using UglyToad.PdfPig.Tokens;
using PigDocument = UglyToad.PdfPig.PdfDocument;

namespace LowVisionAid.Reports.Tests.Support;

/// <summary>
/// What a screen reader gets from a PDF, read back with PdfPig from the file itself (ISO 14289-1, PDF/UA; ISO 32000
/// §14.7–14.8): the catalogue's MarkInfo, Lang, the viewer's DisplayDocTitle, the title, and the structure tree's
/// elements in reading order with their alternative text.
/// </summary>
internal sealed record PdfTags(bool Marked, string? Language, string? Title, bool DisplaysTitle, IReadOnlyList<PdfTags.Element> Elements)
{
    public sealed record Element(string Type, string? Alt, int Depth);

    public IEnumerable<string> Types => Elements.Select(e => e.Type);

    public static PdfTags Read(ReadOnlyMemory<byte> pdf)
    {
        using var document = PigDocument.Open(pdf.ToArray());
        IToken? Resolve(IToken? token) => token is IndirectReferenceToken r ? document.Structure.GetObject(r.Data).Data : token;
        DictionaryToken? Dict(DictionaryToken from, string key) => from.TryGet(NameToken.Create(key), out var t) ? Resolve(t) as DictionaryToken : null;

        var catalog = document.Structure.Catalog.CatalogDictionary;
        bool marked = Dict(catalog, "MarkInfo") is { } info && info.TryGet(NameToken.Create("Marked"), out var m) && Resolve(m) is BooleanToken { Data: true };
        string? language = catalog.TryGet(NameToken.Create("Lang"), out var lang) && Resolve(lang) is StringToken s ? s.Data : null;
        bool displays = Dict(catalog, "ViewerPreferences") is { } prefs && prefs.TryGet(NameToken.Create("DisplayDocTitle"), out var d) && Resolve(d) is BooleanToken { Data: true };

        var elements = new List<Element>();
        void Walk(IToken? token, int depth)
        {
            switch (Resolve(token))
            {
                case ArrayToken array:
                    foreach (var item in array.Data)
                        Walk(item, depth);
                    break;
                case DictionaryToken dict when dict.TryGet(NameToken.Create("S"), out var type) && Resolve(type) is NameToken name:
                    string? alt = dict.TryGet(NameToken.Create("Alt"), out var a) && Resolve(a) is StringToken text ? text.Data : null;
                    elements.Add(new Element(name.Data, alt, depth));
                    if (dict.TryGet(NameToken.Create("K"), out var kids))
                        Walk(kids, depth + 1);
                    break;
                default:
                    break;
            }
        }

        if (Dict(catalog, "StructTreeRoot") is { } root && root.TryGet(NameToken.Create("K"), out var top))
            Walk(top, 0);
        return new PdfTags(marked, language, document.Information.Title, displays, elements);
    }
}
