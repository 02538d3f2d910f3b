using System.Collections.Immutable;
using System.Globalization;
using CsvHelper;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Kit;

/// <summary>One problem in a catalogue file: the file row (the header is row 1), the column, and what to enter.</summary>
/// <param name="Row">The row in the file, counting the header as row 1.</param>
/// <param name="Column">The column name, or an empty string for a problem with the whole row.</param>
/// <param name="Message">What is wrong and what to enter instead.</param>
public readonly record struct KitCsvError(int Row, string Column, string Message)
{
    /// <summary>"Row 3, column power_d: …".</summary>
    public override string ToString() => Column.Length == 0
        ? string.Create(CultureInfo.InvariantCulture, $"Row {Row}: {Message}")
        : string.Create(CultureInfo.InvariantCulture, $"Row {Row}, column {Column}: {Message}");
}

/// <summary>The outcome of reading a catalogue file: every device, or (if anything is wrong) no devices and every error.</summary>
public sealed class KitCsvImport
{
    private KitCsvImport(ImmutableArray<KitDevice> devices, ImmutableArray<KitCsvError> errors)
    {
        Devices = devices;
        Errors = errors;
    }

    /// <summary>True when the whole file was read; false means nothing was imported.</summary>
    public bool Success => Errors.IsEmpty;

    /// <summary>The devices, empty when there is any error.</summary>
    public ImmutableArray<KitDevice> Devices { get; }

    /// <summary>Every problem found, in file order.</summary>
    public ImmutableArray<KitCsvError> Errors { get; }

    /// <summary>The encoding the file was read as (<see cref="KitCsvText"/>); UTF-8 for text given as text.</summary>
    public string Encoding { get; private init; } = KitCsvText.Utf8;

    internal KitCsvImport ReadAs(string encoding) => new(Devices, Errors) { Encoding = encoding };

    internal static KitCsvImport Ok(ImmutableArray<KitDevice> devices) => new(devices, []);

    internal static KitCsvImport Failed(ImmutableArray<KitCsvError> errors) => new([], errors);
}

/// <summary>
/// Reads and writes the clinic's device catalogue as CSV with our own column set (see docs/kit-csv.md): comma
/// separated, a header row, invariant numbers (a point for decimals). A bad file is rejected whole.
/// </summary>
public static class KitCsv
{
    /// <summary>The columns in file order. <c>id</c>, <c>name</c> and <c>kind</c> are required; the others may be empty.</summary>
    public static ImmutableArray<string> Columns { get; } =
    [
        "id", "name", "kind", "power_d", "label_times", "label_convention", "aperture_mm", "stand_height_cm",
        "image_below_lens_cm", "enlargement_ratio", "magnification", "reading_cap_d", "field_deg", "focus_nearest_m",
        "illuminated", "notes",
    ];

    private static readonly ImmutableArray<string> RequiredColumns = ["id", "name", "kind"];

    private static readonly CsvReaderOptions ReaderOptions = new()
    {
        Separator = ',',
        HasHeader = true,
        TrimWhitespace = true,
        SkipEmptyLines = true,
        TrackLineNumbers = true,
        MalformedData = CsvMalformedDataHandling.Throw,
        FieldCountMismatch = CsvFieldCountHandling.Allow,
        FormatProvider = CultureInfo.InvariantCulture,
    };

    // CsvHelper's formula guard: text starting with = + - @, a tab or a CR gets an apostrophe (and quotes), so a
    // spreadsheet shows it as text; numbers are written as numbers and never get one.
    private static readonly CsvWriterOptions WriterOptions = new()
    {
        Separator = ',',
        FormatProvider = CultureInfo.InvariantCulture,
        NewLine = "\n",
        Injection = CsvInjection.Escape,
    };

    /// <summary>The format of every number written: invariant, at most ten decimals (unit conversions leave no binary noise).</summary>
    private const string NumberFormat = "0.##########";

