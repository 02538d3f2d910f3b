using System.Globalization;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Reports.Summaries;

/// <summary>
/// The clinician summary's words: its title, record, tables' columns and rows, reasons and notes, the one text that
/// both the PDF (<see cref="ClinicianSummaryRenderer"/>) and the browser's print view show, in the same order.
/// </summary>
/// <param name="formatProvider">Culture for numbers and dates; the invariant culture when null.</param>
public sealed class SummaryText(IFormatProvider? formatProvider = null)
{
    private readonly IFormatProvider _culture = formatProvider ?? CultureInfo.InvariantCulture;

    /// <summary>The document's title.</summary>
    public const string Title = "Magnifier plan: clinician summary";

    /// <summary>The acuity table's columns.</summary>
    public static readonly IReadOnlyList<string> AcuityColumns = ["Measured", "As typed", "As read"];

    /// <summary>The estimates table's columns.</summary>
    public static readonly IReadOnlyList<string> EstimateColumns = ["Method", "Power", "EVD", "Reserve", "Basis"];

    /// <summary>The trials table's columns.</summary>
    public static readonly IReadOnlyList<string> TrialColumns = ["Date", "Device", "Task", "Result", "Outcome"];

    /// <summary>The clinic's name and every way to reach it, on one line.</summary>
    public static string ClinicLine(ClinicianSummary model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return string.Join("  ·  ", new[] { model.Clinic.Name, model.Clinic.Phone, model.Clinic.Email, model.Clinic.Address }
            .Where(s => !string.IsNullOrWhiteSpace(s)));
    }

    /// <summary>The record: client, date assessed, clinician, method version.</summary>
    public IReadOnlyList<string[]> Record(ClinicianSummary model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return
        [
            ["Client", string.IsNullOrWhiteSpace(model.ClientName) ? model.ClientCode : model.ClientName + " (" + model.ClientCode + ")"],
            ["Assessed on", model.AssessedOn.ToString("d MMMM yyyy", _culture)],
            ["Clinician", model.Clinician ?? "not recorded"],
            ["Method version", model.MethodVersion],
        ];
    }

    /// <summary>Each eye's distance acuity and the near acuity, as typed and as read; empty when none was given.</summary>
    public IReadOnlyList<string[]> Acuity(ClinicianSummary model)
    {
        ArgumentNullException.ThrowIfNull(model);
        var rows = (model.Eyes ?? []).Select(e => new[] { e.Eye + " (distance)", e.AsTyped, e.AsRead is { } a ? "logMAR " + a.LogMar.ToString("0.00", _culture) : "not a chart acuity" }).ToList();
        if (model.Near is { } near)
        {
            rows.Add(["Near (smallest print read)", near.AsTyped,
                near.Threshold.ToString(null, _culture) + " at " + Length(near.TestDistance) + ", logMAR " + near.Threshold.LogMarAt(near.TestDistance).ToString("0.00", _culture)]);
        }

        return rows;
    }

    /// <summary>The reading curve's results in a sentence: critical print size and maximum reading speed, or why none.</summary>
    public string CurveResult(ReadingCurveRecord curve)
    {
        ArgumentNullException.ThrowIfNull(curve);
        return curve.CriticalPrint is { } cps && curve.MaximumReadingSpeed is { } mrs
            ? "Critical print size " + cps.ToString(null, _culture) + " at " + Length(curve.TestDistance) + " (logMAR "
                + cps.LogMarAt(curve.TestDistance).ToString("0.00", _culture) + "); maximum reading speed "
                + mrs.ToString("0", _culture) + " words a minute."
            : "No critical print size: " + (curve.Refusal ?? "the curve did not level off.");
    }

    /// <summary>The curve's usable points, largest print first.</summary>
    public static IReadOnlyList<ReadingCurvePoint> CurvePoints(ReadingCurveRecord curve)
    {
        ArgumentNullException.ThrowIfNull(curve);
        return [.. curve.Points.Where(p => p.Print.IsValid && p.WordsPerMinute >= 0).OrderByDescending(p => p.Print.M)];
    }

    /// <summary>The reading curve table's columns.</summary>
    public IReadOnlyList<string> CurveColumns(ReadingCurveRecord curve)
    {
        ArgumentNullException.ThrowIfNull(curve);
        return ["Print size", "logMAR at " + Length(curve.TestDistance), "Words a minute"];
    }

