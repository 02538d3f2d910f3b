using System.Collections.Immutable;
using System.Runtime.InteropServices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;

namespace LowVisionAid.Optics.Planning;

/// <summary>Builds a magnifier plan: every class of option with its figures, ranked, and the matching kit devices.</summary>
public static class Planner
{
    /// <summary>
    /// The version of the methods behind a plan. It changes whenever a formula, a default or a ranking rule changes,
    /// so that a stored plan can be told apart from one built today.
    /// </summary>
    public const string MethodVersion = "2026.12.3";

    /// <summary>What is missing or out of range in a request, each with what to enter instead; empty when it can be planned.</summary>
    public static ImmutableArray<string> Check(PlanRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        // Implementation note: the builder is made only when there is a problem, so a valid request allocates nothing here.
        ImmutableArray<string>.Builder? problems = null;
        void Add(string message) => (problems ??= ImmutableArray.CreateBuilder<string>()).Add(message);
        if (!request.TargetPrint.IsValid)
        {
            Add("Enter the target print size in M units, e.g. 1.0 for newsprint.");
        }

        var knownTask = Enum.IsDefined(request.Task);
        if (!knownTask)
        {
            Add("Choose the task: spot reading, sustained reading, writing, a screen or distance viewing.");
        }
        else if (request.Goal is { } goal && (!Enum.IsDefined(goal) || TaskRules.For(goal).Kind != request.Task))
        {
            Add("The everyday task and the kind of task do not match: choose the task again.");
        }

        if (!(request.PreferredDistance.Metres > 0))
        {
            Add("Enter the preferred working distance, greater than zero, e.g. 40 cm.");
        }
        else if (knownTask && DistanceProblem(request) is { } distanceProblem)
        {
            Add(distanceProblem);
        }

        if (Ranking.IsDistanceTask(request.Task))
        {
            if (request.DistanceAcuity is null || request.GoalDistanceAcuity is null)
            {
                Add("For distance viewing enter the current distance acuity and the goal acuity, e.g. 6/60 and 6/12.");
            }
            else if (!(request.DistanceAcuity.Value.MarArcminutes > request.GoalDistanceAcuity.Value.MarArcminutes))
            {
                Add("The goal acuity must be better than the current acuity; no magnification is needed otherwise.");
            }
        }
        else if (request.RequiredPower is { } required)
        {
            if (!(required.Dioptres > 0))
            {
                Add("Enter the required equivalent power in dioptres, greater than zero, e.g. 10.");
            }
        }
        else if (!(request.Estimates ?? EstimateInputs.None).CanEstimate(request.DistanceAcuity, request.Task))
        {
            Add(request.Task == ReadingTask.SpotReading
                ? "For a spot task enter the required equivalent power in dioptres (e.g. 10), or the distance acuity, or the near threshold print with its test distance: spot tasks use threshold acuity, not the reading curve."
                : "Enter the required equivalent power in dioptres (e.g. 10), or the measurements for an estimate: the distance acuity, the near threshold print with its test distance, or a reading curve with its test distance.");
        }

        var e = request.Estimates ?? EstimateInputs.None;
        if ((e.NearTestDistance is { } nd && !(nd.Metres > 0)) || (e.ReadingTestDistance is { } rd && !(rd.Metres > 0)))
        {
            Add("Enter test distances greater than zero, e.g. 40 cm.");
        }

        if ((e.NearThresholdPrint is { } np && !np.IsValid) || (e.CriticalPrintSize is { } cp && !cp.IsValid))
        {
            Add("Enter print sizes greater than zero, e.g. 1.0M.");
        }

        var c = request.Constraints;
        if (c.UsefulEyes is not (1 or 2))
        {
            Add("Enter 1 or 2 useful eyes.");
        }

        if (c.UsableAccommodation is { } acc && acc.Dioptres < 0)
        {
            Add("Usable accommodation cannot be negative; enter 0 if the client has none.");
        }

        if (!(c.DistanceRefraction.Dioptres is >= -30 and <= 30))
        {
            Add("Enter the distance refraction as a spherical equivalent between -30 and +30 D, e.g. -3.00.");
        }

        if (c.AgeYears is { } age && age is < 0 or > 120)
        {
            Add("Enter an age between 0 and 120 years.");
        }

        if (c.LogContrastSensitivity is { } cs && !(cs is >= 0 and <= 2.5))
        {
            Add("Enter contrast sensitivity in logCS between 0.00 and 2.50, e.g. 1.05.");
        }

        if (!(c.InterpupillaryDistance.Millimetres is >= 40 and <= 80))
        {
            Add("Enter the interpupillary distance between 40 and 80 mm, e.g. 64.");
        }

        var s = request.Settings;
        if (!(s.CharacterPitch is >= 0.5 and <= 2.0))
        {
            Add("The character pitch k must be between 0.5 and 2.0 times the x-height; 1.1 suits most book faces.");
        }

        if (!(s.BlurTolerance.Dioptres is > 0 and <= 3) && !s.BlurToleranceFollowsAcuity)
        {
            Add("The blur tolerance for depth of field must be between 0 and 3 D, e.g. 0.59.");
        }

        if (!(s.PowerTolerance is > 0.5 and <= 1.0))
        {
            Add("The power tolerance must be a fraction between 0.5 and 1, e.g. 0.955.");
        }

        return problems?.ToImmutable() ?? [];
    }

