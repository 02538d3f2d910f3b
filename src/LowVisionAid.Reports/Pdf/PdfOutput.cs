using PdfSharp.Pdf;

namespace LowVisionAid.Reports.Pdf;

/// <summary>Saves a finished document.</summary>
internal static class PdfOutput
{
    /// <summary>The document's bytes and page count (read before saving: a saved document is sealed).</summary>
    public static (byte[] Bytes, int Pages) Save(PdfDocument document)
    {
        int pages = document.PageCount;
        using var output = new MemoryStream();
        document.Save(output, closeStream: false);
        return (output.ToArray(), pages);
    }
}
