using System.Collections.Immutable;
using System.Runtime.InteropServices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Planning;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// The ranking rules, applied in this order: the order of trial in practice, simplest and most portable first, then
/// telescopic and electronic devices when those fail or the task demands them (methods §11 "Order of trial in
/// practice"; Dickinson, Low Vision: Principles and Practice; Freeman and Jose, The Art and Practice of Low Vision;
/// common practice). Options are sorted by the first rule on which they differ; there are no weights or hidden scores.
/// A rule that does not concern the request (e.g. tremor when there is none) is skipped. Each rule is shown on the
/// page as a reason (<see cref="RankingReason.Text"/>).
/// </summary>
public enum RankingRule
{
    /// <summary>Options that can be built for this client come first.</summary>
    Applicable = 1,

    /// <summary>
    /// Options that suit the task come first: a distance option for distance tasks; room for a pen for writing; no
    /// lens held over a screen; no large print for spot reading of labels and prices (common practice).
    /// </summary>
    SuitsTask = 2,

    /// <summary>Options that give the required power come first.</summary>
    MeetsPower = 3,

    /// <summary>Options within their class's realistic range (<see cref="DeviceRanges"/>) and in a practical form come first.</summary>
    Practical = 4,

    /// <summary>
    /// Reading tasks: options with at least 4 letters of the target print in view come first, the least for fluent
    /// reading (Whittaker and Lovie-Kitchin 1993; Legge et al. 1985).
    /// </summary>
    EnoughCharacters = 5,

    /// <summary>With a tremor: options that need no steady hand come first (stands, spectacles, screens; common practice).</summary>
    NoSteadyHand = 6,

    /// <summary>When hands-free use is wanted, or for writing: hands-free options come first.</summary>
    HandsFree = 7,

    /// <summary>
    /// Contrast below logCS 1.05 (threshold above 9 %) or dim home lighting: video magnifiers and illuminated
    /// magnifiers come first; below logCS 0.6 (above 25 %), video magnifiers alone (Whittaker and Lovie-Kitchin 1994;
    /// methods §2.4, §7.6).
    /// </summary>
    ContrastHelp = 8,

    /// <summary>
    /// The simplest, most portable class first: no device at all (moving closer, large print, built-in screen settings),
    /// then spectacle adds, hand and stand magnifiers, then telescopes and video magnifiers (methods §11; Dickinson;
    /// Freeman and Jose).
    /// </summary>
    Simplicity = 9,

    /// <summary>
    /// Sustained reading: devices that hold the focus for the client (stand, spectacles, screens) come before a
    /// hand-held lens; stand magnifiers are a first-line choice for long reading in older clients (common practice).
    /// </summary>
    LongReadingSupport = 10,

    /// <summary>
    /// Sustained reading: options with 10 or more letters in view come first (methods §4.3; common practice: long
    /// reading is slow and tiring with fewer).
    /// </summary>
    RoomyField = 11,

    /// <summary>With two useful eyes: options that allow binocular use come first.</summary>
    BothEyes = 12,

    /// <summary>The lower cost class first (<see cref="DeviceRanges.Costs"/>; clinic-editable; common practice).</summary>
    Cost = 13,

