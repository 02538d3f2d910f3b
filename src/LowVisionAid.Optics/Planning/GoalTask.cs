namespace LowVisionAid.Optics.Planning;

/// <summary>
/// The everyday tasks clients most often bring. <see cref="TaskRules.For(GoalTask)"/> says how each is planned: the
/// kind of reading task, the acuity reserve and the sane range of working or viewing distances. Stored by name.
/// </summary>
public enum GoalTask
{
    /// <summary>A newspaper: fluent reading.</summary>
    Newspaper,

    /// <summary>A book or magazine: fluent reading.</summary>
    Book,

    /// <summary>Medication labels: a spot task.</summary>
    MedicationLabels,

    /// <summary>A phone screen.</summary>
    Phone,

    /// <summary>Writing and forms.</summary>
    Writing,

    /// <summary>Letters and bills: fluent reading.</summary>
    Mail,

    /// <summary>Television: distance viewing.</summary>
    Television,

    /// <summary>Faces: distance viewing.</summary>
    Faces,

    /// <summary>Any other near task: planned as fluent reading.</summary>
    Other,

    /// <summary>A whiteboard or board in a classroom or meeting: distance viewing at its own distance.</summary>
    Whiteboard,

    /// <summary>Signs (street names, bus numbers, shop signs): distance viewing at their own distance.</summary>
    Signs,
}
