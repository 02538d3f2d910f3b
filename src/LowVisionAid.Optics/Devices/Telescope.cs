using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>The two afocal telescope designs.</summary>
public enum TelescopeDesign
{
    /// <summary>Minus eyepiece: erect image, shorter and lighter, usually up to about 4×.</summary>
    Galilean = 1,

    /// <summary>Plus eyepiece: inverted image (needs an erecting prism), longer, wider range of powers.</summary>
    Keplerian = 2,
}

/// <summary>An afocal telescope from its objective and eyepiece powers (methods §3.5). Immutable.</summary>
public sealed record Telescope
{
    private Telescope(Power objective, Power eyepiece)
    {
        Objective = objective;
        Eyepiece = eyepiece;
    }

    /// <summary>The largest magnification treated as practical for a Galilean design (methods §3.5: usually ≤ about 4×).</summary>
    public const double GalileanPracticalLimit = 4.0;

    /// <summary>Objective power F_o (positive).</summary>
    public Power Objective { get; }

    /// <summary>Eyepiece power F_e (negative for Galilean, positive for Keplerian).</summary>
    public Power Eyepiece { get; }

    /// <summary>Signed angular magnification M = −F_e/F_o (positive erect, negative inverted).</summary>
    public double Magnification => -Eyepiece.Dioptres / Objective.Dioptres;

    /// <summary>The design implied by the eyepiece sign.</summary>
    public TelescopeDesign Design => Eyepiece.Dioptres < 0 ? TelescopeDesign.Galilean : TelescopeDesign.Keplerian;

    /// <summary>Tube length d = f_o + f_e = 1/F_o + 1/F_e.</summary>
    public Distance Length => Distance.FromMetres((1.0 / Objective.Dioptres) + (1.0 / Eyepiece.Dioptres));

    /// <summary>A telescope from its lens powers: the objective must be plus; the eyepiece stronger than the objective.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The powers do not make a magnifying afocal telescope.</exception>
    public static Telescope FromLensPowers(Power objective, Power eyepiece)
    {
        if (!(objective.Dioptres > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(objective), objective.Dioptres, "The objective must be a plus lens, e.g. +10 D.");
        }

        if (!(Math.Abs(eyepiece.Dioptres) > objective.Dioptres))
        {
            throw new ArgumentOutOfRangeException(nameof(eyepiece), eyepiece.Dioptres, "The eyepiece must be stronger than the objective (e.g. −30 D or +40 D with a +10 D objective).");
        }

        return new(objective, eyepiece);
    }

    /// <summary>
    /// A telescope of magnification |M| in a design with a given objective: Galilean F_e = −|M|·F_o, Keplerian
    /// F_e = +|M|·F_o (from M = −F_e/F_o).
    /// </summary>
    public static Telescope ForMagnification(double magnitude, TelescopeDesign design, Power objective)
    {
        if (!(double.IsFinite(magnitude) && magnitude > 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(magnitude), magnitude, "A telescope magnification must be greater than 1, e.g. 3 for 3×.");
        }

        var sign = design == TelescopeDesign.Galilean ? -1.0 : 1.0;
        return FromLensPowers(objective, Power.FromDioptres(sign * magnitude * objective.Dioptres));
    }

    /// <summary>
    /// The magnification needed to bring current acuity to a goal: MAR_current / MAR_goal (angular magnification
    /// scales the angle; methods §2.7).
    /// </summary>
    public static double MagnificationFor(Acuity current, Acuity goal) => current.MarArcminutes / goal.MarArcminutes;

    /// <summary>
    /// Exit vergence at the eyepiece for an object at <paramref name="objectDistance"/> in front of the objective:
    /// L′ = M²L / (1 − M·d·L), with M signed (derived; exact paraxial result for an afocal system, methods §3.5).
    /// </summary>
    public Power ExitVergence(Distance objectDistance)
    {
        var l = -1.0 / PositiveDistance(objectDistance);
        var m = Magnification;
        // L′ = M²L / (1 − M d L) (derived, methods §3.5)
        return Power.FromDioptres(m * m * l / (1.0 - (m * Length.Metres * l)));
    }

    /// <summary>
    /// The extra focusing (accommodation, or eyepiece lengthening) needed at the eye for a near object:
    /// −L′/(1 − e·L′) for eye relief e, returned as a positive power (methods §3.5).
    /// </summary>
    public Power FocusDemandAtEye(Distance objectDistance, Distance eyeRelief)
    {
        var exit = ExitVergence(objectDistance).Dioptres;
        // Vergence at the eye: L′/(1 − e L′) (vergence transfer)
        return Power.FromDioptres(-exit / (1.0 - (eyeRelief.Abs().Metres * exit)));
    }

    /// <summary>Real angular field ≈ apparent field ÷ |M| (common approximation, methods §3.5).</summary>
    public VisualAngle RealField(VisualAngle apparentField) => VisualAngle.FromArcminutes(apparentField.Arcminutes / Math.Abs(Magnification));

    private static double PositiveDistance(Distance d) => d.Metres > 0
        ? d.Metres
        : throw new ArgumentOutOfRangeException(nameof(d), d.Metres, "The object distance must be greater than zero, e.g. 3 m.");
}

/// <summary>Telemicroscopes: a telescope with a reading cap, or a focusable telescope (methods §3.5).</summary>
public static class Telemicroscope
{
    /// <summary>Working distance w = 1/F_cap (page at the cap's focal point).</summary>
    public static Distance WorkingDistance(Power readingCap) => Distance.FromMetres(1.0 / PositiveCap(readingCap));

    /// <summary>F_eq = M × F_cap (standard; derived, methods §3.5, CV-22).</summary>
    public static Power EquivalentPower(double magnification, Power readingCap) =>
        // Telemicroscope: Feq = M × Fcap (methods §3.5)
        Power.FromDioptres(Math.Abs(magnification) * PositiveCap(readingCap));

    /// <summary>EVD = 1/(M·F_cap).</summary>
    public static Distance EquivalentViewingDistance(double magnification, Power readingCap) =>
        Distance.FromMetres(1.0 / EquivalentPower(magnification, readingCap).Dioptres);

    /// <summary>
    /// A focusable telescope focused at <paramref name="focusDistance"/> from its objective of focal length f_o:
    /// F_eq = |M| / (w − f_o) (derived: the objective images the page at f_o·w/(w − f_o), which the eyepiece collimates).
    /// </summary>
    public static Power FocusableEquivalentPower(double magnification, Distance objectiveFocalLength, Distance focusDistance)
    {
        var gap = focusDistance.Metres - objectiveFocalLength.Metres;
        return gap > 0
            ? Power.FromDioptres(Math.Abs(magnification) / gap) // Feq = M/(w − f_o) (derived, methods §3.5)
            : throw new ArgumentOutOfRangeException(nameof(focusDistance), focusDistance.Metres, "The focus distance must be farther than the objective's focal length.");
    }

    private static double PositiveCap(Power cap) => cap.Dioptres > 0
        ? cap.Dioptres
        : throw new ArgumentOutOfRangeException(nameof(cap), cap.Dioptres, "A reading cap must be a plus lens, e.g. +4 D.");
}
