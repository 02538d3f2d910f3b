namespace LowVisionAid.Reports;

/// <summary>
/// A rendered report, or the reason none was made. A failed result never carries a document: the caller shows
/// <see cref="Error"/> on screen instead of sending an empty file.
/// </summary>
public sealed class ReportResult
{
    /// <summary>The media type of the documents this library renders.</summary>
    public const string PdfContentType = "application/pdf";

    private ReportResult(ReadOnlyMemory<byte> content, string? fileName, string? error)
    {
        Content = content;
        FileName = fileName;
        Error = error;
    }

    /// <summary>True when a document was rendered.</summary>
    public bool Success => Error is null;

    /// <summary>The PDF bytes; empty on failure.</summary>
    public ReadOnlyMemory<byte> Content { get; }

    /// <summary>A suggested download name, e.g. "handout-C-0042.pdf"; null on failure.</summary>
    public string? FileName { get; }

    /// <summary>Why nothing was rendered, in words to show the user; null on success.</summary>
    public string? Error { get; }

    /// <summary>The number of pages rendered; 0 on failure.</summary>
    public int PageCount { get; private init; }

    /// <summary>
    /// What the clinician should know about the document made, in words to show on the page (e.g. that the client
    /// needs larger print than paper holds, or that a declined device was left out); empty when nothing.
    /// </summary>
    public IReadOnlyList<string> Notices { get; private init; } = [];

    internal static ReportResult Ok((byte[] Bytes, int Pages) pdf, string fileName, IReadOnlyList<string>? notices = null) =>
        new(pdf.Bytes, fileName, null) { PageCount = pdf.Pages, Notices = notices ?? [] };

    internal static ReportResult Fail(string error) => new(ReadOnlyMemory<byte>.Empty, null, error);
}
