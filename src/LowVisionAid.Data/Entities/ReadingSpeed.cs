using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Data.Entities;

/// <summary>A reading speed measured at one print size (as on a continuous-text chart).</summary>
public sealed class ReadingSpeed
{
    public int Id { get; set; }

    public int VisitId { get; set; }

    public int Position { get; set; }

    public required string PrintSizeText { get; set; }

    public PrintSize PrintSize { get; set; }

    public int WordsPerMinute { get; set; }
}
