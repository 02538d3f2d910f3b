using LowVisionAid.Optics.Options;

namespace LowVisionAid.Optics.Planning;

/// <summary>Whether an option can be used as planned: one rule for every page and document.</summary>
public static class OptionUse
{
    /// <summary>
    /// True when the option can be built for this client, gives the required power and gives it in a practical form.
    /// </summary>
    /// <exception cref="ArgumentNullException"><paramref name="option"/> is null.</exception>
    public static bool IsUsable(MagnifierOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return option.IsApplicable && option.MeetsRequiredPower && option.IsPractical;
    }
}
