using System.Globalization;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Pdf;
using PdfSharp.Drawing;

namespace LowVisionAid.Reports.Handouts;

/// <summary>
/// Renders the client handout: large print (18 pt body by default), one and a half line spacing, left-aligned,
/// black on white, no pictures under text, plain language, with every caution in <see cref="HandoutWording.Cautions"/>
/// and one line printed at the client's target print size.
/// </summary>
/// <param name="formatProvider">Culture for numbers and dates; the invariant culture when null.</param>
public sealed class ClientHandoutRenderer(IFormatProvider? formatProvider = null) : IReportRenderer<ClientHandout>
{
    private const double Margin = 54; // 0.75 in
    private readonly IFormatProvider _culture = formatProvider ?? CultureInfo.InvariantCulture;

    /// <summary>The point size that gives <paramref name="target"/> as the x-height of the embedded face.</summary>
    /// <param name="target">The print size in M units.</param>
    public static double PointsFor(PrintSize target) => target.ToPoints(HyperlegibleFont.XHeightRatio);

    /// <inheritdoc/>
    public ReportResult Render(ClientHandout model)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (Validate(model) is { } error)
            return ReportResult.Fail(error);

        HyperlegibleFont.EnsureRegistered();
        using var document = PdfOutput.Create("Your magnifier plan, client " + model.ClientCode, model.Clinic.Name, model.IssuedOn);

        double body = model.BodyPoints;
        double line = body * 1.5;
        var regular = new XFont(HyperlegibleFont.FamilyName, body, XFontStyleEx.Regular);
        var bold = new XFont(HyperlegibleFont.FamilyName, body, XFontStyleEx.Bold);
        var heading = new XFont(HyperlegibleFont.FamilyName, body * 4 / 3, XFontStyleEx.Bold);
        var title = new XFont(HyperlegibleFont.FamilyName, body * 5 / 3, XFontStyleEx.Bold);

        using (var flow = new PageFlow(document, model.Paper, Margin, footerHeight: body * 2.5))
        {
            void Heading(string text)
            {
                flow.Space(line * 0.5);
                flow.KeepTogether((heading.Size * 1.4) + (line * 2));
                flow.Paragraph(text, heading, heading.Size * 1.4);
                flow.Space(line * 0.2);
            }

            void Text(string text) => flow.Paragraph(text, regular, line);

            void List(IEnumerable<string> items)
            {
                foreach (var item in items.Where(i => !string.IsNullOrWhiteSpace(i)))
                {
                    flow.Paragraph(item, regular, line, indent: body * 1.5, marker: "•");
                    flow.Space(line * 0.2);
                }
            }

            void Steps(IReadOnlyList<string> items)
            {
                for (int i = 0; i < items.Count; i++)
                {
                    flow.Paragraph(items[i], regular, line, indent: body * 1.8, marker: (i + 1).ToString(_culture) + ".");
                    flow.Space(line * 0.2);
                }
            }

            flow.Paragraph("Your magnifier plan", title, title.Size * 1.3);
            flow.Paragraph(model.Clinic.Name, bold, line);
            Text(ClientLine(model));
            Text("Given on: " + Date(model.IssuedOn));
            Text("Next visit: " + (model.FollowUpOn is { } next ? Date(next) : "the clinic will call you to book it"));
            Text("Clinic phone: " + model.Clinic.Phone);

            foreach (var device in model.Devices)
            {
                Heading("Your " + LowerFirst(device.Name));
                Text("What it is: " + device.WhatItIs);
                flow.Space(line * 0.2);
                Text("Use it for: " + device.Task);
                if (device.Distances.Count > 0)
                {
                    flow.Space(line * 0.2);
                    flow.Paragraph("Distances to keep", bold, line);
                    List(device.Distances.Select(d => d.What + ": " + Length(d.Distance)));
                }

                if (device.View is { LettersInView: > 0 } view && view.Field.Abs().Millimetres > 0 && view.Target.IsValid)
                {
                    flow.Space(line * 0.2);
                    flow.Paragraph(HandoutWording.ViewHeading, bold, line);
                    DrawView(flow, view, line, Text);
                }

                if (device.HowToUse.Count > 0)
                {
                    flow.Space(line * 0.2);
                    flow.Paragraph("How to use it", bold, line);
                    Steps(device.HowToUse);
                }
            }

            Heading("Stay safe");
            List(HandoutWording.Cautions.Concat(model.Devices.Any(d => d.HasLightOrBattery) ? [HandoutWording.LightOrBattery] : []));

            Section("Light", model.Light);
            Section("Practice", model.Practice);
            Section("Looking after it", model.Care);
            Section("If it stops helping", model.IfItStopsHelping);

            Heading("Check your print size");
            Text("The line below is printed at the size of the print you want to read ("
                + model.TargetPrint.ToString(null, _culture) + "). Try it at home with your magnifier. If it gets harder to read, call the clinic.");
            flow.Space(line * 0.3);
            double targetPoints = PointsFor(model.TargetPrint);
            var target = new XFont(HyperlegibleFont.FamilyName, targetPoints, XFontStyleEx.Regular);
            flow.Paragraph(HandoutWording.TargetSizeLine, target, Math.Max(targetPoints * 1.5, line));

            Heading("Questions? Contact us");
            Text(model.Clinic.Name);
            Text("Phone: " + model.Clinic.Phone);
            if (!string.IsNullOrWhiteSpace(model.Clinic.Email))
                Text("Email: " + model.Clinic.Email);
            if (!string.IsNullOrWhiteSpace(model.Clinic.Address))
                Text("Address: " + model.Clinic.Address);

            flow.Finish("Client code " + model.ClientCode, regular);

            void Section(string name, IReadOnlyList<string> items)
            {
                if (items.Count == 0)
                    return;
                Heading(name);
                List(items);
            }
        }

