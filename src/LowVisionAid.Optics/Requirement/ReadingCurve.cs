using System.Collections.Immutable;
using System.Globalization;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// Finds the maximum reading speed (MRS) and the critical print size (CPS) from reading speeds at several print
/// sizes read at one distance (MNREAD; Legge et al. 1989; Mansfield et al. 1993).
/// </summary>
/// <remarks>
/// The rule (a plateau search with a 90 % criterion):
/// sort the points from the largest print down; the largest print starts the plateau; each next smaller print
/// joins the plateau while its speed is at least 90 % of the mean speed of the larger prints already on it; the
/// first print slower than that ends the search. The CPS is the smallest print on the plateau and the MRS is the
/// mean speed at the print sizes larger than the CPS.
/// The 90 % criterion is the one that defines P_c in the exponential fit R = R_max(1 − exp[−2.3(P − P₀)/(P_c − P₀)])
/// (ARVO/IOVS abstract, 50 low-vision patients; methods §2.5). The published standard MNREAD algorithm
/// (Legge 2007, as implemented in the mnreadR package) instead finds the plateau with a 1.96-SD criterion on
/// log speed; results can differ by one 0.1 log step.
/// </remarks>
public static class ReadingCurve
{
    /// <summary>The fraction of the plateau's mean speed a print must reach to join the plateau: 0.90.</summary>
    public const double PlateauCriterion = 0.9;

    /// <summary>The fewest print sizes accepted: 3.</summary>
    public const int MinimumPoints = 3;

    /// <summary>Analyses a reading-speed curve; a curve without a plateau or with too few points is refused with the reason.</summary>
    /// <param name="testDistance">The distance at which every sentence was read.</param>
    /// <param name="points">One reading speed per print size, in any order.</param>
    /// <exception cref="ArgumentOutOfRangeException">The test distance is not greater than zero, or a point is invalid.</exception>
    /// <exception cref="ArgumentNullException"><paramref name="points"/> is null.</exception>
    public static ReadingCurveAnalysis Analyse(Distance testDistance, IEnumerable<ReadingPoint> points)
    {
        ArgumentNullException.ThrowIfNull(points);
        MethodInputGuards.TestDistance(testDistance, nameof(testDistance));
        var sorted = points
            .Select(p => p.PrintSize.IsValid ? p : throw new ArgumentOutOfRangeException(nameof(points), "Enter a print size greater than zero for every reading speed, such as 1.0M."))
            .OrderByDescending(p => p.PrintSize.M)
            .ToImmutableArray();

        if (sorted.Length < MinimumPoints)
        {
            return ReadingCurveAnalysis.Refuse(testDistance, sorted, string.Create(CultureInfo.InvariantCulture,
                $"Too few points: {sorted.Length} print size(s) given. Enter reading speeds for at least {MinimumPoints} print sizes, from print read easily down to print that slows reading, such as 1.3 to 0.3 logMAR in 0.1 steps."));
        }

        for (var i = 1; i < sorted.Length; i++)
        {
            if (SameSize(sorted[i - 1].PrintSize, sorted[i].PrintSize))
            {
                return ReadingCurveAnalysis.Refuse(testDistance, sorted, string.Create(CultureInfo.InvariantCulture,
                    $"The print size {sorted[i].PrintSize} appears more than once. Enter one reading speed for each print size (the mean, if it was read twice)."));
            }
        }

        if (sorted[0].WordsPerMinute <= 0)
        {
            return ReadingCurveAnalysis.Refuse(testDistance, sorted,
                "The largest print was not read, so there is no reading speed to build on. Test larger print, or use the near-acuity method instead.");
        }

        // Plateau search with the 90 % criterion (P_c at 90 % of R_max; ARVO/IOVS abstract; methods §2.5).
        var plateauSum = sorted[0].WordsPerMinute;
        var plateauCount = 1;
        while (plateauCount < sorted.Length && sorted[plateauCount].WordsPerMinute >= PlateauCriterion * plateauSum / plateauCount)
        {
            plateauSum += sorted[plateauCount].WordsPerMinute;
            plateauCount++;
        }

        if (plateauCount < 2)
        {
            return ReadingCurveAnalysis.Refuse(testDistance, sorted,
                "No plateau: reading was more than 10 % slower at the second-largest print than at the largest, so the speed may still be rising with size. Test larger print sizes, or use the near-acuity method instead.");
        }

        var critical = sorted[plateauCount - 1];
        // MRS = mean speed at the print sizes larger than the CPS.
        var maximumReadingSpeed = (plateauSum - critical.WordsPerMinute) / (plateauCount - 1);
        return ReadingCurveAnalysis.Usable(testDistance, sorted, maximumReadingSpeed, critical.PrintSize, plateauCount,
            speedFell: plateauCount < sorted.Length);
    }

    private static bool SameSize(PrintSize larger, PrintSize smaller) => larger.M - smaller.M <= 1e-9 * larger.M;
}
