using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// Option 3: a spectacle-mounted high add, for both eyes with base-in prism in each lens or for the better eye
/// (methods §3.2), within the strongest add usually made (<see cref="DeviceRanges.StrongestSpectacleAdd"/>).
/// </summary>
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
        var beyond = kitAdd is null ? DeviceRanges.Beyond("An add", add, context.Ranges.StrongestSpectacleAdd.Dioptres, " D") : null;
        var field = FieldOfView.LinearField(s.SpectacleLensAperture, FieldOfView.EntrancePupilBehindSpectacles, OptionContext.Dioptres(delivered));
        var characters = context.Characters(field);
        return new SpectacleAddOption
        {
            KitDeviceId = kitId,
            IsApplicable = kitAdd is not null || needed > 0,
            NotApplicableBecause = kitAdd is not null || needed > 0 ? null : OptionNotes.AccommodationAloneIsEnough,
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
            IsPractical = beyond is null,
            PracticalNote = beyond,
            BeyondRange = beyond is not null,
            Cost = context.Ranges.CostOf(OptionKind.SpectacleAdd),
            Binocular = binocular
                ? context.BothEyesAt(working, SpectacleAdd.BaseInPrismEachEye(addPower))
                : BinocularUse.OneEye,
            AccommodationOrAddNeeded = addPower,
            LightAndContrast = OptionNotes.LightSpectacleAdd,
            HandsFree = true,
            SuitsTremor = true,
            Posture = OptionNotes.PostureSpectacleAdd,
            Fluency = context.Fluency(characters),
            Aberrations = AberrationNotes.For(addPower),
            Add = addPower,
            NearLensPower = SpectacleAdd.NearLensPower(context.Constraints.DistanceRefraction, addPower),
            TooStrongForBothEyes = context.TwoEyes && !binocular,
        };
    }

    /// <summary>True when the client has two useful eyes but the add is too strong for both (see <see cref="SpectacleAdd.BinocularLimit"/>).</summary>
    public bool TooStrongForBothEyes { get; init; }

    /// <inheritdoc/>
    protected override string Describe(IFormatProvider provider) => Binocular.Feasible
        ? string.Format(provider, "Reading spectacles {0:+0.00} D for both eyes, {1:0.#} Δ base-in in each lens (convergence left after the prism {2:0.#} Δ): page at {3:0.0} cm.", Add.Dioptres, Binocular.BaseInPrismEachEye, Binocular.ResidualConvergence, WorkingDistance.Centimetres)
        : TooStrongForBothEyes
            ? string.Format(provider, "Reading spectacles {0:+0.00} D for the better eye only (too strong for both eyes; the other eye occluded or fogged): page at {1:0.0} cm.", Add.Dioptres, WorkingDistance.Centimetres)
            : string.Format(provider, "Reading spectacles {0:+0.00} D for the useful eye: page at {1:0.0} cm.", Add.Dioptres, WorkingDistance.Centimetres);
}
