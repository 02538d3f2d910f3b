using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// Option 2: enlarge the print itself and read it at the preferred distance (relative size magnification,
/// M = new size ÷ old size; Ryan and Margrain 2006).
/// </summary>
public sealed record LargePrintOption : MagnifierOption
{
    /// <summary>The practical limit of relative size magnification: about 2 to 2.5× (Ryan and Margrain 2006); 2.5 is used.</summary>
    public const double UsualLargePrintLimit = 2.5;

    /// <inheritdoc/>
    public override OptionKind Kind => OptionKind.LargePrint;

    /// <summary>The print size needed at the preferred distance.</summary>
    public required PrintSize PrintNeeded { get; init; }

    /// <summary>Approximate point size of that print with an x-height ratio of 0.50 (1M ≈ 8 pt convention).</summary>
    public required double ApproximatePoints { get; init; }

    /// <summary>Enlargement over the target print (1 when the target print is already large enough).</summary>
    public required double SizeRatio { get; init; }

    /// <summary>True when the enlargement is within usual large-print sizes (at most <see cref="UsualLargePrintLimit"/>).</summary>
    public bool WithinUsualLargePrint => SizeRatio <= UsualLargePrintLimit;

    /// <summary>Builds the option: ratio = F_eq × d (so that EVD = d/ratio = 1/F_eq; methods §2.7 combined magnification).</summary>
    public static LargePrintOption Create(OptionContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var d = context.Preferred;
        // Relative size: EVD = d ÷ ratio, so ratio = F_eq × d (Bailey; methods §2.7)
        var ratio = Math.Max(1.0, context.Required * d);
        var print = context.Request.TargetPrint.Scale(ratio);
        var delivered = ratio / d;
        var add = context.AddNeededAt(1.0 / d);
        return new LargePrintOption
        {
            RequiredPower = OptionContext.Dioptres(context.Required),
            DeliveredPower = OptionContext.Dioptres(delivered),
            MeetsRequiredPower = context.Meets(delivered),
            IsPractical = ratio <= UsualLargePrintLimit,
            PracticalNote = ratio <= UsualLargePrintLimit ? null : OptionNotes.BeyondUsualLargePrint,
            WorkingDistance = OptionContext.Metres(d),
            DepthOfField = context.DepthOfField(1.0 / d),
            Binocular = context.TwoEyes ? context.BothEyesAt(OptionContext.Metres(d)) : BinocularUse.OneEye,
            Cost = context.Ranges.CostOf(OptionKind.LargePrint),
            AccommodationOrAddNeeded = OptionContext.Dioptres(add > 0 ? add : 1.0 / d),
            LightAndContrast = OptionNotes.LightLargePrint,
            HandsFree = true,
            SuitsTremor = true,
            Posture = OptionNotes.PostureLargePrint,
            PrintNeeded = print,
            ApproximatePoints = print.ToPoints(XHeightRatio.Conventional),
            SizeRatio = ratio,
        };
    }

    /// <inheritdoc/>
    protected override string Describe(IFormatProvider provider) => string.Format(
        provider,
        "Large print: {0:0.0}M (about {1:0} pt), {2:0.0}× the target, read at {3:0} cm{4}.",
        PrintNeeded.M,
        ApproximatePoints,
        SizeRatio,
        WorkingDistance.Centimetres,
        WithinUsualLargePrint ? string.Empty : "; larger than usual large print");
}
