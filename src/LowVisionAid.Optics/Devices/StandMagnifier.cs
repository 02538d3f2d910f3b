using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>What a stand magnifier gives when viewed from a stated distance above the lens.</summary>
/// <param name="EyeToLens">Eye (spectacle plane or add) to lens distance.</param>
/// <param name="AddNeeded">Accommodation or add needed: A = 1/(z + |l′|).</param>
/// <param name="EquivalentViewingDistance">EVD = (z + |l′|)/ER.</param>
/// <param name="EquivalentPower">F_eq = ER × A (Bailey: EVP = accommodation demand × enlargement ratio).</param>
public readonly record struct StandMagnifierView(Distance EyeToLens, Power AddNeeded, Distance EquivalentViewingDistance, Power EquivalentPower);

/// <summary>
/// A stand magnifier: a lens held at a fixed height above the page, inside its focal length, so that a virtual,
/// erect image lies a finite distance below the lens (methods §3.4). Immutable.
/// </summary>
public sealed record StandMagnifier
{
    private StandMagnifier(Power lensPower, Distance standHeight, Distance imageBelowLens, double enlargementRatio)
    {
        LensPower = lensPower;
        StandHeight = standHeight;
        ImageBelowLens = imageBelowLens;
        EnlargementRatio = enlargementRatio;
    }

    /// <summary>Equivalent power of the lens system.</summary>
    public Power LensPower { get; }

    /// <summary>Page-to-lens distance h.</summary>
    public Distance StandHeight { get; }

    /// <summary>Image distance below the lens, |l′| (a magnitude).</summary>
    public Distance ImageBelowLens { get; }

    /// <summary>Transverse enlargement ratio ER = L/L′ = 1 + F|l′|.</summary>
    public double EnlargementRatio { get; }

    /// <summary>
    /// From lens power F and stand height h (h &lt; 1/F): L = −1/h, L′ = L + F, ER = 1/(1 − hF), |l′| = h/(1 − hF).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The power is not positive, or the page is at or beyond the focal point.</exception>
    public static StandMagnifier FromLensAndHeight(Power lensPower, Distance standHeight)
    {
        var f = lensPower.Dioptres;
        var h = standHeight.Metres;
        if (!(f > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(lensPower), f, "A stand magnifier lens must be a plus lens; enter its power in dioptres, e.g. 20.");
        }

        if (!(h > 0) || h * f >= 1.0)
        {
            throw new ArgumentOutOfRangeException(nameof(standHeight), h, "The stand height must be greater than zero and less than the lens focal length (1/F); otherwise the image is not a virtual, erect one.");
        }

        // Vergence equation: L = −1/h, L′ = L + F; ER = L/L′ = 1/(1 − hF); |l′| = h/(1 − hF) (derived, methods §3.4)
        var oneMinusHf = 1.0 - (h * f);
        return new(lensPower, standHeight, Distance.FromMetres(h / oneMinusHf), 1.0 / oneMinusHf);
    }

    /// <summary>
    /// From the image position and enlargement ratio as a maker states them: F = (ER − 1)/|l′| and h = |l′|/ER
    /// (inverse of ER = 1 + F|l′|; Brown and Siemsen 2008 recommend this labelling).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The image distance is not positive or the ratio is not above 1.</exception>
    public static StandMagnifier FromImagePosition(Distance imageBelowLens, double enlargementRatio)
    {
        var image = imageBelowLens.Metres;
        if (!(image > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(imageBelowLens), image, "The image position must be a distance below the lens greater than zero, e.g. 10 cm.");
        }

        if (!(double.IsFinite(enlargementRatio) && enlargementRatio > 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(enlargementRatio), enlargementRatio, "The enlargement ratio must be a number greater than 1, e.g. 3.");
        }

        // ER = 1 + F|l′| ⇒ F = (ER − 1)/|l′|; h = |l′|/ER (derived, methods §3.4)
        return new(Power.FromDioptres((enlargementRatio - 1.0) / image), Distance.FromMetres(image / enlargementRatio), imageBelowLens, enlargementRatio);
    }

    /// <summary>
    /// Viewed from <paramref name="eyeToLens"/> above the lens: A = 1/(z + |l′|), EVD = (z + |l′|)/ER, F_eq = ER × A
    /// (Bailey; identical to Gullstrand with F₁ = F, F₂ = A, separation z).
    /// </summary>
    public StandMagnifierView ViewFrom(Distance eyeToLens)
    {
        var z = eyeToLens.Abs().Metres;
        var imageToEye = z + ImageBelowLens.Metres;
        var add = 1.0 / imageToEye;
        // Bailey: EVP = A × ER; EVD = (z + |l′|)/ER (methods §3.4)
        return new(eyeToLens.Abs(), Power.FromDioptres(add), Distance.FromMetres(imageToEye / EnlargementRatio), Power.FromDioptres(EnlargementRatio * add));
    }

    /// <summary>
    /// The eye distance at which an add of <paramref name="add"/> focuses the image: z = 1/A − |l′|,
    /// or null when the image is farther than 1/A (the add is too strong for this stand at any eye distance).
    /// </summary>
    public Distance? EyeDistanceForAdd(Power add)
    {
        if (!(add.Dioptres > 0))
        {
            return null;
        }

        var z = (1.0 / add.Dioptres) - ImageBelowLens.Metres;
        return z >= 0 ? Distance.FromMetres(z) : null;
    }
}
