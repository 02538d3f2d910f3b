using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>Spectacle-mounted high adds ("microscopes") and the binocular rules that go with them (methods §3.2).</summary>
public static class SpectacleAdd
{
    /// <summary>
    /// The add above which binocular use usually fails and the lens is fitted to the better eye: +12 D (common
    /// practice puts it at about +10 to +12 D, methods §3.2; ready-made prism half-eyes, binocular by design, are made
    /// to about +12 D, so the upper end is used).
    /// </summary>
    public static Power BinocularLimit { get; } = Power.FromDioptres(12);

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
    /// Base-in prism in each eye by the rule of thumb, in the dispensing form: add + 2 Δ base-in each eye (Siemsen
    /// 2012; methods §3.2, §11). A +5.00 add gives 7 Δ base-in in each lens.
    /// </summary>
    public static double BaseInPrismEachEye(Power add) => add.Dioptres + 2.0;

    /// <summary>True when binocular use is usually possible at this add: at most <see cref="BinocularLimit"/>.</summary>
    public static bool BinocularUsuallyPossible(Power add) => add <= BinocularLimit;
}

/// <summary>
/// Binocular viewing through one plus lens (Blommaert and Neve 1987, JOSA A 4:1820; Neve 1989, OVS 66:440; methods §11).
/// </summary>
public static class BinocularLens
{
    /// <summary>
    /// Separation at the lens of the two eyes' lines of sight to one page point: PD·|l′|/(z + |l′|), with z the pupils'
    /// distance to the lens and |l′| the image distance behind it; PD when the image is at infinity (null).
    /// </summary>
    public static Distance LineOfSightSeparation(Distance interpupillary, Distance pupilToLens, Distance? imageBehindLens)
    {
        if (imageBehindLens is not { } image)
        {
            return interpupillary.Abs();
        }

        var l = image.Abs().Metres;
        // s = PD·|l′|/(z + |l′|) (similar triangles; methods §11)
        return Distance.FromMetres(interpupillary.Abs().Metres * l / (pupilToLens.Abs().Metres + l));
    }

    /// <summary>
    /// The page field both eyes share through the lens: (D − s)/(z·F_eq), the field formula y = D/(z·F_eq) (methods §4.1)
    /// applied to the part of the aperture both lines of sight pass; zero when the lens is narrower than s.
    /// </summary>
    public static Distance SharedField(Distance aperture, Distance interpupillary, Distance pupilToLens, Distance? imageBehindLens, Power equivalentPower)
    {
        var shared = aperture.Abs().Metres - LineOfSightSeparation(interpupillary, pupilToLens, imageBehindLens).Metres;
        var z = pupilToLens.Abs().Metres;
        return shared > 0 && z > 0 && equivalentPower.Dioptres > 0
            ? Distance.FromMetres(shared / (z * equivalentPower.Dioptres))
            : Distance.Zero;
    }
}

/// <summary>
/// Convergence demand for near work (methods §3.2; CV-28). The plan uses one rule, <see cref="AtSpectaclePlane"/>,
/// for every option, so the same distance always gives the same demand.
/// </summary>
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