    private static readonly (string Text, DeviceKind Kind)[] Kinds =
    [
        ("spectacle-add", DeviceKind.SpectacleAdd), ("hand", DeviceKind.HandMagnifier), ("stand", DeviceKind.StandMagnifier),
        ("near-telescope", DeviceKind.NearTelescope), ("distance-telescope", DeviceKind.DistanceTelescope), ("video", DeviceKind.VideoMagnifier),
    ];

    private static readonly (string Text, LabelConvention Convention)[] Conventions =
    [
        ("nominal", LabelConvention.Nominal), ("trade", LabelConvention.Trade), ("nominal-40cm", LabelConvention.Nominal40Centimetres),
    ];

    /// <summary>
    /// Reads a catalogue file as uploaded: its bytes are decoded as the encoding they are in (<see cref="KitCsvText"/>),
    /// or the file is refused with the encoding to save it in. Either every row is imported or none is.
    /// </summary>
    public static KitCsvImport Import(ReadOnlySpan<byte> file)
    {
        var (text, encoding) = KitCsvText.Decode(file);
        return text is null
            ? KitCsvImport.Failed([new KitCsvError(1, string.Empty, encoding)])
            : Import(new StringReader(text)).ReadAs(encoding);
    }

    /// <summary>Reads a catalogue. Either every row is imported or none is.</summary>
    public static KitCsvImport Import(TextReader reader)
    {
        ArgumentNullException.ThrowIfNull(reader);
        var errors = ImmutableArray.CreateBuilder<KitCsvError>();
        var devices = ImmutableArray.CreateBuilder<KitDevice>();
        using var csv = CsvReader.Create(reader, ReaderOptions, leaveOpen: true);
        IReadOnlyList<string> header;
        try
        {
            csv.ReadHeader();
            header = csv.Headers;
            if (header.Count == 0 || (header.Count == 1 && header[0].Length == 0))
            {
                return KitCsvImport.Failed([new KitCsvError(1, string.Empty, "The file is empty: the first row must name the columns, e.g. " + string.Join(",", RequiredColumns) + ".")]);
            }
        }
        catch (CsvFormatException ex)
        {
            return KitCsvImport.Failed([new KitCsvError(1, string.Empty, "The header row cannot be read as CSV: " + ex.Message)]);
        }

        var index = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        for (var i = 0; i < header.Count; i++)
        {
            var name = header[i].Trim();
            if (!Columns.Contains(name, StringComparer.OrdinalIgnoreCase))
            {
                errors.Add(new KitCsvError(1, name, "Unknown column; the columns are: " + string.Join(", ", Columns) + "."));
            }
            else if (!index.TryAdd(name, i))
            {
                errors.Add(new KitCsvError(1, name, "This column appears twice; keep one."));
            }
        }

        foreach (var required in RequiredColumns)
        {
            if (!index.ContainsKey(required))
            {
                errors.Add(new KitCsvError(1, required, "This column is required."));
            }
        }

        if (errors.Count > 0)
        {
            return KitCsvImport.Failed(errors.ToImmutable());
        }

        var ids = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        try
        {
            while (csv.Read())
            {
                var row = (int)csv.LineNumber;
                if (csv.FieldCount != header.Count)
                {
                    errors.Add(new KitCsvError(row, string.Empty, string.Create(CultureInfo.InvariantCulture, $"This row has {csv.FieldCount} fields but the header has {header.Count}; check for a missing or extra comma (quote text that contains commas).")));
                    continue;
                }

                var fields = new RowReader(csv, index, row, errors);
                var device = fields.ReadDevice();
                if (device is null)
                {
                    continue;
                }

                if (!ids.Add(device.Id))
                {
                    errors.Add(new KitCsvError(row, "id", "This id is already used by an earlier row; each device needs its own id."));
                }

                foreach (var problem in device.Check())
                {
                    errors.Add(new KitCsvError(row, ColumnFor(problem.Field), problem.Message));
                }

                devices.Add(device);
            }
        }
        catch (CsvFormatException ex)
        {
            errors.Add(new KitCsvError((int)ex.LineNumber, string.Empty, "This row cannot be read as CSV (check the quotes): " + ex.Message));
        }

        return errors.Count > 0 ? KitCsvImport.Failed(errors.ToImmutable()) : KitCsvImport.Ok(devices.ToImmutable());
    }

