using System.Globalization;
using System.Xml.Linq;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Fonts;

namespace LowVisionAid.Reports.Figures;

/// <summary>
/// The three trade-off figures, rendered on the server as accessible SVG (role="img", a title and a description,
/// black text on white, shapes told apart by outline, pattern and label) with the same data as a table.
/// </summary>
/// <param name="formatProvider">Culture for the numbers shown; the invariant culture when null.</param>
public sealed class TradeOffFigures(IFormatProvider? formatProvider = null)
{
    /// <summary>Fewer letters than this in view makes fluent reading unlikely (Whittaker and Lovie-Kitchin 1993; methods.md §4.3).</summary>
    public const int FluentReadingLetters = 4;

    /// <summary>The class of each letter drawn in a window of <see cref="LettersInView"/>.</summary>
    public const string LetterClass = "window-letter";

    // Mean character pitch ÷ x-height used to space the drawn letters (k ≈ 1.1, methods.md §4.2, approximate).
    private const double LetterPitch = 1.1;
    // Only letters about one x-height wide (a, b, c, d, e, g, h, k, n, o, p, q, s, u, v, x, y, z), so that the
    // letters drawn at pitch k fill the window as text of that pitch would; no i, l, m or w.
    internal const string SampleLetters = "codebookshopsandsunnydaysneedgoodbooks";

    // ISO 3 R10 preferred numbers, the 0.1 log-unit steps of letter charts (ISO 8596; methods.md §1.5).
    private static readonly double[] PreferredSteps = [1.00, 1.25, 1.60, 2.00, 2.50, 3.15, 4.00, 5.00, 6.30, 8.00];
    private const double Width = 760;

    private readonly IFormatProvider _culture = formatProvider ?? CultureInfo.InvariantCulture;

    /// <summary>
    /// (a) Equivalent power against working distance (left panel) and against field on the page (right panel),
    /// with each option marked by a numbered shape, and the curve "working distance = 1/F" for a lens with the
    /// page at its focal point.
    /// </summary>
    /// <param name="options">The options to mark; at least one.</param>
    /// <param name="id">The svg element's id (letters, digits, '-', '_').</param>
    public TradeOffFigure PowerAgainstDistanceAndField(IReadOnlyList<FigureOption> options, string id = "power-figure")
    {
        CheckOptions(options);
        Svg.CheckId(id);
        const string Title = "Power, working distance and field of each option";
        var description = "Equivalent power in dioptres (up the page) against working distance in centimetres (left panel) "
            + "and against the field on the page in millimetres (right panel). Stronger options sit higher: they work closer to the page and show less of it. "
            + "The dashed line is a lens with the page at its focal point, where the working distance is 1 / power. "
            + string.Join(" ", options.Select((o, i) => $"Option {Count(i + 1)}, {o.Name}: {Power(o)}, {Cm(o.WorkingDistance)}, {Mm(o.Field)}."));

        const double Height = 420;
        const double Top = 30, PlotHeight = 300, PanelWidth = 290, LeftA = 80, LeftB = 440;
        double maxPower = options.Max(o => o.EquivalentPower.Dioptres) * 1.1;
        var powerTicks = Svg.Ticks(maxPower);
        double powerTop = powerTicks[^1];
        var distanceTicks = Svg.Ticks(options.Max(o => o.WorkingDistance.Abs().Centimetres) * 1.1);
        var fieldTicks = Svg.Ticks(options.Max(o => o.Field.Abs().Millimetres) * 1.1);

        var svg = Svg.Root(id, Width, Height, Title, description);
        double Y(double dioptres) => Top + PlotHeight - (Math.Max(dioptres, 0) / powerTop * PlotHeight);

        void Panel(double left, IReadOnlyList<double> xTicks, string xLabel)
        {
            double xTop = xTicks[^1];
            foreach (var t in powerTicks)
            {
                svg.Add(Svg.Line(left, Y(t), left + PanelWidth, Y(t), Svg.Grid, 0.75, "2 4"));
                svg.Add(Svg.Text(left - 8, Y(t) + 5, t.ToString("0.#", _culture), 14, "end"));
            }

            foreach (var t in xTicks)
            {
                double x = left + (t / xTop * PanelWidth);
                svg.Add(Svg.Line(x, Top + PlotHeight, x, Top + PlotHeight + 6));
                svg.Add(Svg.Text(x, Top + PlotHeight + 22, t.ToString("0.#", _culture), 14, "middle"));
            }

            svg.Add(Svg.Line(left, Top, left, Top + PlotHeight, width: 2));
            svg.Add(Svg.Line(left, Top + PlotHeight, left + PanelWidth, Top + PlotHeight, width: 2));
            svg.Add(Svg.Text(left + (PanelWidth / 2), Top + PlotHeight + 46, xLabel, anchor: "middle"));
        }

        Panel(LeftA, distanceTicks, "Working distance (cm)");
        Panel(LeftB, fieldTicks, "Field on the page (mm)");
        svg.Add(new XElement(Svg.Ns + "text",
            new XAttribute("transform", $"translate(24 {Svg.Number(Top + (PlotHeight / 2))}) rotate(-90)"),
            new XAttribute("font-size", Svg.Number(Svg.LabelSize)), new XAttribute("fill", Svg.Ink), new XAttribute("text-anchor", "middle"),
            "Equivalent power (D)"));

        // The focal-point curve w = 1/F, drawn through Power.FocalLength.
        double distanceTop = distanceTicks[^1];
        var curve = new List<string>();
        for (double cm = Math.Max(distanceTop / 60, 100 / powerTop); cm <= distanceTop; cm += distanceTop / 60)
        {
            double dioptres = Optics.Quantities.Power.FromFocalLength(Distance.FromCentimetres(cm)).Dioptres;
            curve.Add(Svg.Number(LeftA + (cm / distanceTop * PanelWidth)) + "," + Svg.Number(Y(dioptres)));
        }

        if (curve.Count > 1)
            svg.Add(new XElement(Svg.Ns + "polyline", new XAttribute("points", string.Join(' ', curve)),
                new XAttribute("fill", "none"), new XAttribute("stroke", Svg.Ink), new XAttribute("stroke-width", "1.5"),
                new XAttribute("stroke-dasharray", "6 4")));

        for (int i = 0; i < options.Count; i++)
        {
            var o = options[i];
            double y = Y(o.EquivalentPower.Dioptres);
            double xa = LeftA + (o.WorkingDistance.Abs().Centimetres / distanceTop * PanelWidth);
            double xb = LeftB + (o.Field.Abs().Millimetres / fieldTicks[^1] * PanelWidth);
            foreach (var x in new[] { xa, xb })
            {
                svg.Add(Svg.Marker(i, x, y));
                svg.Add(Svg.Text(x + 11, y - 9, Count(i + 1), 15, bold: true));
            }
        }

        svg.Add(Svg.Text(LeftA, Height - 14, "Numbers match the options in the table. Dashed line: working distance = 1 / power.", 14));

        var table = new FigureTable(
            "Power, working distance and field of each option",
            ["Option", "Marker", "Equivalent power (D)", "Working distance (cm)", "Field (mm)", "Letters in view"],
            [.. options.Select((o, i) => (IReadOnlyList<string>)
            [
                Count(i + 1) + ". " + o.Name, Svg.MarkerName(i), o.EquivalentPower.Dioptres.ToString("+0.00;-0.00;0.00", _culture),
                o.WorkingDistance.Abs().Centimetres.ToString("0.0", _culture), o.Field.Abs().Millimetres.ToString("0", _culture), Count(o.LettersInView),
            ])]);
        return new TradeOffFigure(id, Title, description, Svg.Serialize(svg), table);
    }

