using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Data.Entities;

/// <summary>A task the client wants to do, with the print size it needs.</summary>
public sealed class VisitGoal
{
    public int Id { get; set; }

    public int VisitId { get; set; }

    /// <summary>Order on the form, from 0.</summary>
    public int Position { get; set; }

    public GoalTask Task { get; set; }

    /// <summary>What exactly, in the client's words (e.g. "bus timetable"), optional.</summary>
    public string? Detail { get; set; }

    public required string TargetPrintText { get; set; }

    public PrintSize TargetPrint { get; set; }
}

/// <summary>The everyday tasks clients most often bring.</summary>
public enum GoalTask
{
    Newspaper,
    Book,
    MedicationLabels,
    Phone,
    Writing,
    Mail,
    Television,
    Faces,
    Other,
}