    /// <summary>Writes a catalogue with every column, invariant numbers to at most ten decimals (unit conversions leave no binary noise).</summary>
    public static void Export(IEnumerable<KitDevice> devices, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(devices);
        ArgumentNullException.ThrowIfNull(writer);
        using var csv = CsvWriter.Create(writer, WriterOptions, leaveOpen: true);
        foreach (var column in Columns)
        {
            csv.WriteField(column);
        }

        csv.EndRecord();
        foreach (var d in devices)
        {
            csv.WriteField(d.Id);
            csv.WriteField(d.Name);
            csv.WriteField(Kinds.First(k => k.Kind == d.Kind).Text);
            csv.WriteField(d.Power?.Dioptres, NumberFormat);
            csv.WriteField(d.Label?.Times, NumberFormat);
            csv.WriteField(d.Label is { } label ? Conventions.First(c => c.Convention == label.Convention).Text : string.Empty);
            csv.WriteField(d.Aperture?.Millimetres, NumberFormat);
            csv.WriteField(d.StandHeight?.Centimetres, NumberFormat);
            csv.WriteField(d.ImageBelowLens?.Centimetres, NumberFormat);
            csv.WriteField(d.EnlargementRatio, NumberFormat);
            csv.WriteField(d.Magnification, NumberFormat);
            csv.WriteField(d.ReadingCap?.Dioptres, NumberFormat);
            csv.WriteField(d.Field?.Degrees, NumberFormat);
            csv.WriteField(d.FocusNearest?.Metres, NumberFormat);
            csv.WriteField(d.Illuminated ? "yes" : "no");
            csv.WriteField(d.Notes ?? string.Empty);
            csv.EndRecord();
        }
    }

    private static string ColumnFor(string field) => field switch
    {
        nameof(KitDevice.Id) => "id",
        nameof(KitDevice.Name) => "name",
        nameof(KitDevice.Kind) => "kind",
        nameof(KitDevice.Power) => "power_d",
        nameof(KitDevice.Label) => "label_times",
        nameof(KitDevice.Aperture) => "aperture_mm",
        nameof(KitDevice.StandHeight) => "stand_height_cm",
        nameof(KitDevice.ImageBelowLens) => "image_below_lens_cm",
        nameof(KitDevice.EnlargementRatio) => "enlargement_ratio",
        nameof(KitDevice.Magnification) => "magnification",
        nameof(KitDevice.ReadingCap) => "reading_cap_d",
        nameof(KitDevice.Field) => "field_deg",
        nameof(KitDevice.FocusNearest) => "focus_nearest_m",
        _ => field,
    };

    /// <summary>Reads one data row's fields, adding an error for each bad value.</summary>
    private sealed class RowReader(CsvReader csv, Dictionary<string, int> index, int row, ImmutableArray<KitCsvError>.Builder errors)
    {
        private bool _bad;

