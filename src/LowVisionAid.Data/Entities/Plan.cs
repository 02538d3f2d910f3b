namespace LowVisionAid.Data.Entities;

/// <summary>
/// A magnifier plan as it was made: its inputs, the version of the methods that made it and its outputs, all
/// serialised, so it shows exactly the same after the formulas change.
/// </summary>
public sealed class Plan
{
    public int Id { get; set; }

    public int VisitId { get; set; }

    public Visit? Visit { get; set; }

    public DateTime CreatedUtc { get; set; }

    public required string MethodVersion { get; set; }

    public required string InputsJson { get; set; }

    public required string OutputsJson { get; set; }

    /// <summary>
    /// The options the clinician chose for the handout (at most one per goal), apart from the outputs, which never
    /// change. Empty until something is chosen.
    /// </summary>
    public PlanChoices Choices { get; set; } = PlanChoices.None;

    /// <summary>When the choices last changed (the handout's "given on" date), or null before any choice.</summary>
    public DateTime? ChosenUtc { get; set; }

    public List<Trial> Trials { get; } = [];
}