    /// <summary>
    /// Finally, the eye-to-page distance (for distance viewing, eye to what is viewed) nearest the preferred distance
    /// (smallest ratio either way) comes first.
    /// </summary>
    NearestWorkingDistance = 14,
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
        (RankingRule.EnoughCharacters, true) => "At least 4 letters in view, enough for fluent reading.",
        (RankingRule.EnoughCharacters, false) => "Fewer than 4 letters in view: spot reading only.",
        (RankingRule.HandsFree, true) => "Leaves the hands free.",
        (RankingRule.HandsFree, false) => "Needs a hand to hold it.",
        (RankingRule.NoSteadyHand, true) => "Needs no steady hand.",
        (RankingRule.NoSteadyHand, false) => "Needs a steady hand.",
        (RankingRule.BothEyes, true) => "Can be used with both eyes.",
        (RankingRule.BothEyes, false) => "One eye only.",
        (RankingRule.ContrastHelp, true) => "Brings its own light or contrast: helps with low contrast or dim lighting.",
        (RankingRule.ContrastHelp, false) => "Does little for low contrast or dim lighting.",
        (RankingRule.Simplicity, true) => "Simple and portable: tried first in practice.",
        (RankingRule.Simplicity, false) => "A telescope or video magnifier: tried when plain lenses fail.",
        (RankingRule.LongReadingSupport, true) => "Holds the focus for long reading.",
        (RankingRule.LongReadingSupport, false) => "Must be held in focus by hand: tiring for long reading.",
        (RankingRule.RoomyField, true) => "10 or more letters in view: comfortable for long reading.",
        (RankingRule.RoomyField, false) => "Fewer than 10 letters in view: long reading may be slow and tiring.",
        (RankingRule.Cost, true) => "Low cost.",
        (RankingRule.Cost, false) => "Costs more.",
        (RankingRule.NearestWorkingDistance, true) => "Eye to page (or to what is viewed) within 25 % of the preferred distance.",
        (RankingRule.NearestWorkingDistance, false) => "Eye to page (or to what is viewed) far from the preferred distance.",
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
    private const int RuleCount = 14;

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
            mismatch[i] = Math.Abs(Math.Log(option.EyeToPage.Metres / preferred));
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
                // Plain lenses pass the simplicity rule too: only telescopes and video count against it.
                reasons[r] = new RankingReason(active[r], tiers[(i * RuleCount) + r] <= (active[r] == RankingRule.Simplicity ? 1 : 0));
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
        RankingRule.EnoughCharacters => !IsDistanceTask(request.Task),
        RankingRule.HandsFree => request.Constraints.HandsFreeWanted || request.Task is ReadingTask.Writing,
        RankingRule.NoSteadyHand => request.Constraints.Tremor,
        RankingRule.LongReadingSupport or RankingRule.RoomyField => request.Task is ReadingTask.SustainedReading,
        RankingRule.BothEyes => request.Constraints.UsefulEyes >= 2,
        RankingRule.ContrastHelp => request.Constraints.DimLighting || request.Constraints.LogContrastSensitivity is < LowContrast,
        _ => true,
    };

    /// <summary>
    /// True for a task at a distance (television, faces, a board, signs): planned from the distance acuities at the
    /// entered distance, with moving closer and telescopes. The one place that tells distance tasks from near ones.
    /// </summary>
    public static bool IsDistanceTask(ReadingTask task) => task == ReadingTask.DistanceViewing;

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
        RankingRule.EnoughCharacters => o.CharactersInView is null or >= FewestLettersForFluency ? 0 : 1,
        RankingRule.HandsFree => o.HandsFree ? 0 : 1,
        RankingRule.NoSteadyHand => o.SuitsTremor ? 0 : 1,
        RankingRule.BothEyes => o.Binocular.Feasible ? 0 : 1,
        RankingRule.ContrastHelp => HelpsContrast(o, request.Constraints.LogContrastSensitivity ?? 2) ? 0 : 1,
        RankingRule.Simplicity => SimplicityTier(o.Kind),
        RankingRule.LongReadingSupport => o.SuitsTremor ? 0 : 1,
        RankingRule.RoomyField => o.CharactersInView is null or >= 10 ? 0 : 1,
        RankingRule.Cost => (int)o.Cost - 1,
        RankingRule.NearestWorkingDistance => mismatch <= WithinQuarter ? 0 : 1,
        _ => 0,
    };

    /// <summary>Fewest letters in view for fluent reading: 4 (Whittaker and Lovie-Kitchin 1993; methods §4.3).</summary>
    public const double FewestLettersForFluency = 4;

    private static readonly double WithinQuarter = Math.Log(1.25);

    /// <summary>
    /// The order of trial by class (methods §11): 0 for no device (moving closer, large print, built-in screen
    /// settings), 1 for plain lenses (spectacle add, hand and stand magnifiers), 2 for telescopes and video magnifiers.
    /// </summary>
    public static int SimplicityTier(OptionKind kind) => kind switch
    {
        OptionKind.MovingCloser or OptionKind.LargePrint or OptionKind.ScreenMagnification => 0,
        OptionKind.SpectacleAdd or OptionKind.HandMagnifier or OptionKind.StandMagnifier => 1,
        _ => 2,
    };

    /// <summary>True for the classes of device made for distance viewing (the two distance telescopes).</summary>
    internal static bool IsDistanceKind(OptionKind kind) => kind is OptionKind.DistanceTelescope or OptionKind.SpectacleTelescope;

    private static bool SuitsTask(MagnifierOption o, ReadingTask task)
    {
        if (IsDistanceTask(task))
        {
            return IsDistanceKind(o.Kind) || o.Kind == OptionKind.MovingCloser;
        }

        return task switch
        {
            ReadingTask.Writing => o.Kind is OptionKind.LargePrint or OptionKind.VideoMagnifier
                || (o.HandsFree && o.WorkingDistance.Metres >= WritingRoomMetres && !IsDistanceKind(o.Kind)),
            ReadingTask.Screen => o.Kind is not (OptionKind.HandMagnifier or OptionKind.StandMagnifier or OptionKind.LargePrint) && !IsDistanceKind(o.Kind),
            ReadingTask.SpotReading => o.Kind != OptionKind.LargePrint && !IsDistanceKind(o.Kind),
            _ => !IsDistanceKind(o.Kind),
        };
    }

    private static bool HelpsContrast(MagnifierOption o, double logCs)
    {
        if (o.Kind == OptionKind.VideoMagnifier || o is ScreenMagnificationOption { ReversedPolarityAdvised: true })
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
