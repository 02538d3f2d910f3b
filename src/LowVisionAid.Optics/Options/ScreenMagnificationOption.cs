using System.Globalization;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>The kind of screen a screen task is read on, taken from the viewing distance (<see cref="DeviceRanges"/>).</summary>
public enum ScreenKind
{
    /// <summary>A phone.</summary>
    Phone = 1,

    /// <summary>A tablet.</summary>
    Tablet = 2,

    /// <summary>A computer monitor.</summary>
    Computer = 3,
}

/// <summary>
/// Option 10 (screen tasks): the text size or zoom built into the phone, tablet or computer. Zoom = F_eq × d (relative
/// size, methods §2.7, as for large print), and the text size in CSS pixels that gives the needed angular x-height,
/// h_x·F_eq, with the W3C reference pixel (0.0213°). Reversed polarity is advised where contrast or light is poor.
/// </summary>
public sealed record ScreenMagnificationOption : MagnifierOption
{
    /// <inheritdoc/>
    public override OptionKind Kind => OptionKind.ScreenMagnification;

    /// <summary>The screen the viewing distance suggests.</summary>
    public required ScreenKind Screen { get; init; }

    /// <summary>The screen width used for letters per line.</summary>
    public required Distance ScreenWidth { get; init; }

    /// <summary>The zoom or text size wanted, per cent of the text as it is now.</summary>
    public required double ZoomPercent { get; init; }

    /// <summary>The x-height wanted on the screen in CSS pixels.</summary>
    public required double XHeightPixels { get; init; }

    /// <summary>The font size wanted in CSS pixels (x-height ratio 0.50).</summary>
    public required double FontSizePixels { get; init; }

    /// <summary>True when reversed polarity (light text on dark) is advised: contrast sensitivity or lighting is poor.</summary>
    public required bool ReversedPolarityAdvised { get; init; }

    /// <summary>The screen for a viewing distance: phone below 35 cm, tablet below 50 cm, else a computer (common practice).</summary>
    public static (ScreenKind Kind, Distance Width) ScreenFor(OptionContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var r = context.Ranges;
        var d = Distance.FromMetres(context.Preferred);
        return d < r.PhoneBelow ? (ScreenKind.Phone, r.PhoneScreenWidth)
            : d < r.TabletBelow ? (ScreenKind.Tablet, r.TabletScreenWidth)
            : (ScreenKind.Computer, context.Settings.ScreenWidth);
    }

    /// <summary>Builds the option for a screen task at the preferred viewing distance.</summary>
    public static ScreenMagnificationOption Create(OptionContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var d = context.Preferred;
        // Relative size on the screen: EVD = d ÷ ratio, so ratio = F_eq × d (Bailey; methods §2.7)
        var ratio = Math.Max(1.0, context.Required * d);
        var (screen, width) = ScreenFor(context);
        var perLine = VideoMagnifier.CharactersPerLine(width, context.Request.TargetPrint, context.Settings.CharacterPitch, ratio);
        // Angular x-height wanted: the target's angle at d times the ratio
        var angle = VisualAngle.FromDegrees(context.Request.TargetPrint.AngleAt(Distance.FromMetres(d)).Degrees * ratio);
        var xPixels = ScreenText.XHeightPixels(angle);
        var reversed = context.WantsLight;
        var beyond = perLine < context.Ranges.FewestLettersPerScreenLine
            ? string.Format(CultureInfo.InvariantCulture, OptionNotes.ScreenBeyondRangeFormat, ratio * 100)
            : null;
        var delivered = ratio / d;
        return new ScreenMagnificationOption
        {
            RequiredPower = OptionContext.Dioptres(context.Required),
            DeliveredPower = OptionContext.Dioptres(delivered),
            MeetsRequiredPower = context.Meets(delivered),
            IsPractical = beyond is null,
            PracticalNote = beyond,
            BeyondRange = beyond is not null,
            WorkingDistance = OptionContext.Metres(d),
            LinearField = width / ratio,
            CharactersInView = perLine,
            DepthOfField = context.DepthOfField(1.0 / d),
            Binocular = context.TwoEyes ? context.BothEyesAt(OptionContext.Metres(d)) : BinocularUse.OneEye,
            AccommodationOrAddNeeded = OptionContext.Dioptres(context.AddNeededAt(1.0 / d)),
            LightAndContrast = reversed ? OptionNotes.LightScreenReversed : OptionNotes.LightScreen,
            HandsFree = screen != ScreenKind.Phone,
            SuitsTremor = true,
            Posture = OptionNotes.PostureScreen,
            Fluency = context.Fluency(perLine),
            Cost = context.Ranges.CostOf(OptionKind.ScreenMagnification),
            Screen = screen,
            ScreenWidth = width,
            ZoomPercent = ratio * 100,
            XHeightPixels = xPixels,
            FontSizePixels = ScreenText.FontSizePixels(xPixels, XHeightRatio.Conventional),
            ReversedPolarityAdvised = reversed,
        };
    }

    /// <inheritdoc/>
    protected override string Describe(IFormatProvider provider) => string.Format(
        provider,
        "Built-in {0} zoom or text size of about {1:0} % (text about {2:0} px, x-height {3:0} px) at {4:0} cm: {5} per line{6}.",
        Screen switch { ScreenKind.Phone => "phone", ScreenKind.Tablet => "tablet", _ => "computer" },
        ZoomPercent,
        FontSizePixels,
        XHeightPixels,
        WorkingDistance.Centimetres,
        LettersText(LettersInView ?? 0, provider),
        ReversedPolarityAdvised ? "; turn on reversed polarity (light text on dark)" : string.Empty);
}
