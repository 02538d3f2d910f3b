using System.Globalization;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using DeviceKind = LowVisionAid.Optics.Kit.DeviceKind;

namespace LowVisionAid.Web.Plans;

/// <summary>A labelled figure of an option, as shown.</summary>
public sealed record PlanFigure(string Label, string Value);

/// <summary>
/// The one formatter of plans: turns the typed plan into words at render time and owns every label a plan uses
/// (classes of option, kit device kinds, methods, tasks, reserves) for the pages, the API, the handout and the
/// summary. Numbers are formatted in the invariant culture.
/// </summary>
public static class PlanText
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public static string Kind(OptionKind kind) => kind switch
    {
        OptionKind.MovingCloser => "Moving closer",
        OptionKind.LargePrint => "Large print",
        OptionKind.SpectacleAdd => "Reading spectacles (high add)",
        OptionKind.HandMagnifier => "Hand magnifier",
        OptionKind.StandMagnifier => "Stand magnifier",
        OptionKind.NearTelescope => "Near telescope (telemicroscope)",
        OptionKind.VideoMagnifier => "Video magnifier",
        OptionKind.DistanceTelescope => "Hand-held distance telescope",
        OptionKind.SpectacleTelescope => "Spectacle-mounted distance telescope",
        OptionKind.ScreenMagnification => "Screen zoom or text size (built in)",
        _ => Spaced(kind.ToString()),
    };

    public static string Device(DeviceKind kind) => kind switch
    {
        DeviceKind.SpectacleAdd => Kind(OptionKind.SpectacleAdd),
        DeviceKind.HandMagnifier => Kind(OptionKind.HandMagnifier),
        DeviceKind.StandMagnifier => Kind(OptionKind.StandMagnifier),
        DeviceKind.NearTelescope => Kind(OptionKind.NearTelescope),
        DeviceKind.DistanceTelescope => Kind(OptionKind.DistanceTelescope),
        DeviceKind.VideoMagnifier => Kind(OptionKind.VideoMagnifier),
        _ => Spaced(kind.ToString()),
    };

    public static string Method(PowerMethod method) => method switch
    {
        PowerMethod.KestenbaumClassic => "Kestenbaum's rule as published (1M at threshold, no reserve)",
        PowerMethod.KestenbaumWithReserve => "Kestenbaum's rule, for the target print and reserve",
        PowerMethod.NearAcuity => "Near-acuity method (equivalent viewing distance)",
        PowerMethod.CriticalPrintSize => "Reading-curve method (critical print size)",
        _ => Spaced(method.ToString()),
    };

    public static string Task(GoalTask task) => task switch
    {
        GoalTask.Newspaper => "Newspaper",
        GoalTask.Book => "Book or magazine",
        GoalTask.MedicationLabels => "Medication labels",
        GoalTask.Phone => "Phone screen",
        GoalTask.Writing => "Writing and forms",
        GoalTask.Mail => "Letters and bills",
        GoalTask.Television => "Television",
        GoalTask.Faces => "Faces",
        GoalTask.Other => "Other task",
        GoalTask.Whiteboard => "Whiteboard or board",
        GoalTask.Signs => "Signs",
        _ => Spaced(task.ToString()),
    };

    public static string PlannedAs(ReadingTask task) => task switch
    {
        ReadingTask.SpotReading => "Spot reading",
        ReadingTask.SustainedReading => "Sustained reading",
        ReadingTask.Writing => "Writing",
        ReadingTask.Screen => "Screen",
        ReadingTask.DistanceViewing => "Distance viewing",
        _ => Spaced(task.ToString()),
    };

    /// <summary>A reserve with its usual name when it is one of the three usual ones, e.g. "2:1 (fluent)".</summary>
    public static string Reserve(AcuityReserve reserve)
    {
        var ratio = reserve.ToString(null, Invariant);
        var name = reserve.Ratio switch
        {
            1.0 => "spot",
            2.0 => "fluent",
            3.0 => "sustained",
            _ => null,
        };
        return name is null ? ratio : $"{ratio} ({name})";
    }

    /// <summary>"Reserve used: 2:1.", the lead of the reserve line (its reason is <see cref="ReserveDecision.Why"/>).</summary>
    public static string ReserveUsed(ReserveDecision decision)
    {
        ArgumentNullException.ThrowIfNull(decision);
        return $"Reserve used: {decision.Reserve.ToString(null, Invariant)}.";
    }

    /// <summary>Why the reserve was used, with its source, in the core's words.</summary>
    public static string ReserveWhy(ReserveDecision decision)
    {
        ArgumentNullException.ThrowIfNull(decision);
        return decision.FormatWhy(Invariant);
    }

    public static string Power(Power p) => p.ToString(null, Invariant);

    /// <summary>A length in cm (mm below 1 cm), or in inches when the clinic shows inches.</summary>
    public static string Length(Distance d, bool imperial) =>
        imperial ? DistanceNotation.Format(d, Invariant, "in") : DistanceNotation.Format(d, Invariant, d.Abs().Centimetres < 1 ? "mm" : null);

    /// <summary>A distance task's viewing distance in metres or feet ("8 m", "26.2 ft"), as it is measured in a room.</summary>
    public static string ViewingLength(Distance d, bool imperial) => imperial
        ? (d.Inches / 12).ToString("0.#", Invariant) + " ft"
        : d.Metres < 1 ? Length(d, imperial) : d.Metres.ToString("0.##", Invariant) + " m";

    /// <summary>The goal's task and detail, and the viewing distance recorded for a distance goal ("Whiteboard at 8 m").</summary>
    public static string GoalTitle(PlannedGoal goal, bool imperial)
    {
        ArgumentNullException.ThrowIfNull(goal);
        return Task(goal.Task) + (goal.Detail is null ? "" : $" ({goal.Detail})")
            + (goal.ViewingDistance is { } seen ? $" at {ViewingLength(seen, imperial)}" : "");
    }

    public static string RequiredPowerFrom(PlannedGoal goal)
    {
        ArgumentNullException.ThrowIfNull(goal);
        return goal.RequiredPowerFrom is { } from
            ? $"From the {Method(from)} estimate."
            : goal.PlannedAs == ReadingTask.DistanceViewing ? "From the distance acuity and the acuity wanted." : "";
    }

    /// <summary>The plan-wide assumptions, in words.</summary>
    public static IReadOnlyList<string> Assumptions(TypedPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var list = new List<string>();
        foreach (var goal in plan.Goals.Where(g => g.AssumedViewingDistance is not null).DistinctBy(g => g.Task))
        {
            list.Add($"{Task(goal.Task)} is planned at {ViewingLength(goal.AssumedViewingDistance!.Value, plan.Imperial)}, an assumed viewing distance; measure the client's own.");
        }

        if (plan.HasReadingSpeeds)
        {
            list.Add("Reading speeds are taken as measured at the near test distance.");
        }

        return list;
    }

    /// <summary>What the client or clinician calls an option: the kit device's name, or its class.</summary>
    public static string Name(MagnifierOption option, TypedPlan plan)
    {
        ArgumentNullException.ThrowIfNull(option);
        ArgumentNullException.ThrowIfNull(plan);
        return option.KitDeviceId is { } id && plan.KitNames.TryGetValue(id, out var name) ? name : Kind(option.Kind);
    }

    /// <summary>The option's strength in the form its class is prescribed in: × for telescopes, dioptres otherwise.</summary>
    public static string Strength(MagnifierOption option) => option switch
    {
        DistanceTelescopeOption t => $"{t.Magnification.ToString("0.#", Invariant)}× telescope",
        ScreenMagnificationOption z => $"{z.ZoomPercent.ToString("0", Invariant)} % zoom",
        NearTelescopeOption n => $"{n.Magnification.ToString("0.#", Invariant)}× with {Power(n.ReadingCap)} cap",
        LargePrintOption p => PrintSizeNotation.FormatCanonical(p.PrintNeeded) + " print",
        null => throw new ArgumentNullException(nameof(option)),
        _ => option.LensPower is { } lens ? Power(lens) : Power(option.DeliveredPower),
    };

    public static string DepthOfFocus(MagnifierOption option, bool imperial)
    {
        ArgumentNullException.ThrowIfNull(option);
        return option.DepthOfField is { } dof ? Length(dof, imperial) : "Reaches to infinity";
    }

    public static string BothEyes(MagnifierOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return option.Binocular.Feasible ? "Yes" : "One eye only";
    }

    public static string YesNo(bool value) => value ? "Yes" : "No";

    /// <summary>
    /// "Yes", or "No" with the rule it fails in a few words, for a comparison table; the option's notes give the full
    /// reason.
    /// </summary>
    public static string PracticalInBrief(MagnifierOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return OptionUse.IsUsable(option) ? "Yes"
            : !option.IsApplicable ? "No: cannot be used as planned"
            : !option.MeetsRequiredPower ? "No: too little power"
            : option.BeyondRange ? "No: beyond what this class of device gives"
            : "No: impractical form";
    }

    public static string Reason(RankingReason reason) => (reason.InFavour ? "For: " : "Against: ") + reason.Text;

    /// <summary>
    /// The first reason for the option's place: the first rule it failed (what holds it back), or its first rule in
    /// favour when it failed none.
    /// </summary>
    public static string FirstReason(RankedOption ranked)
    {
        ArgumentNullException.ThrowIfNull(ranked);
        var reasons = ranked.Reasons.IsDefault ? [] : ranked.Reasons;
        var against = reasons.Where(r => !r.InFavour).Select(r => (RankingReason?)r).FirstOrDefault();
        return against is { } a ? Reason(a) : reasons.Length > 0 ? Reason(reasons[^1]) : "—";
    }

    /// <summary>The option's notes: why it does not apply or is impractical, its fluency warning, lens advice.</summary>
    public static IReadOnlyList<string> Notes(MagnifierOption o)
    {
        ArgumentNullException.ThrowIfNull(o);
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

        return notes;
    }

    /// <summary>Every figure of an option, labelled, in the order the plan shows them.</summary>
    public static IReadOnlyList<PlanFigure> Figures(MagnifierOption o, bool imperial)
    {
        ArgumentNullException.ThrowIfNull(o);
        var figures = new List<PlanFigure>
        {
            new("Power needed", Power(o.RequiredPower)),
            new("Power given", Power(o.DeliveredPower) + (o.MeetsRequiredPower ? " (enough)" : " (not enough)")),
        };
        if (o is DistanceTelescopeOption telescope)
        {
            figures.Add(new("Magnification", $"{telescope.Magnification.ToString("0.#", Invariant)}× ({telescope.MagnificationNeeded.ToString("0.#", Invariant)}× needed)"));
        }

        if (o is ScreenMagnificationOption screen)
        {
            figures.Add(new("Zoom or text size", $"{screen.ZoomPercent.ToString("0", Invariant)} % (text about {screen.FontSizePixels.ToString("0", Invariant)} px)"));
        }

        Add(figures, "Lens or add", o.LensPower is { } lens ? Power(lens) : null);
        Add(figures, "Label reads", o.Labels is { } l ? $"{l.Nominal.ToString("0.#", Invariant)}× nominal, {l.Trade.ToString("0.#", Invariant)}× trade (re 25 cm)" : null);
        figures.Add(new("Working distance", Length(o.WorkingDistance, imperial)));
        Add(figures, "Eye to lens", o.EyeToLens is { } eye ? Length(eye, imperial) : null);
        Add(figures, OptionNotes.FieldLabel(o.Kind), o.LinearField is { } field ? Length(field, imperial) : null);
        Add(figures, "Letters in view", LettersInView(o));
        figures.Add(new("Depth of focus", DepthOfFocus(o, imperial)));
        figures.Add(new("Both eyes", o.Binocular.Feasible
            ? $"Possible (convergence demand {o.Binocular.ConvergenceDemand.ToString("0.#", Invariant)} Δ{(o.Binocular.BaseInPrismEachEye is { } bi ? $"; {bi.ToString("0.#", Invariant)} Δ base-in in each lens (add + 2 each eye), convergence left after the prism {o.Binocular.ResidualConvergence.ToString("0.#", Invariant)} Δ" : "")})"
            : "One eye only"));
        figures.Add(new(OptionNotes.FocusingLabel(o.Kind), Power(o.AccommodationOrAddNeeded)));
        figures.Add(new("Hands free", YesNo(o.HandsFree)));
        figures.Add(new("Suits a tremor", YesNo(o.SuitsTremor)));
        figures.Add(new("Light and contrast", o.LightAndContrast));
        if (o.Aberrations is { } ab)
        {
            figures.Add(new("Prism 1 cm off centre", $"{ab.PrismAtOneCentimetre.ToString("0.#", Invariant)} Δ (colour fringe {ab.FringeCrownGlass.ToString("0.00", Invariant)} Δ in crown glass, {ab.FringePolycarbonate.ToString("0.00", Invariant)} Δ in polycarbonate)"));
        }

        return figures;
    }

    /// <summary>
    /// The comparison table's letters in view: the count, "Not limited" when no lens limits the page, or "Not counted
    /// (distance)" for an option planned for distance viewing, which has no page.
    /// </summary>
    public static string LettersInBrief(MagnifierOption option) =>
        LettersInView(option) ?? (OptionNotes.ForDistanceViewing(option) ? "Not counted (distance)" : "Not limited");

    /// <summary>Whole letters of the target print in view (the core's rounding), or null when no lens limits them.</summary>
    public static string? LettersInView(MagnifierOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return option.LettersInView is { } letters ? (letters >= 1 ? letters.ToString(Invariant) : "Less than one") : null;
    }

    public static string EstimateMagnification(PlannedEstimate e, bool imperial)
    {
        ArgumentNullException.ThrowIfNull(e);
        return $"{e.Magnification.ToString("0.0", Invariant)}× (re {Length(e.ReferenceDistance, imperial)})";
    }

    public static string EstimateReserve(PlannedEstimate e)
    {
        ArgumentNullException.ThrowIfNull(e);
        return e.Reserve is { } r ? Reserve(r) : "Built into the reading curve";
    }

    /// <summary>
    /// An estimate shown for reference only, outside the comparison, and why (methods §2.6: compare like with like),
    /// e.g. "For reference, not compared: Kestenbaum's rule as published (1M at threshold, no reserve) gives +10.00 D ...".
    /// </summary>
    public static string ForReference(PlannedEstimate e)
    {
        ArgumentNullException.ThrowIfNull(e);
        return $"For reference, not compared: {Method(e.Method)} gives {Power(e.EquivalentPower)} (reserve {EstimateReserve(e)}). It brings 1M print only to threshold, so it is not like for like with the estimates above (methods §2.6).";
    }

    public static string LogUnits(double value) => value.ToString("0.00", Invariant);

    public static string Difference(PlannedDisagreement d)
    {
        ArgumentNullException.ThrowIfNull(d);
        return $"{LogUnits(d.DifferenceLogUnits)} log units ({d.PowerRatio.ToString("0.0#", Invariant)} times the power)";
    }

    private static void Add(List<PlanFigure> figures, string label, string? value)
    {
        if (value is not null)
        {
            figures.Add(new(label, value));
        }
    }

    // A class added to the core after this table was written still reads as words ("SpectacleTelescope" → "Spectacle telescope").
    private static string Spaced(string name) =>
        string.Concat(name.Select((c, i) => i > 0 && char.IsUpper(c) ? " " + char.ToLowerInvariant(c) : c.ToString()));
}
