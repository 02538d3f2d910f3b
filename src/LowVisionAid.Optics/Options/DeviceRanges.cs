using System.Collections.Immutable;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>How much a class of option costs the client, roughly (clinic-editable in <see cref="DeviceRanges.Costs"/>).</summary>
public enum CostClass
{
    /// <summary>Free or a small outlay (moving closer, built-in screen settings, a ready-made magnifier).</summary>
    Low = 1,

    /// <summary>A prescription or a specialist device.</summary>
    Medium = 2,

    /// <summary>A custom telescopic system or an electronic device.</summary>
    High = 3,
}

/// <summary>One row of the aperture table: lenses up to <paramref name="UpToDioptres"/> are made about this wide.</summary>
/// <param name="UpToDioptres">The strongest lens power of the row, D.</param>
/// <param name="Aperture">The largest clear aperture usually made at that power.</param>
public readonly record struct ApertureRow(double UpToDioptres, Distance Aperture);

/// <summary>
/// The realistic range of each class of device, in one table (methods §11 "Realistic device ranges"). Each member
/// names its source or says "common practice". Beyond a class's range an option is shown as not practical, with the
/// reason. Immutable; a clinic may replace any row through <c>PlanSettings.Ranges with { … }</c>.
/// </summary>
public sealed record DeviceRanges
{
    /// <summary>The documented defaults.</summary>
    public static DeviceRanges Default { get; } = new();

    /// <summary>
    /// Strongest spectacle-mounted add: +20 D (5 cm working distance). Common practice: high-add and aspheric
    /// reading spectacles are dispensed to about +20 D; stronger microscopic lenses exist but their 5 cm or shorter
    /// distance and depth of field of a millimetre or two make them rarely usable.
    /// </summary>
    public Power StrongestSpectacleAdd { get; init; } = Power.FromDioptres(20);

    /// <summary>Strongest hand magnifier: +40 D (10× nominal). Common practice: stock hand lenses stop at about 10–12×.</summary>
    public Power StrongestHandMagnifier { get; init; } = Power.FromDioptres(40);

    /// <summary>Strongest stand magnifier lens: +40 D. Common practice: stock stand magnifiers stop at about +40 to +50 D.</summary>
    public Power StrongestStandMagnifier { get; init; } = Power.FromDioptres(40);

    /// <summary>
    /// The largest clear aperture made at each power, weakest first: the usable diameter of a plus lens falls as its
    /// power rises (methods §10.2, §11; common practice, from stock magnifier sizes). Powers above the last row use it.
    /// </summary>
    public ImmutableArray<ApertureRow> Apertures { get; init; } =
    [
        new(5, Distance.FromMillimetres(100)),
        new(8, Distance.FromMillimetres(75)),
        new(12, Distance.FromMillimetres(60)),
        new(16, Distance.FromMillimetres(50)),
        new(20, Distance.FromMillimetres(45)),
        new(28, Distance.FromMillimetres(35)),
        new(40, Distance.FromMillimetres(25)),
    ];

    /// <summary>Strongest near telescope (telemicroscope): 4× (methods §11: near telescopes rarely above about 4×; common practice).</summary>
    public double StrongestNearTelescope { get; init; } = 4;

    /// <summary>
    /// Strongest telescope used with both eyes: 3×, spectacle-mounted and converged for the working distance (methods §11:
    /// binocular telescopes about 2–3×; Dickinson; Freeman and Jose; from memory for the exact figure).
    /// </summary>
    public double StrongestBinocularTelescope { get; init; } = 3;

    /// <summary>Strongest hand-held distance telescope: 10× (methods §11: up to about 8–10× with small fields; common practice).</summary>
    public double StrongestHandHeldTelescope { get; init; } = 10;

    /// <summary>
    /// Strongest spectacle-mounted distance telescope: 4×, the Galilean limit (methods §3.5: Galilean usually ≤ about
    /// 4×); heavier Keplerian systems on spectacles are rarely tolerated (common practice).
    /// </summary>
    public double StrongestSpectacleTelescope { get; init; } = 4;

