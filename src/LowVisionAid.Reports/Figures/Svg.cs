using System.Globalization;
using System.Text.RegularExpressions;
using System.Xml.Linq;

namespace LowVisionAid.Reports.Figures;

/// <summary>
/// Builds SVG with System.Xml.Linq, so every attribute and text node is escaped and the output is well-formed.
/// Text is black on white (21:1); shapes differ by outline, pattern and label, never by colour alone.
/// </summary>
internal static partial class Svg
{
    public static readonly XNamespace Ns = "http://www.w3.org/2000/svg";

    public const string Ink = "#000000";
    public const string Paper = "#ffffff";
    public const string Grid = "#595959"; // 7.0:1 on white, though only lines use it
    public const string FontFamily = "'Atkinson Hyperlegible', Arial, sans-serif";
    public const double LabelSize = 16;

    private static readonly double[] NiceSteps = [1.0, 2.0, 5.0, 10.0];

    public static XElement Root(string id, double width, double height, string title, string description) => new(
        Ns + "svg",
        new XAttribute("id", id),
        new XAttribute("viewBox", Join(0, 0, width, height)),
        new XAttribute("width", Number(width)),
        new XAttribute("height", Number(height)),
        new XAttribute("role", "img"),
        new XAttribute("aria-labelledby", id + "-title " + id + "-desc"),
        new XAttribute("font-family", FontFamily),
        new XElement(Ns + "title", new XAttribute("id", id + "-title"), title),
        new XElement(Ns + "desc", new XAttribute("id", id + "-desc"), description),
        new XElement(Ns + "rect", new XAttribute("width", "100%"), new XAttribute("height", "100%"), new XAttribute("fill", Paper)));

    public static void Resize(XElement svg, double width, double height)
    {
        svg.SetAttributeValue("viewBox", Join(0, 0, width, height));
        svg.SetAttributeValue("width", Number(width));
        svg.SetAttributeValue("height", Number(height));
    }

    public static XElement Text(double x, double y, string text, double size = LabelSize, string anchor = "start", bool bold = false) => new(
        Ns + "text",
        new XAttribute("x", Number(x)),
        new XAttribute("y", Number(y)),
        new XAttribute("font-size", Number(size)),
        new XAttribute("fill", Ink),
        anchor == "start" ? null : new XAttribute("text-anchor", anchor),
        bold ? new XAttribute("font-weight", "bold") : null,
        text);

    public static XElement Line(double x1, double y1, double x2, double y2, string stroke = Ink, double width = 1.5, string? dash = null) => new(
        Ns + "line",
        new XAttribute("x1", Number(x1)),
        new XAttribute("y1", Number(y1)),
        new XAttribute("x2", Number(x2)),
        new XAttribute("y2", Number(y2)),
        new XAttribute("stroke", stroke),
        new XAttribute("stroke-width", Number(width)),
        dash is null ? null : new XAttribute("stroke-dasharray", dash));

    public static XElement Rect(double x, double y, double width, double height, string fill = "none", string? dash = null, double strokeWidth = 2) => new(
        Ns + "rect",
        new XAttribute("x", Number(x)),
        new XAttribute("y", Number(y)),
        new XAttribute("width", Number(width)),
        new XAttribute("height", Number(height)),
        new XAttribute("fill", fill),
        new XAttribute("stroke", Ink),
        new XAttribute("stroke-width", Number(strokeWidth)),
        dash is null ? null : new XAttribute("stroke-dasharray", dash));

