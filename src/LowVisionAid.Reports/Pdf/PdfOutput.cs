using PdfSharp.Pdf;

namespace LowVisionAid.Reports.Pdf;

/// <summary>Saves a finished document.</summary>
internal static class PdfOutput
{
    /// <summary>A new document with its title (shown by viewers instead of the file name), author, date and language.</summary>
    public static PdfDocument Create(string title, string author, DateOnly date)
    {
        var document = new PdfDocument { Language = "en" };
        document.Info.Title = title;
        document.Info.Author = author;
        document.Info.CreationDate = date.ToDateTime(TimeOnly.MinValue);
        document.ViewerPreferences.DisplayDocTitle = true;
        return document;
    }

    /// <summary>The document's bytes and page count (read before saving: a saved document is sealed).</summary>
    public static (byte[] Bytes, int Pages) Save(PdfDocument document)
    {
        int pages = document.PageCount;
        using var output = new MemoryStream();
        document.Save(output, closeStream: false);
        return (output.ToArray(), pages);
    }
}
