using System.Collections.Immutable;
using System.Runtime.InteropServices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Planning;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// The ranking rules, applied in this order. Options are sorted by the first rule on which they differ; there are no
/// weights or hidden scores. A rule that does not concern the request (e.g. tremor when there is none) is skipped.
/// </summary>
public enum RankingRule
{
    /// <summary>Options that can be built for this client come first.</summary>
    Applicable = 1,

    /// <summary>Options that suit the task come first (a distance device for distance tasks; room for a pen for writing).</summary>
    SuitsTask = 2,

    /// <summary>Options that give the required power come first.</summary>
    MeetsPower = 3,

    /// <summary>Options that give it in a practical form come first.</summary>
    Practical = 4,

    /// <summary>
    /// Reading tasks: options with enough characters in view come first (sustained reading: 10 or more, then 4 or more;
    /// other reading: 4 or more; Whittaker and Lovie-Kitchin 1993; common practice).
    /// </summary>
    EnoughCharacters = 5,

    /// <summary>When hands-free use is wanted, or for sustained reading and writing: hands-free options come first.</summary>
    HandsFree = 6,

    /// <summary>With a tremor: options that need no steady hand come first (stands, spectacles, video).</summary>
    NoSteadyHand = 7,

    /// <summary>With two useful eyes: options that allow binocular use come first.</summary>
    BothEyes = 8,

    /// <summary>
    /// Contrast below logCS 1.05 (threshold above 9 %): video magnifiers and illuminated devices come first; below logCS 0.6
    /// (above 25 %), video magnifiers alone (Whittaker and Lovie-Kitchin 1994).
    /// </summary>
    ContrastHelp = 9,

    /// <summary>Finally, the working distance nearest the preferred one (smallest ratio either way) comes first.</summary>
    NearestWorkingDistance = 10,
}

/// <summary>One reason for an option's position: the rule and whether it counted in the option's favour.</summary>
/// <param name="Rule">The rule.</param>
/// <param name="InFavour">True when the option passed the rule (or was best on it).</param>
public readonly record struct RankingReason(RankingRule Rule, bool InFavour)
{
    /// <summary>The reason in plain language.</summary>
    public string Text => (Rule, InFavour) switch
    {
        (RankingRule.Applicable, true) => "Can be used by this client.",
        (RankingRule.Applicable, false) => "Cannot be used as planned (see its note).",
        (RankingRule.SuitsTask, true) => "Suits the task.",
        (RankingRule.SuitsTask, false) => "Does not suit the task well.",
        (RankingRule.MeetsPower, true) => "Gives the required magnification.",
        (RankingRule.MeetsPower, false) => "Falls short of the required magnification.",
        (RankingRule.Practical, true) => "Gives it in a practical form.",
        (RankingRule.Practical, false) => "Only in an impractical form (see its note).",
        (RankingRule.EnoughCharacters, true) => "Enough letters in view for this reading.",
        (RankingRule.EnoughCharacters, false) => "Too few letters in view for this reading.",
        (RankingRule.HandsFree, true) => "Leaves the hands free.",
        (RankingRule.HandsFree, false) => "Needs a hand to hold it.",
        (RankingRule.NoSteadyHand, true) => "Needs no steady hand.",
        (RankingRule.NoSteadyHand, false) => "Needs a steady hand.",
        (RankingRule.BothEyes, true) => "Can be used with both eyes.",
        (RankingRule.BothEyes, false) => "One eye only.",
        (RankingRule.ContrastHelp, true) => "Helps with low contrast.",
        (RankingRule.ContrastHelp, false) => "Does little for low contrast.",
        (RankingRule.NearestWorkingDistance, true) => "Working distance within 25 % of the preferred one.",
        (RankingRule.NearestWorkingDistance, false) => "Working distance far from the preferred one.",
        _ => Rule.ToString(),
    };
}

/// <summary>An option in its ranked position with the reasons for it.</summary>
/// <param name="Position">1 for the first choice.</param>
/// <param name="Option">The option and all its figures.</param>
/// <param name="Reasons">The rules that placed it, in rule order.</param>
public sealed record RankedOption(int Position, MagnifierOption Option, ImmutableArray<RankingReason> Reasons);

/// <summary>Orders options by the <see cref="RankingRule"/> rules, in order.</summary>
public static class Ranking
{
    private const int RuleCount = 10;

    /// <summary>The rules that concern a request, in the order they are applied.</summary>
    public static ImmutableArray<RankingRule> RulesFor(PlanRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var rules = ImmutableArray.CreateBuilder<RankingRule>(RuleCount);
        for (var rule = RankingRule.Applicable; rule <= RankingRule.NearestWorkingDistance; rule++)
        {
            if (Concerns(rule, request))
            {
                rules.Add(rule);
            }
        }

        return rules.ToImmutable();
    }

