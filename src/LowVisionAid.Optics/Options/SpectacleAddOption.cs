using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>Option 3: a spectacle-mounted high add, for both eyes with base-in prism or for the better eye (methods §3.2).</summary>
public sealed record SpectacleAddOption : MagnifierOption
{
    /// <inheritdoc/>
    public override OptionKind Kind => OptionKind.SpectacleAdd;

    /// <summary>The add.</summary>
    public required Power Add { get; init; }

    /// <summary>Total near lens power: distance refraction + add.</summary>
    public required Power NearLensPower { get; init; }

    /// <summary>True when fitted to one eye (the other occluded or fogged).</summary>
    public bool OneEyeOnly => !Binocular.Feasible;

    /// <summary>Builds the option for a context, or for a kit add of given power.</summary>
    public static SpectacleAddOption Create(OptionContext context, Power? kitAdd = null, string? kitId = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        var s = context.Settings;
        var needed = context.Required - context.UsableAccommodation;
        var add = kitAdd?.Dioptres ?? OptionContext.RoundUpToQuarter(Math.Max(needed, 0.25));
        // Accommodation in use tops the add up to the required power, never beyond what is usable (methods §3.2)
        var accommodation = Math.Clamp(context.Required - add, 0, context.UsableAccommodation);
        var delivered = add + accommodation;
        var working = SpectacleAdd.WorkingDistance(OptionContext.Dioptres(add), OptionContext.Dioptres(accommodation));
        var addPower = OptionContext.Dioptres(add);
        var binocular = context.TwoEyes && SpectacleAdd.BinocularUsuallyPossible(addPower);
        var field = FieldOfView.LinearField(s.SpectacleLensAperture, FieldOfView.EntrancePupilBehindSpectacles, OptionContext.Dioptres(delivered));
        var characters = context.Characters(field);
        return new SpectacleAddOption
        {
            KitDeviceId = kitId,
            IsApplicable = kitAdd is not null || needed > 0,
            NotApplicableBecause = kitAdd is not null || needed > 0 ? null : Texts.AccommodationAloneIsEnough,
            RequiredPower = OptionContext.Dioptres(context.Required),
            DeliveredPower = OptionContext.Dioptres(delivered),
            MeetsRequiredPower = context.Meets(delivered),
            LensPower = addPower,
            Labels = MagnifierLabel.Readings(addPower),
            WorkingDistance = working,
            EyeToLens = Distance.Zero,
            LinearField = field,
            CharactersInView = characters,
            DepthOfField = context.DepthOfField(delivered),
            Binocular = binocular
                ? new BinocularUse(true, Convergence.AtSpectaclePlane(context.Constraints.InterpupillaryDistance, working), SpectacleAdd.BaseInPrismRule(addPower))
                : new BinocularUse(false, 0, null),
            AccommodationOrAddNeeded = addPower,
            LightAndContrast = Texts.LightSpectacleAdd,
            HandsFree = true,
            SuitsTremor = true,
            Posture = Texts.PostureSpectacleAdd,
            Fluency = context.Fluency(characters),
            Aberrations = AberrationNotes.For(addPower),
            Add = addPower,
            NearLensPower = SpectacleAdd.NearLensPower(context.Constraints.DistanceRefraction, addPower),
        };
    }

    /// <inheritdoc/>
    public override string Summary(IFormatProvider provider) => Binocular.Feasible
        ? string.Format(provider, "Reading spectacles {0:+0.00} D for both eyes with about {1:0} Δ base-in: page at {2:0.0} cm.", Add.Dioptres, Binocular.BaseInPrismRule, WorkingDistance.Centimetres)
        : string.Format(provider, "Reading spectacles {0:+0.00} D for the better eye only: page at {1:0.0} cm.", Add.Dioptres, WorkingDistance.Centimetres);
}
