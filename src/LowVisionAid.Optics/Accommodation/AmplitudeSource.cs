namespace LowVisionAid.Optics.Accommodation;

/// <summary>Where an amplitude of accommodation came from.</summary>
public enum AmplitudeSource
{
    /// <summary>Measured by the practitioner (push-up, minus-lens or similar).</summary>
    Measured,

    /// <summary>Estimated from age by Hofstetter's minimum, 15 − 0.25 × age (the cautious choice for planning).</summary>
    HofstetterMinimum,

    /// <summary>Estimated from age by Hofstetter's average, 18.5 − 0.3 × age.</summary>
    HofstetterMean,

    /// <summary>Estimated from age by Hofstetter's maximum, 25 − 0.4 × age.</summary>
    HofstetterMaximum,
}
