using System.Globalization;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Pdf;
using PdfSharp.Drawing;
using PdfSharp.UniversalAccessibility;

namespace LowVisionAid.Reports.Handouts;

/// <summary>
/// Renders the client handout: large print at the size this client needs (<see cref="HandoutPrint"/>), one and a half
/// line spacing, left-aligned, black on white, plain language, tagged for screen readers; for each device (declined
/// ones left out) what it is, its task, the glasses to wear, the distances, what is seen at once and the steps; the
/// cautions and care that belong to those devices; one line printed at the client's target print size.
/// </summary>
/// <param name="formatProvider">Culture for numbers and dates; the invariant culture when null.</param>
public sealed class ClientHandoutRenderer(IFormatProvider? formatProvider = null) : IReportRenderer<ClientHandout>
{
    private const double Margin = 54; // 0.75 in
    // From the short text's size on, a 0.5 in margin (within what office printers print) gives a line and a few
    // letters more on each page.
    private const double LargePrintMargin = 36;
    // A last page less full than this is laid out again with tighter gaps between blocks.
    private const double NearlyEmpty = 0.25;
    private readonly IFormatProvider _culture = formatProvider ?? CultureInfo.InvariantCulture;

    /// <summary>The point size that gives <paramref name="target"/> as the x-height of the embedded face.</summary>
    /// <param name="target">The print size in M units.</param>
    public static double PointsFor(PrintSize target) => target.ToPoints(HyperlegibleFont.XHeightRatio);

    /// <summary>The characters drawn in the handout's window: words with their spaces.</summary>
    internal const string ViewLetters = HandoutWording.ViewPhrase;

    /// <inheritdoc/>
    public ReportResult Render(ClientHandout model)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (Validate(model) is { } error)
            return ReportResult.Fail(error);

        var devices = model.DevicesToPrint;
        if (devices.Count == 0)
            return ReportResult.Fail(ReportMessages.OnlyDeclinedDevices);
        var notices = model.Devices.Where(d => d.TrialDeclined)
            .Select(d => d.Name + " was declined at its trial, so the handout leaves it out.").ToList();
        var fit = HandoutPrint.Fit(model, _culture);
        if (fit.ClinicianNote is { } note)
            notices.Add(note);

