using System.Collections.Immutable;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Web.Plans;

/// <summary>Builds a plan's typed outputs from its inputs with the core planner. Pure: the same inputs give the same plan.</summary>
public static class PlanBuilder
{
    public static TypedPlan Build(PlanInputs inputs)
    {
        ArgumentNullException.ThrowIfNull(inputs);
        return new TypedPlan
        {
            MethodVersion = Planner.MethodVersion,
            Imperial = inputs.Imperial,
            HasReadingSpeeds = inputs.ReadingSpeeds.Count > 0,
            KitNames = inputs.Kit.ToDictionary(k => k.Code, k => k.Name, StringComparer.Ordinal).ToImmutableDictionary(StringComparer.Ordinal),
            Goals = [.. inputs.Goals.Select(g => Goal(inputs, g))],
        };
    }

    private static PlannedGoal Goal(PlanInputs inputs, GoalPoint goal)
    {
        var request = inputs.RequestFor(goal);
        var planned = new PlannedGoal
        {
            Task = goal.Task,
            Detail = goal.Detail,
            TargetText = goal.TargetText,
            TargetPrint = goal.TargetM is { } m ? PrintSize.FromM(m) : null,
            GoalAcuity = goal.GoalLogMar is { } g ? Acuity.FromLogMar(g) : null,
            PlannedAs = request.Task,
            AssumedViewingDistance = request.Task == ReadingTask.DistanceViewing && goal.ViewingDistanceMetres is null ? request.PreferredDistance : null,
            ViewingDistance = request.Task == ReadingTask.DistanceViewing && goal.ViewingDistanceMetres is { } seen ? Distance.FromMetres(seen) : null,
        };
        var problems = Planner.Check(request);
        if (!problems.IsEmpty)
        {
            return planned with { Problems = [.. problems] };
        }

        var result = Planner.Build(request);
        var estimates = result.Estimates?.Estimates ?? [];
        var invariant = System.Globalization.CultureInfo.InvariantCulture;
        return planned with
        {
            Reserve = result.Reserve,
            RequiredPower = result.RequiredPower,
            RequiredPowerFrom = result.RequiredPowerFrom,
            Estimates = [.. estimates.Select(PlannedEstimate.From)],
            ReferenceEstimates = result.Estimates is { } r ? [.. r.ForReference.Select(PlannedEstimate.From)] : [],
            Disagreements = result.Estimates is { } c
                ? [.. c.Disagreements.Select(d => new PlannedDisagreement(estimates.IndexOf(d.Lower), estimates.IndexOf(d.Higher), d.DifferenceLogUnits))]
                : [],
            PossibleReasons = result.Estimates?.FormatPossibleReasons(invariant) ?? [],
            ReadingCurve = result.ReadingCurve is { } curve ? PlannedReadingCurve.From(curve) : null,
            Options = result.Options,
            KitDevices = result.KitDevices,
            NotConsidered = result.NotConsidered,
            Cautions = result.Cautions,
        };
    }
}
