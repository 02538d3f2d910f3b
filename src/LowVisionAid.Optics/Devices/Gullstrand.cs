using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>The equivalent power of two thin lenses in air separated by a distance (Gullstrand's equation).</summary>
public static class Gullstrand
{
    /// <summary>
    /// F_e = F₁ + F₂ − z·F₁·F₂, with z the separation in metres (magnitude). For a magnifier and an add,
    /// F₁ is the magnifier, F₂ the add (or accommodation in use, or +K for an uncorrected myope of −K D).
    /// </summary>
    public static Power EquivalentPower(Power first, Power second, Distance separation) =>
        // Gullstrand: Fe = F1 + F2 − z·F1·F2 (Schwartz, Geometrical and Visual Optics, ch. 6)
        Power.FromDioptres(first.Dioptres + second.Dioptres - (separation.Abs().Metres * first.Dioptres * second.Dioptres));
}
