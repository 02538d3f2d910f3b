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
    IReadOnlyList<CautionRow> Cautions);

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
