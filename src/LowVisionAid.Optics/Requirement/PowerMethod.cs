namespace LowVisionAid.Optics.Requirement;

/// <summary>The published method that produced a <see cref="PowerEstimate"/>.</summary>
public enum PowerMethod
{
    /// <summary>
    /// Kestenbaum's rule as published: add = 1 / distance decimal acuity, bringing 1M print to threshold with no
    /// reserve (Kestenbaum and Sturman 1956).
    /// </summary>
    KestenbaumClassic,

    /// <summary>Kestenbaum's rule generalised to a target print size and an acuity reserve: Feq = R / (V_dec × M_t) (derived).</summary>
    KestenbaumWithReserve,

    /// <summary>The near-acuity (equivalent viewing distance) method with an acuity reserve (Bailey; Lovie-Kitchin).</summary>
    NearAcuity,

    /// <summary>The reading-curve method: the critical print size from reading speeds at several print sizes (MNREAD; Legge, Mansfield).</summary>
    CriticalPrintSize,
}
