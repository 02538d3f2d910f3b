using System.Collections.Immutable;
using System.Runtime.InteropServices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Planning;

/// <summary>Builds a magnifier plan: every class of option with its figures, ranked, and the matching kit devices.</summary>
public static class Planner
{
    /// <summary>
    /// The version of the methods behind a plan. It changes whenever a formula, a default or a ranking rule changes,
    /// so that a stored plan can be told apart from one built today.
    /// </summary>
    public const string MethodVersion = "2026.12.1";

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

        if (!(request.PreferredDistance.Metres > 0))
        {
            Add("Enter the preferred working distance, greater than zero, e.g. 40 cm.");
        }

        if (!Enum.IsDefined(request.Task))
        {
            Add("Choose the task: spot reading, sustained reading, writing, a screen or distance viewing.");
        }

        if (request.Task == ReadingTask.DistanceViewing)
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
        else if (request.RequiredPower is not { } required || !(required.Dioptres > 0))
        {
            Add("Enter the required equivalent power in dioptres, greater than zero, e.g. 10.");
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

        if (!(s.BlurTolerance.Dioptres is > 0 and <= 3))
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

        var distanceTask = request.Task == ReadingTask.DistanceViewing;
        var effective = distanceTask ? WithDistanceRequirement(request) : request;
        var context = new OptionContext(effective);
        var options = new List<MagnifierOption>(distanceTask ? 2 : 7);
        var notConsidered = new List<NotConsidered>(distanceTask ? 6 : 2);
        options.Add(MovingCloserOption.Create(context, distanceTask));
        if (distanceTask)
        {
            options.Add(DistanceTelescopeOption.Create(context, request.DistanceAcuity!.Value, request.GoalDistanceAcuity!.Value));
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
                notConsidered.Add(new(OptionKind.StandMagnifier, Texts.AddAloneIsEnough));
            }

            options.Add(NearTelescopeOption.Create(context));
            options.Add(VideoMagnifierOption.Create(context));
            notConsidered.Add(new(OptionKind.DistanceTelescope, DistanceOnly));
        }

        var ranked = Ranking.Rank(options, effective);
        var kit = KitMatcher.Match(context);
        return new PlanResult
        {
            MethodVersion = MethodVersion,
            Request = request,
            Options = ranked,
            KitDevices = kit,
            NotConsidered = ImmutableCollectionsMarshal.AsImmutableArray(notConsidered.ToArray()),
            Cautions = CautionsFor(request, options, kit),
        };
    }

    /// <summary>Not considered for distance tasks.</summary>
    public const string NearOnly = "A near device: not considered for distance viewing.";

    /// <summary>Not considered for near tasks.</summary>
    public const string DistanceOnly = "A distance device: plan distance viewing to see it.";

    /// <summary>
    /// For distance viewing, the requirement comes from the acuities: EVD = d / M with M = MAR_current / MAR_goal,
    /// so F_eq = M / d (angular magnification as an equivalent viewing distance; Bailey).
    /// </summary>
    private static PlanRequest WithDistanceRequirement(PlanRequest request)
    {
        var m = request.DistanceAcuity!.Value.MarArcminutes / request.GoalDistanceAcuity!.Value.MarArcminutes;
        return request with { RequiredPower = Power.FromDioptres(m / request.PreferredDistance.Abs().Metres) };
    }

    private static ImmutableArray<Caution> CautionsFor(PlanRequest request, List<MagnifierOption> options, ImmutableArray<RankedOption> kit)
    {
        var anyLens = false;
        var anyStrong = false;
        var anyShort = false;
        var anyPowered = false;
        foreach (var o in options)
        {
            anyLens |= o.LensPower is not null || o.Kind == OptionKind.DistanceTelescope;
            anyStrong |= o.Kind is OptionKind.DistanceTelescope or OptionKind.NearTelescope || (o.LensPower is { } p && p.Dioptres >= 4);
            anyShort |= o.WorkingDistance.Metres < 0.25;
            anyPowered |= o.Kind == OptionKind.VideoMagnifier;
        }

        foreach (var k in kit)
        {
            anyPowered |= k.Option is HandMagnifierOption { Illuminated: true } or StandMagnifierOption { Illuminated: true };
        }

        var distance = request.Task == ReadingTask.DistanceViewing;
        var contrast = request.Constraints.LogContrastSensitivity is { } cs && cs < Ranking.LowContrast
            ? (cs < Ranking.VeryLowContrast ? Caution.VideoOrNonVisual : Caution.LightingAssessment)
            : null;
        var count = 3 + (anyLens ? 1 : 0) + (anyStrong ? 1 : 0) + (distance ? 1 : 0) + (anyShort ? 1 : 0) + (contrast is null ? 0 : 1) + (anyPowered ? 1 : 0);
        var cautions = new Caution[count];
        var n = 0;
        cautions[n++] = Caution.StartingPoint;
        if (anyLens)
        {
            cautions[n++] = Caution.SunlightFire;
        }

        cautions[n++] = Caution.NeverAtTheSun;
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
