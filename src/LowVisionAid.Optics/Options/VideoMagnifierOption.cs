using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// Option 7: a video magnifier or screen enlargement viewed at the preferred distance: ER = F_eq × d,
/// EVD = d ÷ ER (Bailey 2004 notes), with the characters that fit on one screen line.
/// </summary>
public sealed record VideoMagnifierOption : MagnifierOption
{
    /// <inheritdoc/>
    public override OptionKind Kind => OptionKind.VideoMagnifier;

    /// <summary>Screen enlargement (on-screen letter height ÷ original letter height).</summary>
    public required double Enlargement { get; init; }

    /// <summary>Eye-to-screen viewing distance.</summary>
    public required Distance ViewingDistance { get; init; }

    /// <summary>Screen width assumed (or the kit's).</summary>
    public required Distance ScreenWidth { get; init; }

    /// <summary>Characters of the target print on one screen line.</summary>
    public required double CharactersPerLine { get; init; }

    /// <summary>
    /// The largest useful enlargement on a screen: the enlargement at which only <see cref="DeviceRanges.FewestLettersPerScreenLine"/>
    /// letters of the print still fit on a line, ER = width ÷ (n·k·h_x) (methods §3.6, §4.2), and never above
    /// <see cref="DeviceRanges.StrongestVideoEnlargement"/>.
    /// </summary>
    public static double LargestUsefulEnlargement(OptionContext context, Distance screenWidth)
    {
        ArgumentNullException.ThrowIfNull(context);
        var r = context.Ranges;
        var byLetters = screenWidth.Millimetres / (r.FewestLettersPerScreenLine * context.Settings.CharacterPitch * context.Request.TargetPrint.XHeightMillimetres);
        return Math.Min(r.StrongestVideoEnlargement, byLetters);
    }

    /// <summary>Builds the option at the preferred distance; for a kit device, its largest enlargement caps ER.</summary>
    public static VideoMagnifierOption Create(OptionContext context, double? kitMaximumEnlargement = null, string? kitId = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        var s = context.Settings;
        var viewing = OptionContext.Metres(context.Preferred);
        var needed = Math.Max(1.0, VideoMagnifier.EnlargementNeeded(OptionContext.Dioptres(context.Required), viewing));
        var enlargement = kitMaximumEnlargement is { } max ? Math.Min(needed, max) : needed;
        var feq = VideoMagnifier.EquivalentPower(enlargement, viewing);
        var perLine = VideoMagnifier.CharactersPerLine(s.ScreenWidth, context.Request.TargetPrint, s.CharacterPitch, enlargement);
        var add = context.AddNeededAt(1.0 / context.Preferred);
        var largest = LargestUsefulEnlargement(context, s.ScreenWidth);
        var beyond = kitMaximumEnlargement is null && needed > largest * (1 + 1e-9)
            ? string.Format(System.Globalization.CultureInfo.InvariantCulture, OptionNotes.VideoBeyondRangeFormat, needed, largest)
            : null;
        return new VideoMagnifierOption
        {
            KitDeviceId = kitId,
            RequiredPower = OptionContext.Dioptres(context.Required),
            DeliveredPower = feq,
            MeetsRequiredPower = context.Meets(feq.Dioptres),
            WorkingDistance = viewing,
            LinearField = s.ScreenWidth / enlargement,
            CharactersInView = perLine,
            // The eye focuses on the screen, so its own depth of focus at 1/d applies (methods §4.4 form).
            DepthOfField = context.DepthOfField(1.0 / context.Preferred),
            Binocular = context.TwoEyes ? context.BothEyesAt(viewing) : BinocularUse.OneEye,
            IsPractical = beyond is null,
            PracticalNote = beyond,
            BeyondRange = beyond is not null,
            Cost = context.Ranges.CostOf(OptionKind.VideoMagnifier),
            AccommodationOrAddNeeded = OptionContext.Dioptres(add),
            LightAndContrast = OptionNotes.LightVideo,
            HandsFree = true,
            SuitsTremor = true,
            Posture = OptionNotes.PostureVideo,
            Fluency = context.Fluency(perLine),
            Enlargement = enlargement,
            ViewingDistance = viewing,
            ScreenWidth = s.ScreenWidth,
            CharactersPerLine = perLine,
        };
    }

    /// <inheritdoc/>
    protected override string Describe(IFormatProvider provider) => string.Format(
        provider,
        "Video magnifier at {0:0.0}× viewed from {1:0} cm: {2} per line on a {3:0} cm wide screen.",
        Enlargement,
        ViewingDistance.Centimetres,
        LettersText(LettersInView ?? 0, provider),
        ScreenWidth.Centimetres);
}
