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
            AssumedViewingDistance = inputs.Goals.Any(g => PlanInputs.TaskFor(g.Task) == ReadingTask.DistanceViewing)
                ? Distance.FromMetres(PlanInputs.AssumedDistanceViewingMetres)
                : null,
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
            Reserve = request.Task == ReadingTask.DistanceViewing ? null : request.Estimates.Reserve ?? EstimateInputs.DefaultReserveFor(request.Task),
        };
        var problems = Planner.Check(request);
        if (!problems.IsEmpty)
        {
            return planned with { Problems = [.. problems] };
        }

        var result = Planner.Build(request);
        var estimates = result.Estimates?.Estimates ?? [];
        return planned with
        {
            RequiredPower = result.RequiredPower,
            RequiredPowerFrom = result.RequiredPowerFrom,
            Estimates = [.. estimates.Select(PlannedEstimate.From)],
            Disagreements = result.Estimates is { } c
                ? [.. c.Disagreements.Select(d => new PlannedDisagreement(estimates.IndexOf(d.Lower), estimates.IndexOf(d.Higher), d.DifferenceLogUnits,
                    d.FormatPossibleReasons(System.Globalization.CultureInfo.InvariantCulture)))]
                : [],
            ReadingCurve = result.ReadingCurve is { } curve ? PlannedReadingCurve.From(curve) : null,
            Options = result.Options,
            KitDevices = result.KitDevices,
            NotConsidered = result.NotConsidered,
            Cautions = result.Cautions,
        };
    }
}
