using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// Options 8 and 9: a telescope for television, faces, a board or signs, hand-held or spectacle-mounted (hands-free):
/// magnification from current and goal acuity, its design and length, its field and the focusing needed for the object
/// distance (methods §3.5), within the class's range (<see cref="DeviceRanges"/>). Never while walking; driving rules
/// with aids differ by jurisdiction.
/// </summary>
public sealed record DistanceTelescopeOption : MagnifierOption
{
    /// <summary>Telescope magnifications considered for distance, smallest first (common stock sizes; assumption).</summary>
    public static IReadOnlyList<double> StockMagnifications { get; } = [2.0, 2.5, 3.0, 3.5, 4.0, 6.0, 8.0, 10.0];

    /// <inheritdoc/>
    public override OptionKind Kind => SpectacleMounted ? OptionKind.SpectacleTelescope : OptionKind.DistanceTelescope;

    /// <summary>True for a spectacle-mounted (hands-free) telescope, false for a hand-held one.</summary>
    public bool SpectacleMounted { get; init; }

    /// <summary>Magnification needed: MAR_current ÷ MAR_goal.</summary>
    public required double MagnificationNeeded { get; init; }

    /// <summary>Magnification chosen (or the kit's).</summary>
    public required double Magnification { get; init; }

    /// <summary>Galilean up to 4×, Keplerian above (methods §3.5).</summary>
    public required TelescopeDesign Design { get; init; }

    /// <summary>Tube length with the plan's assumed objective.</summary>
    public required Distance Length { get; init; }

    /// <summary>Real angular field.</summary>
    public required VisualAngle RealField { get; init; }

    /// <summary>The object distance (the preferred viewing distance).</summary>
    public required Distance ObjectDistance { get; init; }

    /// <summary>Extra focusing needed at the eye for that object with the telescope set for infinity: −L′/(1 − eL′).</summary>
    public required Power FocusForObject { get; init; }

    /// <summary>
    /// Builds the option; <paramref name="kitMagnification"/> replaces the stock choice for a kit device. Hand-held
    /// telescopes go to <see cref="DeviceRanges.StrongestHandHeldTelescope"/>, spectacle-mounted ones to
    /// <see cref="DeviceRanges.StrongestSpectacleTelescope"/>; both eyes only when spectacle-mounted and at most
    /// <see cref="DeviceRanges.StrongestBinocularTelescope"/> (methods §11).
    /// </summary>
    public static DistanceTelescopeOption Create(OptionContext context, Acuity current, Acuity goal, double? kitMagnification = null, VisualAngle? statedField = null, string? kitId = null, bool spectacleMounted = false)
    {
        ArgumentNullException.ThrowIfNull(context);
        var s = context.Settings;
        var needed = Telescope.MagnificationFor(current, goal);
        var strongest = spectacleMounted ? context.Ranges.StrongestSpectacleTelescope : context.Ranges.StrongestHandHeldTelescope;
        var m = kitMagnification ?? strongest;
        if (kitMagnification is null)
        {
            foreach (var stock in StockMagnifications)
            {
                if (stock >= needed * s.PowerTolerance && stock <= strongest)
                {
                    m = stock;
                    break;
                }
            }
        }

        var design = m <= Telescope.GalileanPracticalLimit ? TelescopeDesign.Galilean : TelescopeDesign.Keplerian;
        var telescope = Telescope.ForMagnification(m, design, s.TelescopeObjective);
        var d = context.Preferred;
        var objectDistance = OptionContext.Metres(d);
        var real = statedField ?? telescope.RealField(s.TelescopeApparentField);
        // Angular magnification seen as an equivalent viewing distance: EVD = d/M, so F_eq = M/d (Bailey)
        var delivered = m / d;
        var required = needed / d;
        // Depth of field in object space: the eye's blur tolerance shrinks by M² through the telescope (derived, L′ ≈ M²L)
        var depth = OptionContext.DepthOfField(1.0 / d, s.BlurTolerance.Dioptres / (m * m));
        var beyond = kitMagnification is null
            ? DeviceRanges.Beyond(spectacleMounted ? "A spectacle-mounted telescope" : "A hand-held telescope", needed, strongest, "×")
            : null;
        var practical = beyond is null;
        var bothEyes = spectacleMounted && context.TwoEyes && m <= context.Ranges.StrongestBinocularTelescope + 1e-9;
        return new DistanceTelescopeOption
        {
            KitDeviceId = kitId,
            RequiredPower = OptionContext.Dioptres(required),
            DeliveredPower = OptionContext.Dioptres(delivered),
            MeetsRequiredPower = context.Meets(delivered, required),
            IsPractical = practical,
            PracticalNote = beyond,
            BeyondRange = beyond is not null,
            SpectacleMounted = spectacleMounted,
            Cost = context.Ranges.CostOf(spectacleMounted ? OptionKind.SpectacleTelescope : OptionKind.DistanceTelescope),
            WorkingDistance = objectDistance,
            EyeToLens = s.TelescopeEyeRelief,
            LinearField = FieldOfView.LinearFieldOfAngle(real, objectDistance),
            DepthOfField = depth,
            Binocular = bothEyes ? context.BothEyesAt(objectDistance) : BinocularUse.OneEye,
            AccommodationOrAddNeeded = telescope.FocusDemandAtEye(objectDistance, s.TelescopeEyeRelief),
            LightAndContrast = OptionNotes.LightDistance,
            HandsFree = spectacleMounted,
            SuitsTremor = spectacleMounted,
            Posture = spectacleMounted ? OptionNotes.PostureSpectacleTelescope : OptionNotes.PostureDistanceTelescope,
            MagnificationNeeded = needed,
            Magnification = m,
            Design = design,
            Length = telescope.Length,
            RealField = real,
            ObjectDistance = objectDistance,
            FocusForObject = telescope.FocusDemandAtEye(objectDistance, s.TelescopeEyeRelief),
        };
    }

    /// <inheritdoc/>
    protected override string Describe(IFormatProvider provider) => string.Format(
        provider,
        "{0} {1} telescope {2:0.#}× ({3:0.0} cm long){7}, field about {4:0.0}°: focus it for {6:0.##} m ({5:+0.00} D from its far setting). Never use it while walking.",
        SpectacleMounted ? "Spectacle-mounted" : "Hand-held",
        Design == TelescopeDesign.Galilean ? "Galilean" : "Keplerian",
        Magnification,
        Length.Centimetres,
        RealField.Degrees,
        FocusForObject.Dioptres,
        ObjectDistance.Metres,
        Binocular.Feasible ? ", one for each eye" : ", for one eye");
}