    /// <summary>Builds the plan for a request.</summary>
    /// <exception cref="ArgumentException">The request cannot be planned; the message lists what to enter (see <see cref="Check"/>).</exception>
    public static PlanResult Build(PlanRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var problems = Check(request);
        if (!problems.IsEmpty)
        {
            throw new ArgumentException(string.Join(" ", problems), nameof(request));
        }


        var distanceTask = Ranking.IsDistanceTask(request.Task);
        EstimateComparison? comparison = null;
        ReadingCurveAnalysis? curve = null;
        PowerMethod? from = null;
        var reserve = TaskRules.ReserveFor(request.Task, request.Estimates?.ReserveChoice, request.Estimates?.Reserve, request.Settings.Reserves);
        var blur = request.Settings.BlurToleranceFollowsAcuity
            ? DepthOfFieldRule.BlurToleranceFor(request.DistanceAcuity)
            : request.Settings.BlurTolerance;
        var effective = request.Settings.BlurTolerance == blur ? request : request with { Settings = request.Settings with { BlurTolerance = blur } };
        if (distanceTask)
        {
            effective = WithDistanceRequirement(effective);
        }
        else if (request.DistanceAcuity is not null || HasNearEstimateInputs(request.Estimates, request.Task))
        {
            (comparison, curve) = Estimate(request, reserve!.Reserve);
            if (request.RequiredPower is null)
            {
                var chosen = Choose(comparison) ?? throw new ArgumentException(
                    "No required-power estimate could be made" + (curve?.Refusal is { } refusal ? ": " + refusal : ".") + " Enter the required equivalent power in dioptres instead.", nameof(request));
                from = chosen.Method;
                effective = effective with { RequiredPower = chosen.EquivalentPower };
            }
        }
        var context = new OptionContext(effective);
        var options = new List<MagnifierOption>(distanceTask ? 3 : 8);
        var notConsidered = new List<NotConsidered>(distanceTask ? 7 : 3);
        options.Add(MovingCloserOption.Create(context, distanceTask));
        if (distanceTask)
        {
            options.Add(DistanceTelescopeOption.Create(context, request.DistanceAcuity!.Value, request.GoalDistanceAcuity!.Value));
            options.Add(DistanceTelescopeOption.Create(context, request.DistanceAcuity!.Value, request.GoalDistanceAcuity!.Value, spectacleMounted: true));
            notConsidered.Add(new(OptionKind.ScreenMagnification, ScreensOnly));
            notConsidered.Add(new(OptionKind.LargePrint, NearOnly));
            notConsidered.Add(new(OptionKind.SpectacleAdd, NearOnly));
            notConsidered.Add(new(OptionKind.HandMagnifier, NearOnly));
            notConsidered.Add(new(OptionKind.StandMagnifier, NearOnly));
            notConsidered.Add(new(OptionKind.NearTelescope, NearOnly));
            notConsidered.Add(new(OptionKind.VideoMagnifier, NearOnly));
        }
        else
        {
            options.Add(LargePrintOption.Create(context));
            options.Add(SpectacleAddOption.Create(context));
            options.Add(HandMagnifierOption.Create(context));
            if (StandMagnifierOption.Create(context) is { } stand)
            {
                options.Add(stand);
            }
            else
            {
                notConsidered.Add(new(OptionKind.StandMagnifier, OptionNotes.AddAloneIsEnough));
            }

            options.Add(NearTelescopeOption.Create(context));
            options.Add(VideoMagnifierOption.Create(context));
            if (request.Task == ReadingTask.Screen)
            {
                options.Add(ScreenMagnificationOption.Create(context));
            }
            else
            {
                notConsidered.Add(new(OptionKind.ScreenMagnification, ScreensOnly));
            }

            notConsidered.Add(new(OptionKind.DistanceTelescope, DistanceOnly));
            notConsidered.Add(new(OptionKind.SpectacleTelescope, DistanceOnly));
        }

        var ranked = Ranking.Rank(options, effective);
        var kit = KitMatcher.Match(context);
        return new PlanResult
        {
            MethodVersion = MethodVersion,
            Request = request,
            RequiredPower = effective.RequiredPower!.Value,
            RequiredPowerFrom = from,
            Reserve = reserve,
            BlurTolerance = blur,
            Estimates = comparison,
            ReadingCurve = curve,
            Options = ranked,
            KitDevices = kit,
            NotConsidered = ImmutableCollectionsMarshal.AsImmutableArray(notConsidered.ToArray()),
            Cautions = CautionsFor(request, options, ranked, kit, context.AccommodationEstimated, comparison?.HasDisagreement ?? false),
        };
    }