    /// <summary>
    /// (b) A to-scale window for each option: its width is the field on the page and it holds exactly
    /// <see cref="FigureOption.LettersInView"/> letters of the target print, drawn at the same scale.
    /// </summary>
    /// <param name="options">The options to draw; at least one.</param>
    /// <param name="target">The target print size (the letters' x-height).</param>
    /// <param name="id">The svg element's id.</param>
    public TradeOffFigure LettersInView(IReadOnlyList<FigureOption> options, PrintSize target, string id = "window-figure")
    {
        CheckOptions(options);
        Svg.CheckId(id);
        if (!target.IsValid)
            throw new ArgumentException("Enter the target print size (greater than 0M) before drawing the letters in view.", nameof(target));

        const string Title = "How many letters of your print fit in each option's view";
        var description = $"Each window is drawn to the same scale: its width is the field on the page and the letters are {target.ToString(null, _culture)} print. "
            + string.Join(" ", options.Select((o, i) => $"Option {Count(i + 1)}, {o.Name}: {Mm(o.Field)} field, {Letters(o.LettersInView)} in view{Fluency(o.LettersInView)}."));

        const double Left = 20, Usable = Width - 40;
        double maxField = options.Max(o => o.Field.Abs().Millimetres);
        double xHeightMm = target.XHeightMillimetres;
        // One scale for every window; capped so that large print stays within a row.
        double scale = Math.Min(Usable / maxField, 28 / xHeightMm);
        double xHeight = xHeightMm * scale;
        double fontSize = xHeight / HyperlegibleFont.XHeightRatio.Value;
        double windowHeight = Math.Max(xHeight * 3, 28);

        double y = 30;
        var rows = new List<XElement>();
        for (int i = 0; i < options.Count; i++)
        {
            var o = options[i];
            double windowWidth = o.Field.Abs().Millimetres * scale;
            var group = new XElement(Svg.Ns + "g", new XAttribute("data-option", Count(i + 1)));
            group.Add(Svg.Text(Left, y, $"{Count(i + 1)}. {o.Name}: {Letters(o.LettersInView)}{Fluency(o.LettersInView)}", bold: true));
            y += 10;
            group.Add(Svg.Rect(Left, y, windowWidth, windowHeight, dash: o.LettersInView < FluentReadingLetters ? "6 4" : null, strokeWidth: 2.5));
            double pitch = o.LettersInView == 0 ? 0 : Math.Min(xHeight * LetterPitch, windowWidth / o.LettersInView);
            double baseline = y + (windowHeight / 2) + (xHeight / 2);
            var letters = new XElement(Svg.Ns + "g", new XAttribute("aria-hidden", "true"), new XAttribute("font-size", Svg.Number(fontSize)));
            for (int n = 0; n < o.LettersInView; n++)
                letters.Add(new XElement(Svg.Ns + "text",
                    new XAttribute("class", LetterClass),
                    new XAttribute("x", Svg.Number(Left + (pitch * n) + (pitch * 0.05))),
                    new XAttribute("y", Svg.Number(baseline)),
                    new XAttribute("fill", Svg.Ink),
                    SampleLetters[n % SampleLetters.Length].ToString()));
            group.Add(letters);
            rows.Add(group);
            y += windowHeight + 34;
        }

        // A 10 mm scale bar (or 50 mm when the scale is small) shows that the windows are to scale.
        double barMm = 10 * scale >= 40 ? 10 : 50;
        double height = y + 30;
        var svg = Svg.Root(id, Width, height, Title, description);
        svg.Add(rows);
        svg.Add(Svg.Line(Left, height - 22, Left + (barMm * scale), height - 22, width: 3));
        svg.Add(Svg.Text(Left + (barMm * scale) + 8, height - 16, barMm.ToString("0", _culture) + " mm on the page", 14));

        var table = new FigureTable(
            "Letters of the target print in each option's field",
            ["Option", "Field (mm)", "Letters in view", "Fluent reading"],
            [.. options.Select((o, i) => (IReadOnlyList<string>)
            [
                Count(i + 1) + ". " + o.Name, o.Field.Abs().Millimetres.ToString("0", _culture), Count(o.LettersInView),
                o.LettersInView >= FluentReadingLetters ? "possible" : "unlikely (fewer than 4 letters)",
            ])]);
        return new TradeOffFigure(id, Title, description, Svg.Serialize(svg), table);
    }

