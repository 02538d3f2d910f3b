namespace LowVisionAid.Reports;

/// <summary>The sheet a report is laid out for.</summary>
public enum PaperSize
{
    /// <summary>ISO A4, 210 × 297 mm.</summary>
    A4 = 0,

    /// <summary>US Letter, 8.5 × 11 in.</summary>
    Letter = 1,
}
