using LowVisionAid.Optics.Planning;
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

    /// <summary>The target as typed: a print size, or for a distance task (television, faces) the acuity wanted.</summary>
    public required string TargetText { get; set; }

    /// <summary>The print size the task needs (near tasks).</summary>
    public PrintSize? TargetPrint { get; set; }

    /// <summary>The distance acuity the task needs (distance tasks such as television), e.g. 6/12.</summary>
    public Acuity? TargetAcuity { get; set; }

    /// <summary>Television, faces, whiteboards and signs are seen at a distance; every other task is near work.</summary>
    public static bool IsDistanceTask(GoalTask task) => TaskRules.For(task).Kind == ReadingTask.DistanceViewing;
}