        HyperlegibleFont.EnsureRegistered();
        // Laid out to count the pages (and see how full the last is), then again with the count in the footers.
        var (spacing, pages) = PageFlow.ChooseSpacing(gaps => Layout(model, devices, fit, gaps, null).Count, NearlyEmpty);
        var pdf = Layout(model, devices, fit, spacing, pages).Pdf;
        return ReportResult.Ok(pdf, FileNames.For("handout", model.ClientCode), notices);
    }

    private ((byte[] Bytes, int Pages) Pdf, (int Pages, double LastFill) Count) Layout(ClientHandout model, IReadOnlyList<HandoutDevice> devices, HandoutPrintFit fit, double spacing, int? pageCount)
    {
        using var document = PdfOutput.Create("Your magnifier plan, client " + model.ClientCode, model.Clinic.Name, model.IssuedOn);
        double body = fit.BodyPoints;
        double line = body * 1.5;
        double margin = fit.ShortText ? LargePrintMargin : Margin;
        double gap = line * 0.25 * spacing;
        var regular = new XFont(HyperlegibleFont.FamilyName, body, XFontStyleEx.Regular);
        var bold = new XFont(HyperlegibleFont.FamilyName, body, XFontStyleEx.Bold);
        // Headings stand out by weight and a few points; at very large body sizes they grow no more than that.
        // In the short version (very large print) headings are the body size in bold, which saves a line on most.
        var heading = new XFont(HyperlegibleFont.FamilyName, fit.ShortText ? body : body + Math.Min(body / 3, 8), XFontStyleEx.Bold);
        var title = new XFont(HyperlegibleFont.FamilyName, body + Math.Min(body * 2 / 3, fit.ShortText ? 8 : 14), XFontStyleEx.Bold);
        (int, double) count;

        // The footer: its line of text at the body size, the rule above it and a little white between.
        using (var flow = new PageFlow(document, model.Paper, margin, body * 2.1, "Client code " + model.ClientCode, regular, pageCount)
        {
            HeadingRoom = (heading.Size * 1.4) + (line * 0.5 * spacing) + (gap * 2),
        })
        {
            double TextHeight(string text, double indent = 0, bool whole = false) => flow.Height(text, regular, line, indent, whole);

            // A heading stays on the page of the block after it.
            void Heading(string text, double next)
            {
                flow.Space(line * 0.5 * spacing);
                flow.Paragraph(text, heading, heading.Size * 1.4, tag: PdfBlockLevelElementTag.Heading2, keepWithNext: next + gap);
                flow.Space(gap * 0.5);
            }

            void SubHeading(string text, double next)
            {
                flow.Space(gap);
                flow.Paragraph(text, bold, line, tag: PdfBlockLevelElementTag.Heading3, keepWithNext: next);
            }

            void Text(string text) => flow.Paragraph(text, regular, line);

            void List(IReadOnlyList<string> items, bool numbered)
            {
                double indent = body * (numbered ? 1.8 : 1.5);
                flow.Begin(PdfBlockLevelElementTag.List);
                for (int i = 0; i < items.Count; i++)
                {
                    flow.Paragraph(items[i], regular, line, indent, numbered ? (i + 1).ToString(_culture) + "." : "•");
                    flow.Space(gap * 0.6);
                }

                flow.End();
            }

            void Section(string name, IReadOnlyList<string> items)
            {
                items = [.. items.Where(i => !string.IsNullOrWhiteSpace(i))];
                if (items.Count == 0)
                    return;
                Heading(name, TextHeight(items[0], body * 1.5, whole: true));
                List(items, numbered: false);
            }

            void Contact()
            {
                // The contact block: heading, name and every way to reach the clinic.
                var contact = new List<string> { model.Clinic.Name, "Phone: " + model.Clinic.Phone };
                if (!string.IsNullOrWhiteSpace(model.Clinic.Email))
                    contact.Add("Email: " + model.Clinic.Email);
                if (!string.IsNullOrWhiteSpace(model.Clinic.Address))
                    contact.Add("Address: " + model.Clinic.Address);
                Heading(HandoutWording.ContactUs, TextHeight(contact[0]));
                foreach (var item in contact)
                    Text(item);
            }

            if (fit.ShortText)
            {
                // Very large print: the essentials only (ShortHandout); the clinician is told to offer the whole text
                // in other forms. A heading stays with the line or point after it.
                var lines = ShortHandout.Lines(model, _culture);
                for (int i = 0; i < lines.Count; i++)
                {
                    var (part, text) = lines[i];
                    switch (part)
                    {
                        case ShortHandoutPart.Title:
                            flow.Paragraph(text, title, title.Size * 1.3, tag: PdfBlockLevelElementTag.Heading1);
                            break;
                        case ShortHandoutPart.Gap:
                            flow.Space(gap);
                            break;
                        case ShortHandoutPart.Heading:
                            var after = lines[i + 1];
                            Heading(text, after.Part == ShortHandoutPart.Point ? TextHeight(after.Text, body * 1.5, whole: true) : TextHeight(after.Text));
                            break;
                        case ShortHandoutPart.Point:
                            var points = lines.Skip(i).TakeWhile(l => l.Part == ShortHandoutPart.Point).Select(l => l.Text).ToList();
                            List(points, numbered: false);
                            i += points.Count - 1;
                            break;
                        default:
                            Text(text);
                            break;
                    }
                }

                count = (flow.PageCount, flow.LastPageFill);
                return (pageCount is null ? default : PdfOutput.Save(document), count);
            }

            flow.Paragraph(HandoutWording.Title, title, title.Size * 1.3, tag: PdfBlockLevelElementTag.Heading1);
            flow.Paragraph(model.Clinic.Name, bold, line);
            Text(ShortHandout.ClientLine(model));
            Text("Given on: " + Date(model.IssuedOn));
            Text("Next visit: " + (model.FollowUpOn is { } next ? Date(next) : "the clinic will call you to book it"));
            Text("Clinic phone: " + model.Clinic.Phone);

            foreach (var device in devices)
            {
                var what = "What it is: " + device.WhatItIs;
                Heading(ShortHandout.DeviceHeading(device), TextHeight(what));
                Text(what);
                flow.Space(gap);
                Text("Use it for: " + device.Task);
                if (DeviceWording.Glasses(device.Kind, device.ReadingAdd, _culture) is { } glasses)
                {
                    flow.Space(gap);
                    Text("Glasses: " + glasses);
                }

                if (device.Distances.Count > 0)
                {
                    var distances = device.Distances.Select(d => d.What + ": " + Length(d.Distance)).ToList();
                    SubHeading("Distances to keep", TextHeight(distances[0], body * 1.5, whole: true));
                    List(distances, numbered: false);
                }

                if (device.View is { LettersInView: > 0 } view && view.Field.Abs().Millimetres > 0 && view.Target.IsValid)
                {
                    bool drawn = WindowWidth(view) <= flow.Width;
                    var words = HandoutWording.ViewText(view.LettersInView, drawn);
                    SubHeading(HandoutWording.ViewHeading, TextHeight(words) + (drawn ? WindowHeight(view, line) : 0));
                    Text(words);
                    if (drawn)
                        DrawView(flow, view, line, words);
                }

                if (device.HowToUse.Count > 0)
                {
                    SubHeading("How to use it", TextHeight(device.HowToUse[0], body * 1.8, whole: true));
                    List(device.HowToUse, numbered: true);
                }
            }

            Section(HandoutWording.StaySafe, model.CautionsToPrint);
            Section("Light", model.Light);
            Section("Practice", model.Practice);
            Section("Looking after it", model.CareToPrint);
            Section("If it stops helping", model.IfItStopsHelping);

            var checkText = "The line that follows is printed at the size of the print you want to read ("
                + model.TargetPrint.ToString(null, _culture) + "). Try it at home with your magnifier. If it gets harder to read, call the clinic.";
            double targetPoints = PointsFor(model.TargetPrint);
            var target = new XFont(HyperlegibleFont.FamilyName, targetPoints, XFontStyleEx.Regular);
            double checkLine = Math.Max(targetPoints * 1.5, line);
            // The short check block stays whole with its heading: the line at the target size is read with its explanation.
            Heading("Check your print size", TextHeight(checkText, whole: true) + gap + flow.Height(HandoutWording.TargetSizeLine, target, checkLine, whole: true));
            Text(checkText);
            flow.Space(gap);
            flow.Paragraph(HandoutWording.TargetSizeLine, target, checkLine);

            Contact();

            count = (flow.PageCount, flow.LastPageFill);
        }

        return (pageCount is null ? default : PdfOutput.Save(document), count);
    }

    private static double WindowWidth(HandoutView view) => (view.Field.Abs().Millimetres * PointsPerMillimetre) + (WindowBorder * 2);

    private static double WindowHeight(HandoutView view, double line) => Math.Max(PointsFor(view.Target) * 2.2, line * 1.5) + (WindowBorder * 2);

    private const double PointsPerMillimetre = 72 / 25.4;
    private const double WindowBorder = 3;

    // The window is the field on the page at full size (1 pt = 25.4/72 mm); the characters are words of the target
    // print at its size in this face, one every 1.1 x-heights (methods §4.2, spaces included), or closer when the
    // plan's count would otherwise run the last letter (at most 1.25 x-heights wide) past the window's edge.
    private static void DrawView(PageFlow flow, HandoutView view, double line, string altText)
    {
        double width = WindowWidth(view);
        double points = PointsFor(view.Target);
        double xHeight = view.Target.XHeightMillimetres * PointsPerMillimetre;
        // Up to half an x-height of white inside the border on each side, from what the letters leave free.
        double slack = width - (WindowBorder * 2) - (xHeight * 1.25) - (xHeight * 1.1 * (view.LettersInView - 1));
        double padding = Math.Clamp(slack / 2, 0, xHeight * 0.5);
        double inner = width - (WindowBorder * 2) - (padding * 2);
        double pitch = view.LettersInView == 1 ? 0 : Math.Min(xHeight * 1.1, (inner - (xHeight * 1.25)) / (view.LettersInView - 1));
        var font = new XFont(HyperlegibleFont.FamilyName, points, XFontStyleEx.Regular);
        var characters = string.Concat(Enumerable.Range(0, view.LettersInView).Select(n => ViewLetters[n % ViewLetters.Length]));
        flow.Space(line * 0.2);
        flow.Window(width, WindowHeight(view, line) - (WindowBorder * 2), characters, font, pitch, WindowBorder, padding, altText);
        flow.Space(line * 0.2);
    }

    private static string? Validate(ClientHandout model)
    {
        if (ReportMessages.MissingCommon(model.Devices?.Select(d => d?.Name), model.ClientCode, model.Clinic) is { } missing)
            return missing;
        if (!(model.BodyPoints >= ClientHandout.DefaultBodyPoints && model.BodyPoints <= ClientHandout.MaximumBodyPoints))
            return ReportMessages.BodySizeOutOfRange;
        if (!(model.TargetPrint.M >= ClientHandout.MinimumTargetM && model.TargetPrint.M <= ClientHandout.MaximumTargetM))
            return ReportMessages.TargetOutOfRange;
        return null;
    }

    private string Date(DateOnly date) => date.ToString("dddd d MMMM yyyy", _culture);

    private string Length(Distance distance)
    {
        var magnitude = distance.Abs();
        // A room-sized distance reads better in metres and feet (1 ft = 12 in, international inch).
        return magnitude.Metres >= 1
            ? magnitude.Metres.ToString("0.#", _culture) + " m (" + (magnitude.Inches / 12).ToString("0.#", _culture) + " feet)"
            : magnitude.Centimetres.ToString("0.#", _culture) + " cm (" + magnitude.Inches.ToString("0.#", _culture) + " inches)";
    }
}
