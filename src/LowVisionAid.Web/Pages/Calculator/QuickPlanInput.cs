namespace LowVisionAid.Web.Pages.Calculator;

/// <summary>
/// What the quick calculator (page or API) is given: every measurement as typed, read by the optics core's parsers.
/// Nothing here is stored.
/// </summary>
public sealed class QuickPlanInput
{
    /// <summary>Distance acuity with both eyes or the better eye, e.g. "6/60", "20/200", "logMAR 1.0".</summary>
    public string? DistanceAcuity { get; set; }

    /// <summary>Near acuity: the smallest print read and the distance, e.g. "4M at 40 cm", "N24 at 25 cm".</summary>
    public string? NearAcuity { get; set; }

    /// <summary>The print the client wants to read, e.g. "1M" (newsprint), "N10", "0.8M".</summary>
    public string? TargetPrint { get; set; }

    /// <summary>The distance the client wants to work at, e.g. "25 cm"; for distance viewing, the distance to the screen.</summary>
    public string? WorkingDistance { get; set; }

    /// <summary>
    /// How far above threshold the print should be: UsualForTask (the default, from the optics core's task rule: spot
    /// reading 1:1 on threshold acuity; reading, writing and screens 2:1), Spot (1:1), Fluent (2:1) or Sustained (3:1,
    /// an explicit choice for long or high-speed reading).
    /// </summary>
    public string? Reserve { get; set; } = nameof(ReserveChoice.UsualForTask);

    /// <summary>The task: SpotReading, SustainedReading, Writing, Screen or DistanceViewing.</summary>
    public string? Task { get; set; } = "SustainedReading";

    /// <summary>For distance viewing only: the acuity wanted, e.g. "6/12".</summary>
    public string? GoalDistanceAcuity { get; set; }

    /// <summary>Age in years, used to estimate accommodation; optional.</summary>
    public string? Age { get; set; }

    /// <summary>The client wants both hands free.</summary>
    public bool HandsFree { get; set; }

    /// <summary>The client has a tremor or cannot hold a lens steady.</summary>
    public bool Tremor { get; set; }

    /// <summary>Only one eye has useful vision.</summary>
    public bool OneUsefulEye { get; set; }
}

/// <summary>The acuity reserves offered (methods §2.3: spot 1:1, fluent 2:1, sustained 3:1).</summary>
public enum ReserveChoice
{
    /// <summary>The planner's usual reserve for the task (methods §2.3).</summary>
    UsualForTask,

    /// <summary>1:1, for short spot tasks.</summary>
    Spot,

    /// <summary>2:1, for fluent reading (Cheong, Lovie-Kitchin and Bowers 2002).</summary>
    Fluent,

    /// <summary>3:1, for long or high-speed reading (Whittaker and Lovie-Kitchin 1993); only when chosen.</summary>
    Sustained,
}