    /// <summary>
    /// (c) A print-size ladder in 0.1 log steps showing the target print, the client's threshold and the
    /// comfortable size (threshold × reserve), with the enlargement from target to comfortable size.
    /// </summary>
    /// <param name="data">Threshold, target and reserve.</param>
    /// <param name="id">The svg element's id.</param>
    public TradeOffFigure PrintSizeLadder(PrintLadderData data, string id = "ladder-figure")
    {
        ArgumentNullException.ThrowIfNull(data);
        Svg.CheckId(id);
        if (!data.Threshold.IsValid || !data.Target.IsValid)
            throw new ArgumentException("Enter the threshold and the target print size (greater than 0M) before drawing the ladder.", nameof(data));

        var comfortable = data.Threshold.Scale(data.Reserve.Ratio);
        double enlargement = comfortable / data.Target;
        string at = data.TestDistance is { } d ? " at " + Cm(d) : string.Empty;
        const string Title = "Print sizes: your target, the smallest you read, and a comfortable size";
        var description = $"Print sizes from small (bottom) to large (top), in steps of 0.1 log units. Target print: {M(data.Target)}. "
            + $"Smallest print read{at}: {M(data.Threshold)}. Comfortable size with a reserve of {data.Reserve.ToString(null, _culture)}: {M(comfortable)}. "
            + $"The target must look {Times(enlargement)} as large{Compared(data)} to reach the comfortable size.";

        double lowLog = Math.Floor(Math.Log10(Math.Min(data.Target.M, data.Threshold.M)) * 10) / 10 - 0.1;
        double highLog = Math.Ceiling(Math.Log10(Math.Max(data.Target.M, comfortable.M)) * 10) / 10 + 0.1;
        int steps = (int)Math.Round((highLog - lowLog) * 10);
        const double Top = 40, Step = 26, AxisX = 110, BarLeft = 130, BarWidth = 120;
        double height = Top + (steps * Step) + 60;
        double Y(double m) => Top + ((highLog - Math.Log10(m)) * 10 * Step);

        var svg = Svg.Root(id, Width, height, Title, description);
        svg.Add(new XElement(Svg.Ns + "defs", Svg.Pattern(id + "-solid", "solid"), Svg.Pattern(id + "-hatch", "hatch"), Svg.Pattern(id + "-dots", "dots")));
        svg.Add(Svg.Line(AxisX, Top, AxisX, Top + (steps * Step), width: 2));
        for (int s = 0; s <= steps; s++)
        {
            int tenths = (int)Math.Round((highLog * 10) - s);
            double m = PreferredSteps[((tenths % 10) + 10) % 10] * Math.Pow(10, Math.Floor(tenths / 10.0));
            double y = Top + (s * Step);
            svg.Add(Svg.Line(AxisX - 6, y, AxisX, y));
            svg.Add(Svg.Text(AxisX - 10, y + 5, m.ToString("0.0#", _culture) + "M", 14, "end"));
        }

        // Labels keep at least 22 px apart even when two sizes share a rung (e.g. a 1:1 reserve).
        var marks = new[]
        {
            (Size: comfortable, Pattern: "hatch", Label: $"Comfortable size: {M(comfortable)} (smallest read × {data.Reserve.ToString(null, _culture)})", Bold: false),
            (Size: data.Threshold, Pattern: "dots", Label: $"Smallest print read{at}: {M(data.Threshold)}", Bold: false),
            (Size: data.Target, Pattern: "solid", Label: $"Target print: {M(data.Target)}", Bold: true),
        }.OrderBy(mark => Y(mark.Size.M)).ToArray();
        double previousLabel = double.NegativeInfinity;
        for (int i = 0; i < marks.Length; i++)
        {
            var mark = marks[i];
            double y = Y(mark.Size.M);
            double labelY = Math.Max(y, previousLabel + 22);
            previousLabel = labelY;
            svg.Add(Svg.Rect(BarLeft, y - 9, BarWidth, 18, fill: $"url(#{id}-{mark.Pattern})"));
            svg.Add(Svg.Line(AxisX, y, BarLeft, y, width: 2));
            svg.Add(Svg.Line(BarLeft + BarWidth, y, BarLeft + BarWidth + 10, labelY, width: 1.5));
            svg.Add(Svg.Text(BarLeft + BarWidth + 14, labelY + 6, mark.Label, bold: mark.Bold));
        }

        height = Math.Max(height, previousLabel + 60);
        Svg.Resize(svg, Width, height);
        svg.Add(Svg.Text(AxisX - 90, height - 18, $"To read the target comfortably it must look {Times(enlargement)} as large{Compared(data)}.", bold: true));

        var table = new FigureTable(
            "Print sizes on the ladder",
            ["Size", "Print size (M)", "x-height (mm)"],
            [
                ["Target print", M(data.Target), data.Target.XHeightMillimetres.ToString("0.00", _culture)],
                ["Smallest print read" + at, M(data.Threshold), data.Threshold.XHeightMillimetres.ToString("0.00", _culture)],
                ["Comfortable size (reserve " + data.Reserve.ToString(null, _culture) + ")", M(comfortable), comfortable.XHeightMillimetres.ToString("0.00", _culture)],
                ["Enlargement from target to comfortable size", Times(enlargement), string.Empty],
            ]);
        return new TradeOffFigure(id, Title, description, Svg.Serialize(svg), table);
    }