    /// <summary>
    /// The estimates the request's measurements allow, compared like with like (methods §2.6): Kestenbaum with the
    /// reserve and target, the near-acuity method, and (not for spot tasks) the reading-curve method are compared;
    /// Kestenbaum as published (1M at threshold, 1:1) is kept for reference outside the comparison. Spot tasks use
    /// threshold acuity with the spot reserve and never the critical print size (methods §11).
    /// </summary>
    private static (EstimateComparison Comparison, ReadingCurveAnalysis? Curve) Estimate(PlanRequest request, AcuityReserve reserve)
    {
        var inputs = request.Estimates ?? EstimateInputs.None;
        var spot = request.Task == ReadingTask.SpotReading;
        ReadingCurveAnalysis? curve = null;
        var acuity = request.DistanceAcuity;
        var near = inputs.NearThresholdPrint is not null && inputs.NearTestDistance is not null;
        var readingDistance = inputs.ReadingTestDistance;
        if (!spot && readingDistance is { } rd && inputs.CriticalPrintSize is null && !inputs.ReadingPoints.IsDefaultOrEmpty)
        {
            curve = ReadingCurve.Analyse(rd, inputs.ReadingPoints);
        }

        var fromCurve = !spot && readingDistance is not null && (inputs.CriticalPrintSize is not null || curve is { IsUsable: true });
        // Implementation note: the estimates go into an array of their exact size that the comparison keeps as it is.
        var estimates = new PowerEstimate[(acuity is null ? 0 : 1) + (near ? 1 : 0) + (fromCurve ? 1 : 0)];
        var n = 0;
        if (acuity is { } a)
        {
            estimates[n++] = KestenbaumRule.WithReserve(a, request.TargetPrint, reserve);
        }

        if (near)
        {
            estimates[n++] = NearAcuityMethod.Estimate(inputs.NearThresholdPrint!.Value, inputs.NearTestDistance!.Value, request.TargetPrint, reserve);
        }

        if (fromCurve)
        {
            estimates[n] = inputs.CriticalPrintSize is { } cps
                ? CriticalPrintSizeMethod.Estimate(cps, readingDistance!.Value, request.TargetPrint)
                : CriticalPrintSizeMethod.Estimate(curve!, request.TargetPrint);
        }

        var comparison = EstimateReconciliation.CompareOwned(estimates);
        return (acuity is { } va ? comparison with { ForReference = [KestenbaumRule.Classic(va)] } : comparison, curve);
    }