    /// <summary>
    /// A video magnifier's useful enlargement ends where fewer than this many letters fit on a screen line: 4
    /// (Whittaker and Lovie-Kitchin 1993: about 4 characters is the least field for fluent reading).
    /// </summary>
    public double FewestLettersPerScreenLine { get; init; } = 4;

    /// <summary>The largest enlargement a desktop video magnifier offers: 60× (common practice).</summary>
    public double StrongestVideoEnlargement { get; init; } = 60;

    /// <summary>Screen width of a phone: 6.5 cm (common practice, a 6-inch phone held upright).</summary>
    public Distance PhoneScreenWidth { get; init; } = Distance.FromCentimetres(6.5);

    /// <summary>Screen width of a tablet: 16 cm (common practice, a 10-inch tablet held upright).</summary>
    public Distance TabletScreenWidth { get; init; } = Distance.FromCentimetres(16);

    /// <summary>Screen viewing distances below this are taken as a phone: 35 cm (common practice).</summary>
    public Distance PhoneBelow { get; init; } = Distance.FromCentimetres(35);

    /// <summary>Screen viewing distances below this (and not a phone) are taken as a tablet: 50 cm (common practice).</summary>
    public Distance TabletBelow { get; init; } = Distance.FromCentimetres(50);

    /// <summary>
    /// The cost class of each option class (common practice; the clinic may change them). A kind missing here counts
    /// as <see cref="CostClass.Medium"/>.
    /// </summary>
    public ImmutableDictionary<OptionKind, CostClass> Costs { get; init; } = new Dictionary<OptionKind, CostClass>
    {
        [OptionKind.MovingCloser] = CostClass.Low,
        [OptionKind.LargePrint] = CostClass.Low,
        [OptionKind.ScreenMagnification] = CostClass.Low,
        [OptionKind.HandMagnifier] = CostClass.Low,
        [OptionKind.StandMagnifier] = CostClass.Low,
        [OptionKind.SpectacleAdd] = CostClass.Medium,
        [OptionKind.DistanceTelescope] = CostClass.Medium,
        [OptionKind.NearTelescope] = CostClass.High,
        [OptionKind.SpectacleTelescope] = CostClass.High,
        [OptionKind.VideoMagnifier] = CostClass.High,
    }.ToImmutableDictionary();

    /// <summary>
    /// These ranges with some cost classes changed (a clinic's own, <see cref="Costs"/>); classes not named keep theirs.
    /// </summary>
    public DeviceRanges WithCosts(IEnumerable<KeyValuePair<OptionKind, CostClass>> changes)
    {
        ArgumentNullException.ThrowIfNull(changes);
        return this with { Costs = Costs.SetItems(changes) };
    }

    /// <summary>The cost class of an option class.</summary>
    public CostClass CostOf(OptionKind kind) => Costs.TryGetValue(kind, out var cost) ? cost : CostClass.Medium;

    /// <summary>The largest clear aperture usually made at a lens power (the first row that covers it, else the last row).</summary>
    public Distance ApertureFor(Power lens)
    {
        if (Apertures.IsDefaultOrEmpty)
        {
            return Distance.FromMillimetres(50);
        }

        foreach (var row in Apertures)
        {
            if (lens.Dioptres <= row.UpToDioptres)
            {
                return row.Aperture;
            }
        }

        return Apertures[^1].Aperture;
    }

    /// <summary>
    /// The reason a device is beyond its class's range, or null when it is within it: "<paramref name="device"/> of
    /// <paramref name="needed"/> would be needed; the strongest usually made is about <paramref name="strongest"/>".
    /// </summary>
    internal static string? Beyond(string device, double needed, double strongest, string unit) => needed > strongest * (1 + 1e-9)
        ? string.Format(System.Globalization.CultureInfo.InvariantCulture, OptionNotes.BeyondRangeFormat, device, needed, unit, strongest)
        : null;
}