    private static void CheckOptions(IReadOnlyList<FigureOption> options)
    {
        ArgumentNullException.ThrowIfNull(options);
        if (options.Count == 0)
            throw new ArgumentException("A trade-off figure needs at least one option; choose or list an option first.", nameof(options));
        foreach (var o in options)
        {
            ArgumentNullException.ThrowIfNull(o, nameof(options));
            if (o.LettersInView < 0)
                throw new ArgumentException($"Option \"{o.Name}\" has a negative letter count; pass the engine's count (0 or more).", nameof(options));
            if (o.Field.Metres <= 0 || o.WorkingDistance.Metres <= 0 || o.EquivalentPower.Dioptres <= 0)
                throw new ArgumentException($"Option \"{o.Name}\" needs a power, working distance and field greater than zero.", nameof(options));
        }
    }

    private string Compared(PrintLadderData data) => data.TestDistance is { } d ? " as it does at " + Cm(d) : string.Empty;

    private static string Fluency(int letters) => letters < FluentReadingLetters ? " (fluent reading unlikely)" : string.Empty;

    private string Count(int n) => n.ToString(_culture);

    private string Letters(int n) => n == 1 ? "1 letter" : Count(n) + " letters";

    private string Power(FigureOption o) => o.EquivalentPower.ToString(null, _culture);

    private string Cm(Distance d) => d.Abs().Centimetres.ToString("0.0", _culture) + " cm";

    private string Mm(Distance d) => d.Abs().Millimetres.ToString("0", _culture) + " mm";

    private string M(PrintSize size) => size.ToString(null, _culture);

    private string Times(double ratio) => ratio.ToString("0.#", _culture) + " times";
}
