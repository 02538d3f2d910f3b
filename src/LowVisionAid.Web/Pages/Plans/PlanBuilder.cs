using System.Globalization;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;

namespace LowVisionAid.Web.Pages.Plans;

/// <summary>Builds a plan's snapshot from its inputs with the core planner. Pure: the same inputs give the same snapshot.</summary>
public static class PlanBuilder
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public static PlanSnapshot Build(PlanInputs inputs)
    {
        ArgumentNullException.ThrowIfNull(inputs);
        var assumptions = new List<string>();
        foreach (var task in inputs.Goals.Where(g => g.ViewingDistanceMetres is null && TaskRules.For(g.Task).Kind == ReadingTask.DistanceViewing).Select(g => g.Task).Distinct())
        {
            assumptions.Add($"{Labels.Task(task)} is planned at {Length(TaskRules.For(task).Example, inputs.Imperial)}, an assumed viewing distance; measure the client's own.");
        }

        if (inputs.ReadingSpeeds.Count > 0)
        {
            assumptions.Add("Reading speeds are taken as measured at the near test distance.");
        }

        return new PlanSnapshot(Planner.MethodVersion, assumptions, [.. inputs.Goals.Select(g => Goal(inputs, g))]);
    }

    private static GoalPlan Goal(PlanInputs inputs, GoalPoint goal)
    {
        var title = Labels.Task(goal.Task) + (goal.Detail is null ? "" : $" ({goal.Detail})");
        var request = inputs.RequestFor(goal);
        var taskLabel = TaskLabel(request.Task);
        var problems = Planner.Check(request);
        if (!problems.IsEmpty)
        {
            return new GoalPlan(title, goal.TargetText, taskLabel, problems, null, null, [], false, [], null, [], [], [], []) { ReferenceEstimates = [], PossibleReasons = [] };
        }

        var result = Planner.Build(request);
        var kitNames = inputs.Kit.ToDictionary(k => k.Code, k => k.Name, StringComparer.Ordinal);
        return new GoalPlan(
            title,
            goal.TargetText,
            taskLabel,
            [],
            Dioptres(result.RequiredPower),
            result.RequiredPowerFrom is { } from ? $"From the {MethodLabel(from)} estimate." : request.Task == ReadingTask.DistanceViewing ? "From the distance acuity and the acuity wanted." : null,
            result.Estimates is { } e ? [.. e.Estimates.Select(x => Estimate(x, inputs.Imperial))] : [],
            result.Estimates?.HasDisagreement ?? false,
            result.Estimates is { } c ? [.. c.Disagreements.Select(Disagreement)] : [],
            result.ReadingCurve is { IsUsable: false } curve ? curve.Refusal : null,
            [.. result.Options.Select(o => Option(o, kitNames, inputs.Imperial))],
            [.. result.KitDevices.Select(o => Option(o, kitNames, inputs.Imperial))],
            [.. result.NotConsidered.Select(n => $"{KindLabel(n.Kind)}: {n.Reason}")],
            [.. result.Cautions.Select(x => new CautionRow(x.Id, x.Text))])
        {
            Reserve = result.Reserve?.Reserve.ToString(null, Invariant),
            ReserveWhy = result.Reserve?.FormatWhy(Invariant),
            ReferenceEstimates = result.Estimates is { } r ? [.. r.ForReference.Select(x => Estimate(x, inputs.Imperial))] : [],
            PossibleReasons = result.Estimates?.FormatPossibleReasons(Invariant) ?? [],
        };
    }

    private static EstimateRow Estimate(PowerEstimate e, bool imperial) => new(
        MethodLabel(e.Method),
        Dioptres(e.EquivalentPower),
        Length(e.EquivalentViewingDistance, imperial),
        $"{e.Magnification.ToString("0.0", Invariant)}× (re {Length(e.ReferenceDistance, imperial)})",
        e.Reserve is { } r ? r.ToString(null, Invariant) : "Built into the reading curve",
        e.LogUnits.ToString("0.00", Invariant),
        e.Assumptions);

    private static DisagreementRow Disagreement(EstimateDisagreement d) => new(
        MethodLabel(d.Lower.Method),
        MethodLabel(d.Higher.Method),
        $"{d.DifferenceLogUnits.ToString("0.00", Invariant)} log units ({d.PowerRatio.ToString("0.0#", Invariant)} times the power)",
        []);

    private static OptionRow Option(RankedOption ranked, Dictionary<string, string> kitNames, bool imperial)
    {
        var o = ranked.Option;
        var notes = new List<string>();
        if (!o.IsApplicable && o.NotApplicableBecause is { } why)
        {
            notes.Add(why);
        }

        if (!o.IsPractical && o.PracticalNote is { } practical)
        {
            notes.Add(practical);
        }

        if (MagnifierOption.FluencyText(o.Fluency) is { } fluency)
        {
            notes.Add(fluency);
        }

        if (o.Aberrations is not null)
        {
            notes.Add(AberrationNotes.Advice);
        }

        var figures = new List<FigureRow>
        {
            new("Power needed", Dioptres(o.RequiredPower)),
            new("Power given", Dioptres(o.DeliveredPower) + (o.MeetsRequiredPower ? " (enough)" : " (not enough)")),
        };
        if (o is DistanceTelescopeOption telescope)
        {
            figures.Add(new("Magnification", $"{telescope.Magnification.ToString("0.#", Invariant)}× ({telescope.MagnificationNeeded.ToString("0.#", Invariant)}× needed)"));
        }

        if (o is ScreenMagnificationOption screen)
        {
            figures.Add(new("Zoom or text size", $"{screen.ZoomPercent.ToString("0", Invariant)} % (text about {screen.FontSizePixels.ToString("0", Invariant)} px)"));
        }

        Add(figures, "Lens or add", o.LensPower is { } lens ? Dioptres(lens) : null);
        Add(figures, "Label reads", o.Labels is { } l ? $"{l.Nominal.ToString("0.#", Invariant)}× nominal, {l.Trade.ToString("0.#", Invariant)}× trade (re 25 cm)" : null);
        figures.Add(new("Working distance", Length(o.WorkingDistance, imperial)));
        Add(figures, "Eye to lens", o.EyeToLens is { } eye ? Length(eye, imperial) : null);
        Add(figures, "Field on the page", o.LinearField is { } field ? Length(field, imperial) : null);
        Add(figures, "Letters in view", o.LettersInView is { } letters ? (letters >= 1 ? letters.ToString(Invariant) : "Less than one") : null);
        figures.Add(new("Depth of focus", o.DepthOfField is { } dof ? Length(dof, imperial) : "Reaches to infinity"));
        figures.Add(new("Both eyes", o.Binocular.Feasible
            ? $"Possible (convergence demand {o.Binocular.ConvergenceDemand.ToString("0.#", Invariant)} Δ{(o.Binocular.BaseInPrismEachEye is { } bi ? $"; {bi.ToString("0.#", Invariant)} Δ base-in in each lens (add + 2 each eye), convergence left after the prism {o.Binocular.ResidualConvergence.ToString("0.#", Invariant)} Δ" : "")})"
            : "One eye only"));
        figures.Add(new("Accommodation or add needed", Dioptres(o.AccommodationOrAddNeeded)));
        figures.Add(new("Hands free", o.HandsFree ? "Yes" : "No"));
        figures.Add(new("Suits a tremor", o.SuitsTremor ? "Yes" : "No"));
        figures.Add(new("Light and contrast", o.LightAndContrast));
        figures.Add(new("Posture", o.Posture));
        if (o.Aberrations is { } ab)
        {
            figures.Add(new("Prism 1 cm off centre", $"{ab.PrismAtOneCentimetre.ToString("0.#", Invariant)} Δ (colour fringe {ab.FringeCrownGlass.ToString("0.00", Invariant)} Δ in crown glass, {ab.FringePolycarbonate.ToString("0.00", Invariant)} Δ in polycarbonate)"));
        }

        return new OptionRow(
            ranked.Position,
            KindLabel(o.Kind),
            o.KitDeviceId,
            o.KitDeviceId is { } id && kitNames.TryGetValue(id, out var name) ? name : null,
            o.Summary(Invariant),
            o.IsApplicable && o.MeetsRequiredPower && o.IsPractical,
            notes,
            figures,
            [.. ranked.Reasons.Select(r => new ReasonRow(r.Text, r.InFavour))]);
    }

    private static void Add(List<FigureRow> figures, string label, string? value)
    {
        if (value is not null)
        {
            figures.Add(new(label, value));
        }
    }

    private static string Dioptres(Power p) => p.ToString(null, Invariant);

    private static string Length(Distance d, bool imperial) =>
        imperial ? DistanceNotation.Format(d, Invariant, "in") : DistanceNotation.Format(d, Invariant, d.Abs().Centimetres < 1 ? "mm" : null);

    public static string MethodLabel(PowerMethod method) => method switch
    {
        PowerMethod.KestenbaumClassic => "Kestenbaum's rule (1M at threshold)",
        PowerMethod.KestenbaumWithReserve => "Kestenbaum's rule with reserve",
        PowerMethod.NearAcuity => "Near acuity (equivalent viewing distance)",
        PowerMethod.CriticalPrintSize => "Reading curve (critical print size)",
        _ => method.ToString(),
    };

    public static string KindLabel(OptionKind kind) => kind switch
    {
        OptionKind.MovingCloser => "Moving closer",
        OptionKind.LargePrint => "Large print",
        OptionKind.SpectacleAdd => "Reading spectacles (high add)",
        OptionKind.HandMagnifier => "Hand magnifier",
        OptionKind.StandMagnifier => "Stand magnifier",
        OptionKind.NearTelescope => "Near telescope",
        OptionKind.VideoMagnifier => "Video magnifier",
        OptionKind.DistanceTelescope => "Distance telescope",
        OptionKind.SpectacleTelescope => "Spectacle-mounted distance telescope",
        OptionKind.ScreenMagnification => "Screen zoom or text size",
        _ => kind.ToString(),
    };

    private static string TaskLabel(ReadingTask task) => task switch
    {
        ReadingTask.SpotReading => "Spot reading",
        ReadingTask.SustainedReading => "Sustained reading",
        ReadingTask.Writing => "Writing",
        ReadingTask.Screen => "Screen",
        ReadingTask.DistanceViewing => "Distance viewing",
        _ => task.ToString(),
    };
}
