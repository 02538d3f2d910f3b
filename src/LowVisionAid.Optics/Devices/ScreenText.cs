using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>Text size on phones, tablets and computers in CSS pixels (W3C CSS Values and Units, the reference pixel).</summary>
public static class ScreenText
{
    /// <summary>
    /// The W3C reference pixel: the visual angle of one pixel on a device of 96 dpi at arm's length (28 in, about 71 cm),
    /// about 0.0213° (W3C CSS Values and Units Module Level 3, §5.2 "Absolute lengths").
    /// </summary>
    public static VisualAngle ReferencePixel { get; } = VisualAngle.FromDegrees(0.0213);

    /// <summary>
    /// The x-height in CSS pixels that subtends <paramref name="angle"/>, taking one CSS pixel as the reference pixel
    /// at the viewing distance (the W3C intent: devices size their pixel for their usual viewing distance).
    /// </summary>
    public static double XHeightPixels(VisualAngle angle) => angle.Degrees / ReferencePixel.Degrees;

    /// <summary>The font size in CSS pixels for an x-height in CSS pixels: x-height ÷ r_x (methods §1.3).</summary>
    public static double FontSizePixels(double xHeightPixels, XHeightRatio ratio) => xHeightPixels / ratio.Value;
}