    /// <summary>The reading curve's points as rows: print size, its logMAR at the test distance, words a minute.</summary>
    public IReadOnlyList<string[]> CurveRows(ReadingCurveRecord curve)
    {
        ArgumentNullException.ThrowIfNull(curve);
        return [.. CurvePoints(curve).Select(p => new[]
        {
            p.Print.ToString(null, _culture), p.Print.LogMarAt(curve.TestDistance).ToString("0.00", _culture), p.WordsPerMinute.ToString("0", _culture),
        })];
    }

    /// <summary>Each method's estimate: power, equivalent viewing distance, reserve and basis (flagged when it differs).</summary>
    public IReadOnlyList<string[]> Estimates(ClinicianSummary model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return [.. model.Estimates.Select(e => new[]
        {
            e.Method,
            e.EquivalentPower is { } p ? p.ToString(null, _culture) : "not available",
            e.EquivalentPower is { Dioptres: > 0 } q ? q.FocalLength.ToString(null, _culture) : "–",
            e.Reserve is { } r ? r.ToString(null, _culture) : "none",
            e.DisagreesWithOthers ? e.Basis + ". Differs from another estimate by more than 0.2 log units." : e.Basis,
        })];
    }

    /// <summary>The chosen options' heading.</summary>
    public static string ChosenHeading(ClinicianSummary model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return model.ChosenOptions.Count == 1 ? "Chosen option" : "Chosen options";
    }

    /// <summary>An option's name with the task it was chosen for.</summary>
    public static string OptionHeading(ChosenOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return option.Task is null ? option.Name : option.Name + " (for " + option.Task + ")";
    }

    /// <summary>
    /// An option's figures: kind, power, working distance, field, letters in view, then the caller's others. A figure
    /// the caller gives under the same label is shown once, in the caller's words (its units, its rounding).
    /// </summary>
    public IReadOnlyList<OptionFigure> Figures(ChosenOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        var figures = new List<OptionFigure>
        {
            new("Kind", option.Kind),
            new("Equivalent power", option.EquivalentPower.ToString(null, _culture)),
            new("Working distance", Length(option.WorkingDistance)),
        };
        if (option.Field is { } field)
            figures.Add(new(option.Family is { } family ? OptionNotes.FieldLabel(family) : OptionNotes.FieldOnPage, field.Abs().Millimetres.ToString("0", _culture) + " mm"));
        if (option.LettersInView is { } letters)
            figures.Add(new("Letters in view", letters.ToString(_culture)));
        figures.RemoveAll(f => option.OtherFigures.Any(o => string.Equals(o.Label, f.Label, StringComparison.Ordinal)));
        figures.AddRange(option.OtherFigures);
        return figures;
    }

    /// <summary>An option's reasons, each labelled "For:" or "Against:" when they were weighed.</summary>
    public static IReadOnlyList<string> Reasons(ChosenOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return option.WeighedReasons is { Count: > 0 } weighed
            ? [.. weighed.Select(r => (r.For ? "For: " : "Against: ") + r.Text)]
            : option.Reasons;
    }

    /// <summary>What the client takes home and why at that size, or null when the summary has no handout reader.</summary>
    public string? Handout(ClinicianSummary model)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (model.HandoutReader is null)
            return null;
        var fit = Handouts.HandoutPrint.Fit(model.HandoutReader, model.HandoutMinimumPoints, _culture);
        return fit.ClinicianNote ?? string.Create(_culture,
            $"Printed at {fit.BodyPoints:0} pt, at least the print the client needs ({(fit.Needed is { } m ? m.M.ToString("0.#", _culture) + "M, " : string.Empty)}{fit.NeededPoints ?? fit.BodyPoints:0} pt) and the clinic's smallest size.");
    }

    /// <summary>The trials as rows: date, device, task, result, outcome.</summary>
    public static IReadOnlyList<string[]> Trials(ClinicianSummary model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return [.. model.Trials.Select(t => new[] { t.Date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture), t.Device, t.Task, t.Result, t.Outcome })];
    }

    /// <summary>A length in centimetres with inches beside it.</summary>
    public string Length(Distance distance)
    {
        var magnitude = distance.Abs();
        return magnitude.Centimetres.ToString("0.0", _culture) + " cm (" + magnitude.Inches.ToString("0.0", _culture) + " in)";
    }
}
