using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>Spectacle-mounted high adds ("microscopes") and the binocular rules that go with them (methods §3.2).</summary>
public static class SpectacleAdd
{
    /// <summary>
    /// The add above which binocular use usually fails and the lens is fitted to the better eye: +10 D
    /// (common practice puts it at about +10 to +12 D; the lower end is used).
    /// </summary>
    public static Power BinocularLimit { get; } = Power.FromDioptres(10);

    /// <summary>
    /// Working distance with the distance refraction fully corrected: w = 1/(add + accommodation in use),
    /// measured from the lens (thin lens, vertex distance ignored).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The total focusing power is not positive.</exception>
    public static Distance WorkingDistance(Power add, Power accommodationInUse)
    {
        var total = add.Dioptres + accommodationInUse.Dioptres;
        return total > 0
            ? Distance.FromMetres(1.0 / total) // w = 1/F_add (methods §3.2)
            : throw new ArgumentOutOfRangeException(nameof(add), total, "The add plus accommodation must be greater than 0 D to focus at near.");
    }

    /// <summary>The total near lens power: distance refraction (spherical equivalent) + add (methods §3.2).</summary>
    public static Power NearLensPower(Power distanceRefraction, Power add) => distanceRefraction + add;

    /// <summary>
    /// Base-in prism by the rule of thumb: add + 2 Δ (Siemsen 2012). Sources differ on whether this is the total
    /// or the amount in each eye; the practitioner chooses.
    /// </summary>
    public static double BaseInPrismRule(Power add) => add.Dioptres + 2.0;

    /// <summary>True when binocular use is usually possible at this add: at most <see cref="BinocularLimit"/>.</summary>
    public static bool BinocularUsuallyPossible(Power add) => add <= BinocularLimit;
}

/// <summary>Convergence demand for near work (methods §3.2; CV-28).</summary>
public static class Convergence
{
    /// <summary>Distance from the spectacle plane to the eyes' centres of rotation, ≈ 27 mm (methods §3.2).</summary>
    public static Distance CentreOfRotationBehindSpectacles { get; } = Distance.FromMillimetres(27);

    /// <summary>
    /// Total demand in prism dioptres at the spectacle plane: PD(cm) / w(m). Exact for plus lenses centred on the
    /// distance PD with the page at their focus (derived; Δ = cm per m).
    /// </summary>
    public static double AtSpectaclePlane(Distance interpupillary, Distance workingDistance) =>
        // Convergence Δ = PD(cm) × 1/w(m) (derived, methods §3.2)
        interpupillary.Centimetres / Positive(workingDistance);

    /// <summary>
    /// Total demand for naked-eye or decentred viewing, measured from the centres of rotation:
    /// PD(cm) / (w + 0.027 m) (derived, methods §3.2).
    /// </summary>
    public static double FromCentresOfRotation(Distance interpupillary, Distance workingDistance) =>
        interpupillary.Centimetres / (Positive(workingDistance) + CentreOfRotationBehindSpectacles.Metres);

    private static double Positive(Distance d) => d.Metres > 0
        ? d.Metres
        : throw new ArgumentOutOfRangeException(nameof(d), d.Metres, "A working distance must be greater than zero.");
}