        public KitDevice? ReadDevice()
        {
            var id = Text("id");
            var name = Text("name");
            var kindText = Text("kind");
            DeviceKind? kind = null;
            foreach (var (text, value) in Kinds)
            {
                if (string.Equals(text, kindText, StringComparison.OrdinalIgnoreCase))
                {
                    kind = value;
                }
            }

            if (kind is null)
            {
                Error("kind", "Enter one of: " + string.Join(", ", Kinds.Select(k => k.Text)) + ".");
            }

            var power = Double("power_d", "a power in dioptres, e.g. 12 or 2.5");
            var labelTimes = Double("label_times", "a label such as 3 for \"3×\"");
            var conventionText = Text("label_convention");
            LabelConvention? convention = null;
            if (conventionText.Length > 0)
            {
                foreach (var (text, value) in Conventions)
                {
                    if (string.Equals(text, conventionText, StringComparison.OrdinalIgnoreCase))
                    {
                        convention = value;
                    }
                }

                if (convention is null)
                {
                    Error("label_convention", "Enter one of: " + string.Join(", ", Conventions.Select(c => c.Text)) + ".");
                }
            }

            if (labelTimes is not null && convention is null && conventionText.Length == 0)
            {
                Error("label_convention", "A \"×\" label alone is not accepted: enter its convention (nominal, trade or nominal-40cm), or the power in dioptres.");
            }

            var aperture = Double("aperture_mm", "the clear aperture in millimetres, e.g. 50");
            var standHeight = Double("stand_height_cm", "the stand height in centimetres, e.g. 3.3");
            var image = Double("image_below_lens_cm", "the image position below the lens in centimetres, e.g. 10");
            var ratio = Double("enlargement_ratio", "an enlargement ratio such as 3");
            var magnification = Double("magnification", "a magnification such as 4");
            var cap = Double("reading_cap_d", "a reading cap power in dioptres, e.g. 4");
            var field = Double("field_deg", "a field in degrees, e.g. 10");
            var focus = Double("focus_nearest_m", "the nearest focus in metres, e.g. 1.5");
            var illuminated = Bool("illuminated");
            var notes = Text("notes");
            if (_bad || kind is null)
            {
                return null;
            }

            try
            {
                return new KitDevice
                {
                    Id = id,
                    Name = name,
                    Kind = kind.Value,
                    Power = power is { } p ? Power.FromDioptres(p) : null,
                    Label = labelTimes is { } t && convention is { } c ? new KitLabel(t, c) : null,
                    Aperture = aperture is { } a ? Distance.FromMillimetres(a) : null,
                    StandHeight = standHeight is { } h ? Distance.FromCentimetres(h) : null,
                    ImageBelowLens = image is { } i ? Distance.FromCentimetres(i) : null,
                    EnlargementRatio = ratio,
                    Magnification = magnification,
                    ReadingCap = cap is { } rc ? Power.FromDioptres(rc) : null,
                    Field = field is { } f ? VisualAngle.FromDegrees(f) : null,
                    FocusNearest = focus is { } fn ? Distance.FromMetres(fn) : null,
                    Illuminated = illuminated,
                    Notes = notes.Length == 0 ? null : notes,
                };
            }
            catch (ArgumentOutOfRangeException ex)
            {
                Error("field_deg", ex.Message);
                return null;
            }
        }

        // A control character (NUL, escape, …) is never part of a device's text; line breaks and tabs only in notes.
        // An apostrophe before a formula character is the export's formula guard, so it is taken off again.
        private string Text(string column)
        {
            if (!index.TryGetValue(column, out var i))
            {
                return string.Empty;
            }

            var text = (csv.GetString(i) ?? string.Empty).Trim();
            for (var at = 0; at < text.Length; at++)
            {
                if (char.IsControl(text[at]) && !(column == "notes" && text[at] is '\r' or '\n' or '\t'))
                {
                    Error(column, string.Create(CultureInfo.InvariantCulture,
                        $"Character {at + 1} is a control character (U+{(int)text[at]:X4}), which cannot be stored; delete it (it often comes from text copied out of another program) and save the file again."));
                    return string.Empty;
                }
            }

            return text.Length >= 2 && text[0] == '\'' && text[1] is '=' or '+' or '-' or '@' ? text[1..] : text;
        }

        private double? Double(string column, string example)
        {
            var text = Text(column);
            if (text.Length == 0)
            {
                return null;
            }

            if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && double.IsFinite(value))
            {
                return value;
            }

            Error(column, $"\"{text}\" is not a number: enter {example}, with a point for decimals.");
            return null;
        }

        private bool Bool(string column)
        {
            var text = Text(column);
            switch (text.ToUpperInvariant())
            {
                case "" or "NO" or "FALSE" or "0":
                    return false;
                case "YES" or "TRUE" or "1":
                    return true;
                default:
                    Error(column, $"\"{text}\" is not yes or no: enter yes or no.");
                    return false;
            }
        }

        private void Error(string column, string message)
        {
            _bad = true;
            errors.Add(new KitCsvError(row, column, message));
        }
    }
}
