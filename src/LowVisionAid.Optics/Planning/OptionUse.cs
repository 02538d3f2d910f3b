using LowVisionAid.Optics.Options;

namespace LowVisionAid.Optics.Planning;

/// <summary>Whether an option can be used as planned, and why not: one rule for every page and document.</summary>
public static class OptionUse
{
    /// <summary>The words used when an option builds but gives too little power and carries no note of its own.</summary>
    public const string ShortOfPower = "Gives less than the required power.";

    /// <summary>
    /// True when the option can be built for this client, gives the required power and gives it in a practical form.
    /// </summary>
    /// <exception cref="ArgumentNullException"><paramref name="option"/> is null.</exception>
    public static bool IsUsable(MagnifierOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return option.IsApplicable && option.MeetsRequiredPower && option.IsPractical;
    }

    /// <summary>The first reason the option cannot be used as planned, or null when it can.</summary>
    /// <exception cref="ArgumentNullException"><paramref name="option"/> is null.</exception>
    public static string? WhyNot(MagnifierOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        if (!option.IsApplicable)
        {
            return option.NotApplicableBecause ?? "Cannot be built for this client.";
        }

        if (!option.MeetsRequiredPower)
        {
            return ShortOfPower;
        }

        return option.IsPractical ? null : option.PracticalNote ?? "Only in an impractical form.";
    }
}