    /// <summary>Ranks options for a request; each position carries its reasons.</summary>
    public static ImmutableArray<RankedOption> Rank(IReadOnlyList<MagnifierOption> options, PlanRequest request)
    {
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(request);
        var n = options.Count;
        var activeCount = 0;
        Span<RankingRule> active = stackalloc RankingRule[RuleCount];
        for (var rule = RankingRule.Applicable; rule <= RankingRule.NearestWorkingDistance; rule++)
        {
            if (Concerns(rule, request))
            {
                active[activeCount++] = rule;
            }
        }

        // Tiers per option and rule: 0 is best. Ties after every rule are broken by the working-distance ratio itself.
        // Implementation note: scratch space lives on the stack for the usual short lists, so ranking allocates only its result.
        const int StackLimit = 64;
        Span<int> tiers = n <= StackLimit ? stackalloc int[n * RuleCount] : new int[n * RuleCount];
        Span<double> mismatch = n <= StackLimit ? stackalloc double[n] : new double[n];
        Span<int> order = n <= StackLimit ? stackalloc int[n] : new int[n];
        var preferred = request.PreferredDistance.Abs().Metres;
        for (var i = 0; i < n; i++)
        {
            order[i] = i;
            var option = options[i];
            mismatch[i] = Math.Abs(Math.Log(option.WorkingDistance.Metres / preferred));
            for (var r = 0; r < activeCount; r++)
            {
                tiers[(i * RuleCount) + r] = Tier(active[r], option, request, mismatch[i]);
            }
        }

        // Insertion sort: stable, allocation-free, and the lists are short.
        for (var i = 1; i < n; i++)
        {
            var current = order[i];
            var j = i - 1;
            while (j >= 0 && Compare(order[j], current, tiers, mismatch, activeCount) > 0)
            {
                order[j + 1] = order[j];
                j--;
            }

            order[j + 1] = current;
        }

        var ranked = new RankedOption[n];
        for (var position = 0; position < n; position++)
        {
            var i = order[position];
            var reasons = new RankingReason[activeCount];
            for (var r = 0; r < activeCount; r++)
            {
                reasons[r] = new RankingReason(active[r], tiers[(i * RuleCount) + r] == 0);
            }

            ranked[position] = new RankedOption(position + 1, options[i], ImmutableCollectionsMarshal.AsImmutableArray(reasons));
        }

        return ImmutableCollectionsMarshal.AsImmutableArray(ranked);
    }

    private static int Compare(int a, int b, ReadOnlySpan<int> tiers, ReadOnlySpan<double> mismatch, int activeCount)
    {
        for (var r = 0; r < activeCount; r++)
        {
            var c = tiers[(a * RuleCount) + r].CompareTo(tiers[(b * RuleCount) + r]);
            if (c != 0)
            {
                return c;
            }
        }

        return mismatch[a].CompareTo(mismatch[b]);
    }

    private static bool Concerns(RankingRule rule, PlanRequest request) => rule switch
    {
        RankingRule.EnoughCharacters => request.Task != ReadingTask.DistanceViewing,
        RankingRule.HandsFree => request.Constraints.HandsFreeWanted || request.Task is ReadingTask.SustainedReading or ReadingTask.Writing,
        RankingRule.NoSteadyHand => request.Constraints.Tremor,
        RankingRule.BothEyes => request.Constraints.UsefulEyes >= 2,
        RankingRule.ContrastHelp => request.Constraints.LogContrastSensitivity is < LowContrast,
        _ => true,
    };

    /// <summary>logCS below which contrast help is favoured (threshold above 9 %; Whittaker and Lovie-Kitchin 1994).</summary>
    public const double LowContrast = 1.05;

    /// <summary>logCS below which video magnifiers alone are favoured (threshold above 25 %).</summary>
    public const double VeryLowContrast = 0.6;

    /// <summary>The smallest working distance that leaves room for a pen when writing: 20 cm (common practice).</summary>
    public const double WritingRoomMetres = 0.20;

    private static int Tier(RankingRule rule, MagnifierOption o, PlanRequest request, double mismatch) => rule switch
    {
        RankingRule.Applicable => o.IsApplicable ? 0 : 1,
        RankingRule.SuitsTask => SuitsTask(o, request.Task) ? 0 : 1,
        RankingRule.MeetsPower => o.MeetsRequiredPower ? 0 : 1,
        RankingRule.Practical => o.IsPractical ? 0 : 1,
        RankingRule.EnoughCharacters => o.CharactersInView switch
        {
            null => 0,
            >= 10 => 0,
            >= 4 => request.Task == ReadingTask.SustainedReading ? 1 : 0,
            _ => 2,
        },
        RankingRule.HandsFree => o.HandsFree ? 0 : 1,
        RankingRule.NoSteadyHand => o.SuitsTremor ? 0 : 1,
        RankingRule.BothEyes => o.Binocular.Feasible ? 0 : 1,
        RankingRule.ContrastHelp => HelpsContrast(o, request.Constraints.LogContrastSensitivity ?? 2) ? 0 : 1,
        RankingRule.NearestWorkingDistance => mismatch <= WithinQuarter ? 0 : 1,
        _ => 0,
    };

    private static readonly double WithinQuarter = Math.Log(1.25);

    private static bool SuitsTask(MagnifierOption o, ReadingTask task) => task switch
    {
        ReadingTask.DistanceViewing => o.Kind is OptionKind.DistanceTelescope or OptionKind.MovingCloser,
        ReadingTask.Writing => o.Kind is OptionKind.LargePrint or OptionKind.VideoMagnifier
            || (o.HandsFree && o.WorkingDistance.Metres >= WritingRoomMetres),
        ReadingTask.Screen => o.Kind is not (OptionKind.HandMagnifier or OptionKind.StandMagnifier or OptionKind.DistanceTelescope),
        _ => o.Kind != OptionKind.DistanceTelescope,
    };

    private static bool HelpsContrast(MagnifierOption o, double logCs)
    {
        if (o.Kind == OptionKind.VideoMagnifier)
        {
            return true;
        }

        if (logCs < VeryLowContrast)
        {
            return false;
        }

        return o switch
        {
            HandMagnifierOption hand => hand.Illuminated,
            StandMagnifierOption stand => stand.Illuminated,
            _ => false,
        };
    }

    internal static bool IsNearKind(DeviceKind kind) => kind != DeviceKind.DistanceTelescope;
}