    /// <summary>
    /// The estimate a plan uses when no power is entered: the reading curve, else the near-acuity method, else
    /// Kestenbaum with reserve, since distance acuity often under-estimates the near need (Cheong, Lovie-Kitchin and
    /// Bowers 2002; methods §2.1, §2.6).
    /// </summary>
    private static PowerEstimate? Choose(EstimateComparison comparison)
    {
        ReadOnlySpan<PowerMethod> preference = [PowerMethod.CriticalPrintSize, PowerMethod.NearAcuity, PowerMethod.KestenbaumWithReserve];
        foreach (var method in preference)
        {
            foreach (var estimate in comparison.Estimates)
            {
                if (estimate.Method == method)
                {
                    return estimate;
                }
            }
        }

        return null;
    }

    private static bool HasNearEstimateInputs(EstimateInputs? inputs, ReadingTask task) =>
        inputs is not null && inputs.CanEstimate(null, task);

    /// <summary>The message for a preferred distance outside the task's range (<see cref="TaskRules"/>), or null.</summary>
    private static string? DistanceProblem(PlanRequest request) =>
        request.Goal is { } goal && !Enum.IsDefined(goal) ? null : request.Rule.CheckDistance(request.PreferredDistance.Abs());

    /// <summary>Not considered for distance tasks.</summary>
    public const string NearOnly = "A near device: not considered for distance viewing.";

    /// <summary>Not considered for near tasks.</summary>
    public const string DistanceOnly = "A distance device: plan distance viewing to see it.";

    /// <summary>Not considered for tasks that are not on a screen.</summary>
    public const string ScreensOnly = "Built-in screen magnification: for screen tasks only.";

    /// <summary>
    /// For distance viewing, the requirement comes from the acuities: EVD = d / M with M = MAR_current / MAR_goal,
    /// so F_eq = M / d (angular magnification as an equivalent viewing distance; Bailey).
    /// </summary>
    private static PlanRequest WithDistanceRequirement(PlanRequest request)
    {
        var m = request.DistanceAcuity!.Value.MarArcminutes / request.GoalDistanceAcuity!.Value.MarArcminutes;
        return request with { RequiredPower = Power.FromDioptres(m / request.PreferredDistance.Abs().Metres) };
    }

    /// <summary>
    /// The caution for a need beyond every optical class (no spectacle add, magnifier or telescope meets it in a
    /// practical form), and beyond the video magnifier too, or null (methods §11 "Realistic device ranges").
    /// </summary>
    private static Caution? BeyondFor(List<MagnifierOption> options)
    {
        var optical = false;
        var electronic = false;
        foreach (var o in options)
        {
            var usable = o.IsUsable;
            optical |= usable && o.Kind is OptionKind.SpectacleAdd or OptionKind.HandMagnifier or OptionKind.StandMagnifier
                or OptionKind.NearTelescope or OptionKind.DistanceTelescope or OptionKind.SpectacleTelescope or OptionKind.MovingCloser;
            electronic |= usable && o.Kind is OptionKind.VideoMagnifier or OptionKind.ScreenMagnification;
        }

        return optical ? null : electronic ? Caution.BeyondOptical : Caution.BeyondEveryDevice;
    }