        return ReportResult.Ok(PdfOutput.Save(document), FileNames.For("handout", model.ClientCode));
    }

    /// <summary>The letters drawn in the handout's window: the figures' set, none much wider than an x-height.</summary>
    internal const string ViewLetters = Figures.TradeOffFigures.SampleLetters;

    // The window is the field on the page at full size (1 pt = 25.4/72 mm); the letters are the target print at
    // its size in this face, spaced 1.1 x-heights apart (methods §4.2), or closer when the plan's count would
    // otherwise run the last letter (at most 1.25 x-heights wide) past the window's edge.
    private void DrawView(PageFlow flow, HandoutView view, double line, Action<string> text)
    {
        const double PointsPerMillimetre = 72 / 25.4;
        const double Border = 3;
        double width = (view.Field.Abs().Millimetres * PointsPerMillimetre) + (Border * 2);
        bool drawn = width <= flow.Width;
        text(HandoutWording.ViewText(view.LettersInView, Length(view.Field), drawn));
        if (!drawn)
            return;

        double points = PointsFor(view.Target);
        double xHeight = view.Target.XHeightMillimetres * PointsPerMillimetre;
        double inner = width - (Border * 2);
        double pitch = view.LettersInView == 1 ? 0 : Math.Min(xHeight * 1.1, (inner - (xHeight * 1.25)) / (view.LettersInView - 1));
        var font = new XFont(HyperlegibleFont.FamilyName, points, XFontStyleEx.Regular);
        var letters = string.Concat(Enumerable.Range(0, view.LettersInView).Select(n => ViewLetters[n % ViewLetters.Length]));
        flow.Space(line * 0.3);
        flow.Window(width, Math.Max(points * 2.2, line * 1.5), letters, font, pitch, Border);
        flow.Space(line * 0.3);
    }

    private static string? Validate(ClientHandout model)
    {
        if (model.Devices is null || model.Devices.Count == 0)
            return ReportMessages.NoChosenOption;
        if (model.Devices.Any(d => d is null || string.IsNullOrWhiteSpace(d.Name)))
            return ReportMessages.UnnamedDevice;
        if (string.IsNullOrWhiteSpace(model.ClientCode))
            return ReportMessages.NoClientCode;
        if (model.Clinic is null || string.IsNullOrWhiteSpace(model.Clinic.Name) || string.IsNullOrWhiteSpace(model.Clinic.Phone))
            return ReportMessages.NoClinicContact;
        if (!(model.BodyPoints >= ClientHandout.DefaultBodyPoints && model.BodyPoints <= ClientHandout.MaximumBodyPoints))
            return ReportMessages.BodySizeOutOfRange;
        if (!(model.TargetPrint.M >= ClientHandout.MinimumTargetM && model.TargetPrint.M <= ClientHandout.MaximumTargetM))
            return ReportMessages.TargetOutOfRange;
        return null;
    }

    private static string ClientLine(ClientHandout model) => string.IsNullOrWhiteSpace(model.ClientName)
        ? "Client code: " + model.ClientCode
        : "For: " + model.ClientName + " (client code " + model.ClientCode + ")";

    private static string LowerFirst(string name) =>
        name.Length > 1 && char.IsUpper(name[0]) && !char.IsUpper(name[1]) ? char.ToLowerInvariant(name[0]) + name[1..] : name;

    private string Date(DateOnly date) => date.ToString("dddd d MMMM yyyy", _culture);

    private string Length(Distance distance)
    {
        var magnitude = distance.Abs();
        return magnitude.Centimetres.ToString("0.#", _culture) + " cm (" + magnitude.Inches.ToString("0.#", _culture) + " inches)";
    }
}
