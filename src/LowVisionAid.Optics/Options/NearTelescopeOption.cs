using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// Option 6: a telemicroscope, a telescope with a reading cap; F_eq = M × F_cap, working distance 1/F_cap, depth of
/// field the same as a spectacle add of equal F_eq (methods §3.5).
/// </summary>
public sealed record NearTelescopeOption : MagnifierOption
{
    /// <summary>Telescope magnifications considered for near, smallest first (common stock sizes; assumption).</summary>
    public static IReadOnlyList<double> StockMagnifications { get; } = [2.0, 2.5, 3.0, 4.0, 6.0, 8.0];

    /// <inheritdoc/>
    public override OptionKind Kind => OptionKind.NearTelescope;

    /// <summary>Telescope magnification.</summary>
    public required double Magnification { get; init; }

    /// <summary>Reading cap power.</summary>
    public required Power ReadingCap { get; init; }

    /// <summary>Real angular field (apparent field ÷ M, or the kit's stated field).</summary>
    public required VisualAngle RealField { get; init; }

    /// <summary>The strongest reading cap considered: +10 D, a 10 cm working distance (common practice).</summary>
    public const double StrongestReadingCap = 10;

    /// <summary>
    /// Chooses the smallest stock magnification with M ≥ F_eq × preferred distance, up to the strongest near telescope
    /// (<see cref="DeviceRanges.StrongestNearTelescope"/>), then the cap F_eq/M (rounded up to 0.25 D), so the working
    /// distance is at least the preferred one where the range allows. Beyond the strongest telescope with the strongest
    /// cap the option is not practical.
    /// </summary>
    public static NearTelescopeOption Create(OptionContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var wanted = context.Required * context.Preferred;
        var strongest = context.Ranges.StrongestNearTelescope;
        var m = strongest;
        foreach (var stock in StockMagnifications)
        {
            if (stock >= wanted * context.Settings.PowerTolerance && stock <= strongest)
            {
                m = stock;
                break;
            }
        }

        var cap = OptionContext.RoundUpToQuarter(context.Required / m);
        var option = ForTelescope(context, m, OptionContext.Dioptres(cap), null, null);
        var beyond = DeviceRanges.Beyond("A near telescope", context.Required, strongest * StrongestReadingCap, " D");
        return beyond is null ? option : option with { IsPractical = false, PracticalNote = beyond, BeyondRange = true };
    }

    /// <summary>The figures for a given telescope and cap (a kit device, or a chosen one).</summary>
    public static NearTelescopeOption ForTelescope(OptionContext context, double magnification, Power readingCap, VisualAngle? statedField, string? kitId)
    {
        ArgumentNullException.ThrowIfNull(context);
        var s = context.Settings;
        var feq = Telemicroscope.EquivalentPower(magnification, readingCap);
        var working = Telemicroscope.WorkingDistance(readingCap);
        // Real field ≈ apparent field ÷ |M| (common approximation, methods §3.5)
        var real = statedField ?? VisualAngle.FromArcminutes(s.TelescopeApparentField.Arcminutes / magnification);
        var field = FieldOfView.LinearFieldOfAngle(real, working);
        var characters = context.Characters(field);
        return new NearTelescopeOption
        {
            KitDeviceId = kitId,
            RequiredPower = OptionContext.Dioptres(context.Required),
            DeliveredPower = feq,
            MeetsRequiredPower = context.Meets(feq.Dioptres),
            LensPower = readingCap,
            WorkingDistance = working,
            EyeToLens = s.TelescopeEyeRelief,
            LinearField = field,
            CharactersInView = characters,
            DepthOfField = context.DepthOfField(feq.Dioptres),
            // Both eyes only when spectacle-mounted, low power and converged for the working distance (methods §11).
            Binocular = context.TwoEyes && magnification <= context.Ranges.StrongestBinocularTelescope + 1e-9
                ? context.BothEyesAt(working)
                : BinocularUse.OneEye,
            Cost = context.Ranges.CostOf(OptionKind.NearTelescope),
            AccommodationOrAddNeeded = Power.Zero,
            LightAndContrast = OptionNotes.LightNearTelescope,
            HandsFree = true,
            SuitsTremor = true,
            Posture = OptionNotes.PostureNearTelescope,
            Fluency = context.Fluency(characters),
            Magnification = magnification,
            ReadingCap = readingCap,
            RealField = real,
        };
    }

    /// <inheritdoc/>
    protected override string Describe(IFormatProvider provider) => string.Format(
        provider,
        "Near telescope {0:0.#}× with a {1:+0.00} D reading cap, {4}: page at {2:0.0} cm, {3} in view.",
        Magnification,
        ReadingCap.Dioptres,
        WorkingDistance.Centimetres,
        LettersText(LettersInView ?? 0, provider),
        Binocular.Feasible ? "a pair converged for the page" : "for one eye");
}
