namespace LowVisionAid.Web.Pages.Calculator;

// The view-ready plan, shown by the calculator page and returned as JSON by the API. Figures are in the units their
// names say (dioptres, centimetres, ×), unrounded; the page rounds for display.

/// <summary>A plan worked out from typed inputs, with nothing stored.</summary>
/// <param name="MethodVersion">The version of the methods behind the figures.</param>
/// <param name="Understood">Each input as the calculator read it, so typing mistakes show.</param>
/// <param name="Estimates">The required equivalent power by each method that had its inputs (empty for distance viewing).</param>
/// <param name="Disagreements">Pairs of like-for-like estimates more than 0.2 log units apart (reasons in <see cref="QuickPlanView.PossibleReasons"/>).</param>
/// <param name="PlannedForDioptres">The equivalent power the options were worked out for.</param>
/// <param name="PlanBasis">Which estimate (or acuity ratio) the options use, in words.</param>
/// <param name="Options">The options, first choice first, with every figure and the reasons for its place.</param>
/// <param name="NotConsidered">Kinds of device not considered for this task, and why.</param>
/// <param name="Cautions">The cautions that go with this plan.</param>
public sealed record QuickPlanView(
    string MethodVersion,
    IReadOnlyList<UnderstoodInput> Understood,
    IReadOnlyList<EstimateView> Estimates,
    IReadOnlyList<DisagreementView> Disagreements,
    double PlannedForDioptres,
    string PlanBasis,
    IReadOnlyList<OptionView> Options,
    IReadOnlyList<NotConsideredView> NotConsidered,
    IReadOnlyList<CautionView> Cautions)
{
    /// <summary>The acuity reserve the estimates used ("2:1"); null for distance viewing.</summary>
    public string? ReserveUsed { get; init; }

    /// <summary>Why that reserve was used, with its source; null for distance viewing.</summary>
    public string? ReserveWhy { get; init; }

    /// <summary>Estimates shown for reference only, outside the comparison (Kestenbaum at threshold, 1M at 1:1; methods §2.6).</summary>
    public IReadOnlyList<EstimateView> ReferenceEstimates { get; init; } = [];

    /// <summary>The possible reasons for the disagreements, each listed once; empty when the estimates agree.</summary>
    public IReadOnlyList<string> PossibleReasons { get; init; } = [];

    /// <summary>The blur tolerance the depths of focus were worked out with, D (from the acuity unless set).</summary>
    public double BlurToleranceDioptres { get; init; }
}

/// <param name="Field">The input's name (as in <see cref="QuickPlanInput"/>).</param>
/// <param name="Label">The input's label.</param>
/// <param name="Typed">What was typed.</param>
/// <param name="Understood">How it was read, e.g. "6/60 (logMAR 1.00)".</param>
/// <param name="Warning">A caution about the reading (approximate notations), or null.</param>
public sealed record UnderstoodInput(string Field, string Label, string Typed, string Understood, string? Warning);

/// <param name="Method">The method's identifier (KestenbaumClassic, KestenbaumWithReserve, NearAcuity, CriticalPrintSize).</param>
/// <param name="Name">The method's name in words.</param>
/// <param name="EquivalentPowerDioptres">Required equivalent power Feq, D.</param>
/// <param name="EquivalentViewingDistanceCm">EVD = 1/Feq, cm.</param>
/// <param name="Magnification">Feq × reference distance.</param>
/// <param name="ReferenceDistanceCm">The reference distance the magnification is stated against, cm.</param>
/// <param name="Reserve">The acuity reserve applied ("2:1"), or null when built in.</param>
/// <param name="ReserveRatio">The same reserve as a number (2 for 2:1), or null when built in.</param>
/// <param name="LogUnits">log₁₀(Feq), for comparing estimates.</param>
/// <param name="Assumptions">What the method assumed, in words.</param>
public sealed record EstimateView(
    string Method,
    string Name,
    double EquivalentPowerDioptres,
    double EquivalentViewingDistanceCm,
    double Magnification,
    double ReferenceDistanceCm,
    string? Reserve,
    double? ReserveRatio,
    double LogUnits,
    IReadOnlyList<string> Assumptions);

/// <param name="Lower">The method asking for less power.</param>
/// <param name="Higher">The method asking for more.</param>
/// <param name="DifferenceLogUnits">log₁₀(Feq higher / Feq lower).</param>
/// <param name="PowerRatio">Feq higher / Feq lower.</param>
public sealed record DisagreementView(string Lower, string Higher, double DifferenceLogUnits, double PowerRatio);

/// <summary>One option with every figure the engine gives. Null figures do not apply to this kind of device.</summary>
public sealed record OptionView
{
    public required int Position { get; init; }
    public required string Kind { get; init; }
    public required string Name { get; init; }
    public required string Summary { get; init; }
    public required bool IsApplicable { get; init; }
    public string? NotApplicableBecause { get; init; }
    public required bool MeetsRequiredPower { get; init; }
    public required bool IsPractical { get; init; }
    public string? PracticalNote { get; init; }
    public required double RequiredPowerDioptres { get; init; }
    public required double DeliveredPowerDioptres { get; init; }
    public double? LensPowerDioptres { get; init; }
    public double? LabelNominal { get; init; }
    public double? LabelTrade { get; init; }
    public required double WorkingDistanceCm { get; init; }
    public double? EyeToLensCm { get; init; }
    public double? LinearFieldCm { get; init; }
    public double? CharactersInView { get; init; }
    public int? LettersInView { get; init; }
    public double? Magnification { get; init; }
    public double? MagnificationNeeded { get; init; }
    public double? ZoomPercent { get; init; }
    public double? TextSizePixels { get; init; }
    public double? DepthOfFieldCm { get; init; }
    public required bool BothEyesPossible { get; init; }
    public required double ConvergenceDemandPrismDioptres { get; init; }
    public double? BaseInPrismEachEyeDioptres { get; init; }
    public double? ConvergenceLeftAfterPrismDioptres { get; init; }
    public required double AccommodationOrAddNeededDioptres { get; init; }
    public required bool HandsFree { get; init; }
    public required bool SuitsTremor { get; init; }
    public required string Posture { get; init; }
    public required string LightAndContrast { get; init; }
    public string? FluencyWarning { get; init; }
    public string? AberrationAdvice { get; init; }
    public required IReadOnlyList<ReasonView> Reasons { get; init; }
}

/// <param name="Rule">The ranking rule.</param>
/// <param name="InFavour">True when the option passed the rule.</param>
/// <param name="Text">The reason in words.</param>
public sealed record ReasonView(string Rule, bool InFavour, string Text);

/// <param name="Kind">The kind of device.</param>
/// <param name="Name">Its name in words.</param>
/// <param name="Reason">Why it was not considered.</param>
public sealed record NotConsideredView(string Kind, string Name, string Reason);

/// <param name="Id">A stable identifier.</param>
/// <param name="Text">The caution.</param>
public sealed record CautionView(string Id, string Text);
