namespace LowVisionAid.Web.Pages.Plans;

/// <summary>
/// A plan's outputs exactly as shown: every figure already formatted, so a saved plan reads the same after the
/// formulas or their formatting change. Serialised into <c>Plan.OutputsJson</c>.
/// </summary>
public sealed record PlanSnapshot(string MethodVersion, IReadOnlyList<string> Assumptions, IReadOnlyList<GoalPlan> Goals);

/// <summary>The plan for one goal. <see cref="Problems"/> is non-empty when the goal could not be planned.</summary>
public sealed record GoalPlan(
    string Title,
    string Target,
    string Task,
    IReadOnlyList<string> Problems,
    string? RequiredPower,
    string? RequiredPowerFrom,
    IReadOnlyList<EstimateRow> Estimates,
    bool MethodsDisagree,
    IReadOnlyList<DisagreementRow> Disagreements,
    string? ReadingCurveNote,
    IReadOnlyList<OptionRow> Options,
    IReadOnlyList<OptionRow> KitDevices,
    IReadOnlyList<string> NotConsidered,
    IReadOnlyList<CautionRow> Cautions)
{
    /// <summary>The acuity reserve the estimates used ("2:1"); null for distance goals and plans made before it was stored.</summary>
    public string? Reserve { get; init; }

    /// <summary>Why that reserve was used, with its source; null when <see cref="Reserve"/> is.</summary>
    public string? ReserveWhy { get; init; }

    /// <summary>Estimates shown for reference, outside the comparison (another target or reserve); null in older plans.</summary>
    public IReadOnlyList<EstimateRow>? ReferenceEstimates { get; init; }

    /// <summary>The possible reasons for a disagreement, each once; null in older plans, which keep them per pair.</summary>
    public IReadOnlyList<string>? PossibleReasons { get; init; }
}

public sealed record EstimateRow(string Method, string EquivalentPower, string ViewingDistance, string Magnification, string Reserve, string LogUnits, IReadOnlyList<string> Assumptions);

public sealed record DisagreementRow(string Lower, string Higher, string Difference, IReadOnlyList<string> PossibleReasons);

public sealed record OptionRow(
    int Position,
    string Kind,
    string? KitCode,
    string? KitName,
    string Summary,
    bool Usable,
    IReadOnlyList<string> Notes,
    IReadOnlyList<FigureRow> Figures,
    IReadOnlyList<ReasonRow> Reasons);

public sealed record FigureRow(string Label, string Value);

public sealed record ReasonRow(string Text, bool InFavour);

public sealed record CautionRow(string Id, string Text);
