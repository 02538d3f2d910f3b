using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// Option 1: bring the page (or the screen) closer, or sit nearer the television or board. Relative distance
/// magnification M = old distance ÷ new distance (Ryan and Margrain 2006): the new distance is 1/F_eq, and focusing
/// there takes 1/new distance dioptres, from accommodation, an uncorrected myope's built-in add, or a modest add. The
/// same rule holds for near and distance tasks: TV at 3 m, 6/60 to 6/12, gives 60 cm and 1.67 D of focusing.
/// </summary>
public sealed record MovingCloserOption : MagnifierOption
{
    /// <inheritdoc/>
    public override OptionKind Kind => OptionKind.MovingCloser;

    /// <summary>The preferred distance the client starts from.</summary>
    public required Distance FromDistance { get; init; }

    /// <summary>Relative distance magnification, preferred distance ÷ new working distance (1 when no move is needed).</summary>
    public required double RelativeMagnification { get; init; }

    /// <summary>True when an uncorrected myope's built-in add is counted (glasses off).</summary>
    public required bool UsesMyopia { get; init; }

    /// <summary>The focusing the new distance takes, 1/new distance (accommodation, myopia or add).</summary>
    public required Power FocusNeeded { get; init; }

    /// <summary>The add needed on top of the client's own focusing, rounded up to 0.25 D (0 D when none).</summary>
    public required Power AddNeeded { get; init; }

    /// <summary>True for a distance task (sitting nearer), false for a page or screen.</summary>
    public required bool DistanceTask { get; init; }

    /// <summary>Where the page would have to come for the full power: 1/F_eq (never farther than the preferred distance).</summary>
    public required Distance NeededDistance { get; init; }

    /// <summary>True when the print is already large enough at the preferred distance (no move needed).</summary>
    public bool AlreadyLargeEnough => RelativeMagnification <= 1.0 + 1e-9;

    /// <summary>Focusing up to this much beyond the client's own needs no add: 0.50 D (common practice; the eye's depth of focus).</summary>
    public const double NoAddUpTo = 0.5;

    /// <summary>Builds the option for a context; <paramref name="distanceTask"/> changes only the wording.</summary>
    public static MovingCloserOption Create(OptionContext context, bool distanceTask)
    {
        ArgumentNullException.ThrowIfNull(context);
        var s = context.Settings;
        var required = context.Required;
        var available = context.UsableAccommodation + context.MyopicBuiltInAdd;
        // New distance w = 1/F_eq, never farther than the preferred distance (the print is then already large enough).
        var focus = Math.Max(required, 1.0 / context.Preferred);
        var needed = OptionContext.Metres(1.0 / focus);
        var shortOf = focus - available;
        // Up to 0.50 D short (2 m or more for a full presbyope) the eye's depth of focus covers it: no add (common practice).
        var add = shortOf > NoAddUpTo ? OptionContext.RoundUpToQuarter(shortOf) : 0;
        var practical = true;
        if (add > s.ModestAddLimit.Dioptres)
        {
            add = s.ModestAddLimit.Dioptres;
            focus = available + add;
            practical = false;
        }

        var delivered = focus;
        var workingDistance = OptionContext.Metres(1.0 / focus);
        var twoEyesOk = context.TwoEyes && OptionContext.Dioptres(focus) <= SpectacleAdd.BinocularLimit;
        return new MovingCloserOption
        {
            RequiredPower = OptionContext.Dioptres(required),
            DeliveredPower = OptionContext.Dioptres(delivered),
            MeetsRequiredPower = context.Meets(delivered),
            IsPractical = practical,
            PracticalNote = practical ? null : OptionNotes.MoreThanModestAdd,
            LensPower = add > 0 ? OptionContext.Dioptres(add) : null,
            Labels = add > 0 ? MagnifierLabel.Readings(OptionContext.Dioptres(add)) : null,
            WorkingDistance = workingDistance,
            DepthOfField = context.DepthOfField(focus),
            Binocular = twoEyesOk ? context.BothEyesAt(workingDistance) : BinocularUse.OneEye,
            AccommodationOrAddNeeded = OptionContext.Dioptres(focus),
            LightAndContrast = distanceTask ? OptionNotes.LightDistance : OptionNotes.LightCloseWork,
            HandsFree = true,
            SuitsTremor = true,
            Posture = distanceTask ? OptionNotes.PostureSitNearer : OptionNotes.PostureCloser,
            Cost = context.Ranges.CostOf(OptionKind.MovingCloser),
            FromDistance = OptionContext.Metres(context.Preferred),
            RelativeMagnification = RelativeDistance.Magnification(OptionContext.Metres(context.Preferred), workingDistance),
            UsesMyopia = context.MyopicBuiltInAdd > 0,
            FocusNeeded = OptionContext.Dioptres(focus),
            AddNeeded = OptionContext.Dioptres(add),
            DistanceTask = distanceTask,
            NeededDistance = needed,
        };
    }

    /// <inheritdoc/>
    protected override string Describe(IFormatProvider provider)
    {
        if (!IsPractical)
        {
            return string.Format(
                provider,
                "{0} would have to come to {1}, which takes {2:0.00} D of focusing: more than the client's own focusing and a modest add give (a {3:+0.00} D add brings it to {4}, {5:0.#} D of the {6:0.#} D needed).",
                DistanceTask ? "The client" : "The page",
                Place(NeededDistance, provider),
                RequiredPower.Dioptres,
                AddNeeded.Dioptres,
                Place(WorkingDistance, provider),
                DeliveredPower.Dioptres,
                RequiredPower.Dioptres);
        }

        var where = AlreadyLargeEnough
            ? string.Format(provider, "{0} at {1}", DistanceTask ? "Stay" : "Keep the page", Place(WorkingDistance, provider))
            : string.Format(provider, "{0} {1} instead of {2}", DistanceTask ? "Sit at" : "Bring the page to", Place(WorkingDistance, provider), Place(FromDistance, provider));
        var focusing = AddNeeded.Dioptres > 0
            ? string.Format(provider, "focusing there takes {0:0.00} D: a {1:+0.00} D add{2}", FocusNeeded.Dioptres, AddNeeded.Dioptres, UsesMyopia ? " with the glasses off" : string.Empty)
            : string.Format(provider, "focusing there takes {0:0.00} D, which the client's own {1} gives without an add", FocusNeeded.Dioptres, UsesMyopia ? "short sight (glasses off)" : "focusing");
        var shortfall = MeetsRequiredPower ? string.Empty : string.Format(provider, "; this gives {0:0.#} D of the {1:0.#} D needed", DeliveredPower.Dioptres, RequiredPower.Dioptres);
        return where + ": " + focusing + shortfall + ".";
    }

    private static string Place(Distance d, IFormatProvider provider) => d.Metres >= 1
        ? string.Format(provider, "{0:0.##} m", d.Metres)
        : string.Format(provider, "{0:0.#} cm", d.Centimetres);
}
