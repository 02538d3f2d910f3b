using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>
/// The conventions behind a magnifier's "×" label. A "×" alone never identifies a power: the convention and its
/// reference distance must be known (Brown and Siemsen 2008).
/// </summary>
public enum LabelConvention
{
    /// <summary>Nominal: M = F/4, page at the focal point, compared with the naked eye at 25 cm.</summary>
    Nominal = 1,

    /// <summary>Trade: M = F/4 + 1, the lens in contact with a +4 D add, image at 25 cm.</summary>
    Trade = 2,

    /// <summary>Nominal against a 40 cm reference: M = F/2.5 (some makers; common practice).</summary>
    Nominal40Centimetres = 3,
}

/// <summary>The "×" a power would carry under the two usual conventions, both against 25 cm.</summary>
/// <param name="Nominal">F/4 (page at the focal point, naked eye at 25 cm).</param>
/// <param name="Trade">F/4 + 1 (lens in contact with a +4 D add, image at 25 cm).</param>
public readonly record struct LabelReadings(double Nominal, double Trade)
{
    /// <summary>The reference distance both readings use: 25 cm.</summary>
    public static Distance ReferenceDistance => MagnifierLabel.StandardReference;
}

/// <summary>Conversions between a magnifier's equivalent power and its "×" label (methods §5).</summary>
public static class MagnifierLabel
{
    /// <summary>The 25 cm reference distance behind the nominal and trade conventions.</summary>
    public static Distance StandardReference { get; } = Distance.FromCentimetres(25);

    /// <summary>The 40 cm reference distance some makers use.</summary>
    public static Distance Reference40 { get; } = Distance.FromCentimetres(40);

    /// <summary>The "×" a power carries under a convention.</summary>
    public static double Magnification(Power power, LabelConvention convention) => convention switch
    {
        // Nominal magnification M = F/4 (Brown and Siemsen 2008; methods §5)
        LabelConvention.Nominal => power.Dioptres / 4.0,
        // Trade magnification M = F/4 + 1 = Gullstrand with z = 0, A = +4 D (Brown and Siemsen 2008, appendix)
        LabelConvention.Trade => (power.Dioptres / 4.0) + 1.0,
        // Nominal re 40 cm: M = F/2.5 (common practice)
        LabelConvention.Nominal40Centimetres => power.Dioptres / 2.5,
        _ => throw new ArgumentOutOfRangeException(nameof(convention), convention, "Choose the label convention: nominal (F/4), trade (F/4 + 1) or nominal at 40 cm (F/2.5)."),
    };

    /// <summary>The equivalent power a "×" label implies under a stated convention: F = 4M, 4(M − 1) or 2.5M.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The label is not a positive number, or gives no positive power.</exception>
    public static Power PowerFromLabel(double times, LabelConvention convention)
    {
        if (!(double.IsFinite(times) && times > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(times), times, "A magnifier label must be a number greater than zero, such as 3 for \"3×\".");
        }

        var dioptres = convention switch
        {
            LabelConvention.Nominal => 4.0 * times,
            LabelConvention.Trade => 4.0 * (times - 1.0),
            LabelConvention.Nominal40Centimetres => 2.5 * times,
            _ => throw new ArgumentOutOfRangeException(nameof(convention), convention, "Choose the label convention: nominal (F/4), trade (F/4 + 1) or nominal at 40 cm (F/2.5)."),
        };
        return dioptres > 0
            ? Power.FromDioptres(dioptres)
            : throw new ArgumentOutOfRangeException(nameof(times), times, "Under the trade convention a label must be more than 1×; enter the power in dioptres instead.");
    }

    /// <summary>Both readings of a power against 25 cm.</summary>
    public static LabelReadings Readings(Power power) =>
        new(Magnification(power, LabelConvention.Nominal), Magnification(power, LabelConvention.Trade));
}
