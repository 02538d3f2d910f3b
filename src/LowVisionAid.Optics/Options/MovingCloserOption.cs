using System.Globalization;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// Option 1: bring the page (or the screen, or sit nearer the television) closer. Relative distance magnification
/// M = old distance ÷ new distance (Ryan and Margrain 2006), focused by accommodation, an uncorrected myope's
/// built-in add, or a modest add.
/// </summary>
public sealed record MovingCloserOption : MagnifierOption
{
    /// <inheritdoc/>
    public override OptionKind Kind => OptionKind.MovingCloser;

    /// <summary>The preferred distance the client starts from.</summary>
    public required Distance FromDistance { get; init; }

    /// <summary>Relative distance magnification, preferred distance ÷ new working distance.</summary>
    public required double RelativeMagnification { get; init; }

    /// <summary>True when an uncorrected myope's built-in add is counted (glasses off).</summary>
    public required bool UsesMyopia { get; init; }

    /// <summary>Builds the option for a context (near tasks: focus needed = 1/w; distance tasks: no add).</summary>
    public static MovingCloserOption Create(OptionContext context, bool distanceTask)
    {
        ArgumentNullException.ThrowIfNull(context);
        var s = context.Settings;
        var required = context.Required;
        double delivered;
        double add;
        var practical = true;
        if (distanceTask)
        {
            // Sitting nearer needs no add beyond the eye's own focusing at a metre or more.
            delivered = required;
            add = 0;
        }
        else
        {
            var available = context.UsableAccommodation + context.MyopicBuiltInAdd;
            add = OptionContext.RoundUpToQuarter(Math.Max(0, required - available));
            if (add > s.ModestAddLimit.Dioptres)
            {
                add = s.ModestAddLimit.Dioptres;
                practical = false;
            }

            delivered = Math.Min(required, available + add);
        }

        var working = 1.0 / delivered;
        var workingDistance = OptionContext.Metres(working);
        var pd = context.Constraints.InterpupillaryDistance;
        var twoEyesOk = context.TwoEyes && delivered <= SpectacleAdd.BinocularLimit.Dioptres;
        var convergence = !twoEyesOk ? 0 : add > 0 ? Convergence.AtSpectaclePlane(pd, workingDistance) : Convergence.FromCentresOfRotation(pd, workingDistance);
        return new MovingCloserOption
        {
            RequiredPower = OptionContext.Dioptres(required),
            DeliveredPower = OptionContext.Dioptres(delivered),
            MeetsRequiredPower = context.Meets(delivered),
            IsPractical = practical,
            PracticalNote = practical ? null : Texts.MoreThanModestAdd,
            LensPower = add > 0 ? OptionContext.Dioptres(add) : null,
            Labels = add > 0 ? MagnifierLabel.Readings(OptionContext.Dioptres(add)) : null,
            WorkingDistance = workingDistance,
            DepthOfField = context.DepthOfField(delivered),
            Binocular = new BinocularUse(twoEyesOk, convergence, null),
            AccommodationOrAddNeeded = OptionContext.Dioptres(add > 0 || distanceTask ? add : delivered),
            LightAndContrast = distanceTask ? Texts.LightDistance : Texts.LightCloseWork,
            HandsFree = true,
            SuitsTremor = true,
            Posture = distanceTask ? Texts.PostureSitNearer : Texts.PostureCloser,
            FromDistance = OptionContext.Metres(context.Preferred),
            RelativeMagnification = RelativeDistance.Magnification(OptionContext.Metres(context.Preferred), workingDistance),
            UsesMyopia = !distanceTask && context.MyopicBuiltInAdd > 0,
        };
    }

    /// <inheritdoc/>
    public override string Summary(IFormatProvider provider) => LensPower is { } add
        ? string.Format(provider, "Move closer: work at {0:0.0} cm ({1:0.0}× nearer) with a {2:+0.00} D add.", WorkingDistance.Centimetres, RelativeMagnification, add.Dioptres)
        : string.Format(provider, "Move closer: work at {0:0.0} cm ({1:0.0}× nearer), no add needed.", WorkingDistance.Centimetres, RelativeMagnification);
}