    /// <summary>A hatch or dot pattern, referenced as <c>url(#id)</c>.</summary>
    public static XElement Pattern(string id, string kind)
    {
        var pattern = new XElement(Ns + "pattern",
            new XAttribute("id", id),
            new XAttribute("width", "8"),
            new XAttribute("height", "8"),
            new XAttribute("patternUnits", "userSpaceOnUse"),
            new XElement(Ns + "rect", new XAttribute("width", "8"), new XAttribute("height", "8"), new XAttribute("fill", Paper)));
        pattern.Add(kind switch
        {
            "hatch" => new XElement(Ns + "path", new XAttribute("d", "M0,8 L8,0 M-2,2 L2,-2 M6,10 L10,6"),
                new XAttribute("stroke", Ink), new XAttribute("stroke-width", "1.5")),
            "dots" => new XElement(Ns + "circle", new XAttribute("cx", "4"), new XAttribute("cy", "4"), new XAttribute("r", "1.8"),
                new XAttribute("fill", Ink)),
            _ => new XElement(Ns + "rect", new XAttribute("width", "8"), new XAttribute("height", "8"), new XAttribute("fill", Ink)),
        });
        return pattern;
    }

    /// <summary>A marker shape for option <paramref name="index"/> (circle, square, triangle, diamond, cross, then repeats).</summary>
    public static XElement Marker(int index, double x, double y, double r = 7)
    {
        string d = (index % 5) switch
        {
            0 => $"M{N(x - r)},{N(y)} a{N(r)},{N(r)} 0 1,0 {N(2 * r)},0 a{N(r)},{N(r)} 0 1,0 {N(-2 * r)},0 Z",
            1 => $"M{N(x - r)},{N(y - r)} h{N(2 * r)} v{N(2 * r)} h{N(-2 * r)} Z",
            2 => $"M{N(x)},{N(y - r)} L{N(x + r)},{N(y + r)} L{N(x - r)},{N(y + r)} Z",
            3 => $"M{N(x)},{N(y - r)} L{N(x + r)},{N(y)} L{N(x)},{N(y + r)} L{N(x - r)},{N(y)} Z",
            _ => $"M{N(x - r)},{N(y - r)} L{N(x + r)},{N(y + r)} M{N(x + r)},{N(y - r)} L{N(x - r)},{N(y + r)}",
        };
        return new XElement(Ns + "path",
            new XAttribute("d", d),
            new XAttribute("fill", index % 10 < 5 ? Ink : Paper),
            new XAttribute("stroke", Ink),
            new XAttribute("stroke-width", index % 10 == 4 ? "3.5" : "2"),
            new XAttribute("data-option", (index + 1).ToString(CultureInfo.InvariantCulture)));
    }

    /// <summary>The shape's name for the data table.</summary>
    public static string MarkerName(int index) => (index % 5) switch
    {
        0 => Fill(index) + " circle",
        1 => Fill(index) + " square",
        2 => Fill(index) + " triangle",
        3 => Fill(index) + " diamond",
        _ => index % 10 < 5 ? "cross" : "thin cross",
    };

    private static string Fill(int index) => index % 10 < 5 ? "filled" : "open";

    public static string Serialize(XElement svg) => svg.ToString(SaveOptions.DisableFormatting);

    /// <summary>Checks that an element id is safe to use in markup and in aria-labelledby.</summary>
    public static string CheckId(string id)
    {
        ArgumentNullException.ThrowIfNull(id);
        return SafeId().IsMatch(id)
            ? id
            : throw new ArgumentException("A figure id must start with a letter and hold only letters, digits, '-' and '_', e.g. \"plan-power\".", nameof(id));
    }

    /// <summary>Round "nice" axis ticks (1, 2 or 5 × 10ⁿ) from 0 to at least <paramref name="max"/>.</summary>
    public static IReadOnlyList<double> Ticks(double max, int target = 5)
    {
        if (!(max > 0))
            max = 1;
        double raw = max / target;
        double magnitude = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        double step = NiceSteps.Select(f => f * magnitude).First(s => s >= raw);
        var ticks = new List<double>();
        for (int i = 0; ticks.Count == 0 || ticks[^1] < max; i++)
            ticks.Add(i * step);
        return ticks;
    }

    public static string Number(double value) => Math.Round(value, 2).ToString("0.##", CultureInfo.InvariantCulture);

    private static string N(double value) => Number(value);

    private static string Join(params double[] values) => string.Join(' ', values.Select(Number));

    [GeneratedRegex("^[A-Za-z][A-Za-z0-9_-]*$")]
    private static partial Regex SafeId();
}
