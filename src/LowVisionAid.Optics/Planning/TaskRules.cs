using System.Globalization;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Planning;

/// <summary>The acuity-reserve levels a plan can use (methods §2.3, §11).</summary>
public enum ReserveLevel
{
    /// <summary>Spot tasks: 1:1 on the threshold acuity (common practice; methods §2.3).</summary>
    Spot = 1,

    /// <summary>Fluent reading: 2:1, the default for reading (Cheong, Lovie-Kitchin and Bowers 2002; Latham and Tabrett 2012).</summary>
    Fluent = 2,

    /// <summary>Long or high-speed reading: 3:1, only as an explicit choice (Whittaker and Lovie-Kitchin 1993).</summary>
    Sustained = 3,
}

/// <summary>
/// The ratio the clinic uses for each <see cref="ReserveLevel"/>. Immutable; <see cref="Default"/> holds spot 1:1,
/// fluent 2:1, sustained 3:1 (methods §2.3).
/// </summary>
public sealed record ReserveRatios
{
    /// <summary>Spot 1:1, fluent 2:1, sustained 3:1.</summary>
    public static ReserveRatios Default { get; } = new();

    /// <summary>The spot-task reserve. Default 1:1.</summary>
    public AcuityReserve Spot { get; init; } = AcuityReserve.Spot;

    /// <summary>The fluent-reading reserve. Default 2:1.</summary>
    public AcuityReserve Fluent { get; init; } = AcuityReserve.Fluent;

    /// <summary>The long or high-speed reading reserve. Default 3:1.</summary>
    public AcuityReserve Sustained { get; init; } = AcuityReserve.Sustained;

    /// <summary>The ratio for a level.</summary>
    public AcuityReserve For(ReserveLevel level) => level switch
    {
        ReserveLevel.Spot => Spot,
        ReserveLevel.Sustained => Sustained,
        _ => Fluent,
    };
}

/// <summary>
/// How one task is planned: the kind of reading task, the acuity-reserve level it uses by default (null for distance
/// viewing, whose requirement comes from the acuity wanted), and the sane range of working or viewing distances.
/// </summary>
/// <param name="Kind">The kind of reading task.</param>
/// <param name="Reserve">The default reserve level; null for distance viewing.</param>
/// <param name="Nearest">The shortest distance accepted for the task.</param>
/// <param name="Farthest">The longest distance accepted for the task.</param>
/// <param name="Example">A typical distance, used in the message that says what to type.</param>
public sealed record TaskRule(ReadingTask Kind, ReserveLevel? Reserve, Distance Nearest, Distance Farthest, Distance Example)
{
    /// <summary>True when the distance lies in the task's range (inclusive).</summary>
    public bool Allows(Distance distance) =>
        distance.Metres >= Nearest.Metres - 1e-12 && distance.Metres <= Farthest.Metres + 1e-12;

    /// <summary>
    /// What to type when a distance lies outside the range, e.g. "For sustained reading, enter a working distance
    /// between 5 cm and 1 m, e.g. 40 cm (2 mm is outside that range)."; null when the distance is accepted.
    /// </summary>
    public string? CheckDistance(Distance distance)
    {
        if (Allows(distance))
        {
            return null;
        }

        var what = Kind == ReadingTask.DistanceViewing ? "viewing distance" : "working distance";
        return string.Create(CultureInfo.InvariantCulture,
            $"For {TaskRules.Describe(Kind)}, enter a {what} between {Show(Nearest)} and {Show(Farthest)}, e.g. {Show(Example)} ({Show(distance)} is outside that range).");
    }

    private static string Show(Distance d) => d.Abs().Metres switch
    {
        >= 1 => d.Abs().Metres.ToString("0.##", CultureInfo.InvariantCulture) + " m",
        < 0.01 => DistanceNotation.Format(d.Abs(), CultureInfo.InvariantCulture, "mm"),
        _ => DistanceNotation.Format(d.Abs(), CultureInfo.InvariantCulture),
    };
}

/// <summary>
/// The one rule that maps a client's task to how it is planned: its reading-task kind, its acuity reserve, and its sane
/// range of distances. The quick calculator, the client record's plans, the API and the stored plans all use it.
/// </summary>
/// <remarks>
/// Reserves (methods §2.3, §11): fluent reading defaults to 2:1 (Cheong, Lovie-Kitchin and Bowers 2002 found a fixed
/// 0.3 log-unit reserve as good as an individually optimised one; Latham and Tabrett 2012 found 2:1 adequate for most
/// readers); 3:1 is used only when chosen for long or high-speed reading (Whittaker and Lovie-Kitchin 1993); spot
/// tasks use 1:1 on the threshold acuity (common practice). Writing and screens are fluent reading (common practice).
/// Distance ranges are common practice: reading nearer than 5 cm or farther than 1 m is not a reading distance; a pen
/// needs at least 10 cm under the eye; a phone is held from about 10 cm, a desktop screen is at most about 1.5 m away;
/// distance tasks are from 1 m (television, whiteboard, signs) or 0.5 m (faces) out to what a room, a classroom or a
/// street allows.
/// </remarks>
public static class TaskRules
{
    private static readonly TaskRule Spot = new(ReadingTask.SpotReading, ReserveLevel.Spot, Centimetres(5), Centimetres(100), Centimetres(40));
    private static readonly TaskRule Reading = new(ReadingTask.SustainedReading, ReserveLevel.Fluent, Centimetres(5), Centimetres(100), Centimetres(40));
    private static readonly TaskRule Writing = new(ReadingTask.Writing, ReserveLevel.Fluent, Centimetres(10), Centimetres(100), Centimetres(35));
    private static readonly TaskRule Screen = new(ReadingTask.Screen, ReserveLevel.Fluent, Centimetres(10), Centimetres(150), Centimetres(40));
    private static readonly TaskRule Distant = new(ReadingTask.DistanceViewing, null, Metres(1), Metres(100), Metres(3));
    private static readonly TaskRule Television = Distant with { Farthest = Metres(10), Example = Metres(3) };
    private static readonly TaskRule Faces = Distant with { Nearest = Centimetres(50), Farthest = Metres(10), Example = Metres(3) };
    private static readonly TaskRule Whiteboard = Distant with { Farthest = Metres(20), Example = Metres(4) };
    private static readonly TaskRule Signs = Distant with { Farthest = Metres(100), Example = Metres(6) };

