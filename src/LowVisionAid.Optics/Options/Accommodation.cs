using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>The accommodation a plan may count on for sustained near work.</summary>
internal static class Accommodation
{
    // Implementation note: the age estimate belongs to the Accommodation module of the methods work; until that
    // reaches main this uses Hofstetter's minimum with half kept in reserve, and is replaced by that module's call.
    public static Power UsableFor(ClientConstraints constraints)
    {
        if (constraints.UsableAccommodation is { } measured)
        {
            return measured;
        }

        if (constraints.AgeYears is { } age)
        {
            // Hofstetter minimum amplitude = 15 − 0.25 × age, clamped at 0; half kept in reserve (methods §10.1; common practice)
            return Power.FromDioptres(Math.Max(0, 15.0 - (0.25 * age)) / 2.0);
        }

        return Power.Zero;
    }
}