    /// <summary>
    /// The options a plan puts forward, which the device cautions are about: the usable options (applicable, giving the
    /// power, practical) in ranked order, up to and including the first that needs no battery or mains. A clinician
    /// trials the first usable option; a powered one above it is put forward too, together with the plain alternative
    /// that follows it (common practice). Options ranked lower, or not usable, raise no caution.
    /// </summary>
    public static IEnumerable<MagnifierOption> PutForward(IEnumerable<RankedOption> ranked)
    {
        ArgumentNullException.ThrowIfNull(ranked);
        foreach (var option in ranked.Select(r => r.Option).Where(o => o.IsUsable))
        {
            yield return option;
            if (!option.IsPowered)
            {
                yield break;
            }
        }
    }

    // Device cautions (a lens, a strong aid, a short distance, a battery) fire only for what the plan puts forward, from
    // the options and from the kit; the others concern the client, the task or the inputs (docs/formulas.md, SAFETY.md).
    private static ImmutableArray<Caution> CautionsFor(PlanRequest request, List<MagnifierOption> options, ImmutableArray<RankedOption> ranked, ImmutableArray<RankedOption> kit, bool accommodationEstimated, bool estimatesDisagree)
    {
        var anyLens = false;
        var anyStrong = false;
        var anyShort = false;
        var anyPowered = false;
        foreach (var o in PutForward(ranked).Concat(PutForward(kit)))
        {
            anyLens |= o.LensPower is not null || o.Kind is OptionKind.DistanceTelescope or OptionKind.SpectacleTelescope or OptionKind.NearTelescope;
            anyStrong |= o.Kind is OptionKind.DistanceTelescope or OptionKind.SpectacleTelescope or OptionKind.NearTelescope || (o.LensPower is { } p && p.Dioptres >= 4);
            anyShort |= o.WorkingDistance.Metres < 0.25;
            anyPowered |= o.IsPowered;
        }

        var distance = Ranking.IsDistanceTask(request.Task);
        var beyond = BeyondFor(options);
        var contrast = request.Constraints.LogContrastSensitivity is { } cs && cs < Ranking.LowContrast
            ? (cs < Ranking.VeryLowContrast ? Caution.VideoOrNonVisual : Caution.LightingAssessment)
            : null;
        var count = 2 + (beyond is null ? 0 : 1) + (estimatesDisagree ? 1 : 0) + (accommodationEstimated ? 1 : 0) + (anyLens ? 2 : 0) + (anyStrong ? 1 : 0) + (distance ? 1 : 0) + (anyShort ? 1 : 0) + (contrast is null ? 0 : 1) + (anyPowered ? 1 : 0);
        var cautions = new Caution[count];
        var n = 0;
        cautions[n++] = Caution.StartingPoint;
        if (beyond is not null)
        {
            cautions[n++] = beyond;
        }

        if (estimatesDisagree)
        {
            cautions[n++] = Caution.EstimatesDisagree;
        }

        if (accommodationEstimated)
        {
            cautions[n++] = Caution.AccommodationEstimated;
        }

        if (anyLens)
        {
            cautions[n++] = Caution.SunlightFire;
            cautions[n++] = Caution.NeverAtTheSun;
        }

        if (anyStrong)
        {
            cautions[n++] = Caution.NoWalking;
        }

        if (distance)
        {
            cautions[n++] = Caution.Driving;
        }

        if (anyShort)
        {
            cautions[n++] = Caution.ShortSessions;
        }

        if (contrast is not null)
        {
            cautions[n++] = contrast;
        }

        if (anyPowered)
        {
            cautions[n++] = Caution.ChargeDevices;
        }

        cautions[n] = Caution.Referral;
        return ImmutableCollectionsMarshal.AsImmutableArray(cautions);
    }
}