    /// <summary>The rule for a kind of reading task.</summary>
    public static TaskRule For(ReadingTask kind) => kind switch
    {
        ReadingTask.SpotReading => Spot,
        ReadingTask.Writing => Writing,
        ReadingTask.Screen => Screen,
        ReadingTask.DistanceViewing => Distant,
        _ => Reading,
    };

    /// <summary>The rule for an everyday task.</summary>
    public static TaskRule For(GoalTask task) => task switch
    {
        GoalTask.MedicationLabels => Spot,
        GoalTask.Phone => Screen,
        GoalTask.Writing => Writing,
        GoalTask.Television => Television,
        GoalTask.Faces => Faces,
        GoalTask.Whiteboard => Whiteboard,
        GoalTask.Signs => Signs,
        _ => Reading,
    };

    /// <summary>
    /// The reserve a plan uses: a ratio the practitioner entered, else a level the practitioner chose, else the task's
    /// default level, each level's ratio taken from the clinic's <paramref name="ratios"/>. Null for distance viewing.
    /// </summary>
    public static ReserveDecision? ReserveFor(ReadingTask kind, ReserveLevel? chosen, AcuityReserve? entered, ReserveRatios ratios)
    {
        ArgumentNullException.ThrowIfNull(ratios);
        var rule = For(kind);
        if (rule.Reserve is not { } usual)
        {
            return null;
        }

        if (entered is { } ratio)
        {
            return new ReserveDecision(ratio, null, ReserveSource.Entered, kind);
        }

        var level = chosen ?? usual;
        return new ReserveDecision(ratios.For(level), level, chosen is null ? ReserveSource.TaskDefault : ReserveSource.Chosen, kind);
    }

    /// <summary>The task kind in plain words, e.g. "sustained reading".</summary>
    public static string Describe(ReadingTask kind) => kind switch
    {
        ReadingTask.SpotReading => "spot reading",
        ReadingTask.Writing => "writing",
        ReadingTask.Screen => "a screen",
        ReadingTask.DistanceViewing => "distance viewing",
        _ => "sustained reading",
    };

    private static Distance Centimetres(double cm) => Distance.FromCentimetres(cm);

    private static Distance Metres(double m) => Distance.FromMetres(m);
}

/// <summary>Where a plan's reserve came from.</summary>
public enum ReserveSource
{
    /// <summary>The task's default level (<see cref="TaskRules"/>).</summary>
    TaskDefault,

    /// <summary>A level the practitioner chose (e.g. 3:1 for long reading).</summary>
    Chosen,

    /// <summary>A ratio the practitioner entered.</summary>
    Entered,
}

/// <summary>The acuity reserve a plan used, and why.</summary>
/// <param name="Reserve">The ratio used.</param>
/// <param name="Level">The level it stands for; null when a ratio was entered.</param>
/// <param name="Source">Where it came from.</param>
/// <param name="Task">The kind of task it was chosen for.</param>
public sealed record ReserveDecision(AcuityReserve Reserve, ReserveLevel? Level, ReserveSource Source, ReadingTask Task)
{
    /// <summary>Why this reserve was used, in plain words with its source (invariant culture).</summary>
    public string Why => FormatWhy(CultureInfo.InvariantCulture);

    /// <summary>Why this reserve was used, with the ratio formatted for <paramref name="provider"/>.</summary>
    public string FormatWhy(IFormatProvider? provider)
    {
        var r = Reserve.ToString(null, provider ?? CultureInfo.CurrentCulture);
        var how = Source switch
        {
            ReserveSource.Entered => "entered by the practitioner",
            ReserveSource.Chosen => "chosen by the practitioner",
            _ => "the usual reserve for " + TaskRules.Describe(Task),
        };
        var basis = Level switch
        {
            ReserveLevel.Spot => Task == ReadingTask.SpotReading
                ? "a short spot task can be done at threshold, so the threshold acuity is used with no reserve and the critical print size (a fluent-reading measure) is not used (common practice; methods §2.3)."
                : "print at the threshold size suits only short spot tasks; for fluent reading 2:1 is usual (common practice; methods §2.3).",
            ReserveLevel.Fluent => "2:1 gives fluent reading for most readers (Cheong, Lovie-Kitchin and Bowers 2002; Latham and Tabrett 2012); choose 3:1 for long or high-speed reading (Whittaker and Lovie-Kitchin 1993).",
            ReserveLevel.Sustained => "3:1 suits long or high-speed reading (Whittaker and Lovie-Kitchin 1993).",
            _ => Task == ReadingTask.SpotReading
                ? "spot tasks still use the threshold acuity, not the critical print size."
                : "the usual reserves are 1:1 for spot tasks, 2:1 for fluent reading and 3:1 for long reading (methods §2.3).",
        };
        return $"Acuity reserve {r}, {how}: {basis}";
    }
}
