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

    public List<Trial> Trials { get; } = [];
}
