namespace LowVisionAid.Optics.Planning;

/// <summary>What the client wants to do with the magnification.</summary>
public enum ReadingTask
{
    /// <summary>Short tasks at or near threshold: labels, prices, post (spot reading).</summary>
    SpotReading = 1,

    /// <summary>Continuous reading: books, newspapers, letters (fluent or sustained reading).</summary>
    SustainedReading = 2,

    /// <summary>Writing, filling in forms: needs room under the device for a pen and both hands free.</summary>
    Writing = 3,

    /// <summary>A computer, tablet or phone screen.</summary>
    Screen = 4,

    /// <summary>Distance tasks: television, faces, signs.</summary>
    DistanceViewing = 5,
}
