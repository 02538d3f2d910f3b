using System.Globalization;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Reports.Handouts;

/// <summary>What a line of the short handout is, which decides how it is set.</summary>
public enum ShortHandoutPart
{
    /// <summary>The document's title.</summary>
    Title,

    /// <summary>A line of running text.</summary>
    Line,

    /// <summary>A little white between two groups of lines.</summary>
    Gap,

    /// <summary>A section's heading: a device, the safety lines, the contact.</summary>
    Heading,

    /// <summary>A point of a bulleted list (the safety lines).</summary>
    Point,
}

/// <summary>One line of the short handout, in reading order.</summary>
public readonly record struct ShortHandoutLine(ShortHandoutPart Part, string Text);

/// <summary>
/// The short handout for very large print (from <see cref="HandoutPrint.ShortTextFrom"/>): its lines in reading order,
/// the one text that both the PDF (<see cref="ClientHandoutRenderer"/>) and the browser's print view show. Title,
/// client, where to get the whole text in another form, each device with its task, its setting, its distances in one
/// unit and its glasses in a few words, one or two safety lines chosen by class, and the clinic's name and phone.
/// </summary>
public static class ShortHandout
{
    /// <summary>The short handout's lines for the devices the handout prints (declined ones left out).</summary>
    /// <param name="model">The handout.</param>
    /// <param name="formatProvider">Culture for numbers; the invariant culture when null.</param>
    public static IReadOnlyList<ShortHandoutLine> Lines(ClientHandout model, IFormatProvider? formatProvider = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        var culture = formatProvider ?? CultureInfo.InvariantCulture;
        var devices = model.DevicesToPrint;
        var lines = new List<ShortHandoutLine>
        {
            new(ShortHandoutPart.Title, HandoutWording.Title),
            new(ShortHandoutPart.Line, ClientLine(model)),
            new(ShortHandoutPart.Gap, ""),
            new(ShortHandoutPart.Line, HandoutWording.ShortOtherForm),
        };
        foreach (var device in devices)
        {
            lines.Add(new(ShortHandoutPart.Heading, DeviceHeading(device)));
            lines.Add(new(ShortHandoutPart.Line, "Use it for: " + device.Task));
            if (DeviceWording.Setting(device.Kind, device.Screen) is { } setting)
                lines.Add(new(ShortHandoutPart.Line, setting));
            foreach (var distance in device.Distances)
                lines.Add(new(ShortHandoutPart.Line, distance.What + ": " + Length(distance.Distance, model.Paper, culture)));
            if (DeviceWording.ShortGlasses(device.Kind, device.ReadingAdd, culture) is { } glasses)
                lines.Add(new(ShortHandoutPart.Line, "Glasses: " + glasses + "."));
        }

        lines.Add(new(ShortHandoutPart.Heading, HandoutWording.StaySafe));
        lines.AddRange(HandoutWording.ShortCautionsFor(devices).Select(c => new ShortHandoutLine(ShortHandoutPart.Point, c)));
        lines.Add(new(ShortHandoutPart.Heading, HandoutWording.ContactUs));
        lines.Add(new(ShortHandoutPart.Line, model.Clinic.Name));
        lines.Add(new(ShortHandoutPart.Line, "Phone: " + model.Clinic.Phone));
        return lines;
    }

    /// <summary>Who the handout is for: the name and code, or the code alone.</summary>
    public static string ClientLine(ClientHandout model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return string.IsNullOrWhiteSpace(model.ClientName)
            ? "Client code: " + model.ClientCode
            : "For: " + model.ClientName + " (client code " + model.ClientCode + ")";
    }

    /// <summary>A device's heading: "Your hand magnifier", "Your video magnifier".</summary>
    public static string DeviceHeading(HandoutDevice device)
    {
        ArgumentNullException.ThrowIfNull(device);
        var name = device.Name;
        return "Your " + (name.Length > 1 && char.IsUpper(name[0]) && !char.IsUpper(name[1]) ? char.ToLowerInvariant(name[0]) + name[1..] : name);
    }

    // The short version gives each distance in one unit, a line shorter at 48 pt: inches or feet where the clinic
    // prints on Letter (imperial units), centimetres or metres on A4.
    private static string Length(Distance distance, PaperSize paper, IFormatProvider culture)
    {
        var magnitude = distance.Abs();
        return (paper, magnitude.Metres >= 1) switch
        {
            (PaperSize.Letter, true) => (magnitude.Inches / 12).ToString("0.#", culture) + " feet",
            (PaperSize.Letter, false) => magnitude.Inches.ToString("0.#", culture) + " inches",
            (_, true) => magnitude.Metres.ToString("0.#", culture) + " m",
            _ => magnitude.Centimetres.ToString("0.#", culture) + " cm",
        };
    }
}
