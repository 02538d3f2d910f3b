using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Web.Plans;

namespace LowVisionAid.Web.Pages.Calculator;

/// <summary>
/// The quick calculator's field labels and messages (the page and the API share them). Names of methods and classes of
/// option are <see cref="PlanText"/>'s, the same as on the plan page.
/// </summary>
public static class CalculatorText
{
    public const string DistanceAcuityLabel = "Distance acuity";
    public const string NearAcuityLabel = "Near acuity";
    public const string TargetPrintLabel = "Print to be read";
    public const string WorkingDistanceLabel = "Working distance";
    public const string GoalAcuityLabel = "Acuity wanted for the distance task";

    public const string TaskMissing = "Choose the task: spot reading, sustained reading, writing, a screen or distance viewing.";
    public const string ReserveMissing = "Choose how far above threshold the print should be: the usual for the task, spot (1:1), fluent (2:1) or sustained (3:1).";
    public const string AgeInvalid = "Enter the age in whole years between 0 and 120, such as 78, or leave it empty.";
    public const string WorkingDistanceMissing = "Enter the distance the client wants to work at, with its unit, such as 25 cm or 10 in.";
    public const string TargetPrintMissing = "Enter the print to be read, such as 1M for newsprint, N10 or 0.8M.";
    public const string AcuityMissing = "Enter a distance acuity (such as 6/60) or a near acuity (such as 4M at 40 cm), or both.";
    public const string DistanceAcuityMissingForDistanceTask = "For distance viewing enter the distance acuity, such as 6/60 or 20/200.";
    public const string GoalAcuityMissing = "For distance viewing enter the acuity wanted, such as 6/12 for television.";
    public const string DistanceTaskDetailNote = "No print size was given: 1M is used only to count letters in view. The telescope's power comes from the two acuities.";

    /// <summary>The tasks offered, in the order shown; the first is the form's default place for the error.</summary>
    public static readonly IReadOnlyList<CalculatorChoice> Tasks =
    [
        new(nameof(ReadingTask.SpotReading), "Spot reading: labels, prices, post"),
        new(nameof(ReadingTask.SustainedReading), "Sustained reading: books, newspapers, letters"),
        new(nameof(ReadingTask.Writing), "Writing and forms (needs room for a pen)"),
        new(nameof(ReadingTask.Screen), "A computer, tablet or phone screen"),
        new(nameof(ReadingTask.DistanceViewing), "Distance viewing: television, faces, signs"),
    ];

    /// <summary>The acuity reserves offered (methods §2.3), in the order shown.</summary>
    public static readonly IReadOnlyList<CalculatorChoice> Reserves =
    [
        new(nameof(ReserveChoice.UsualForTask), "The usual for the task: 1:1 for spot reading, 2:1 for reading, writing and screens"),
        new(nameof(ReserveChoice.Spot), "Spot tasks: print just at the smallest size read (1:1)"),
        new(nameof(ReserveChoice.Fluent), "Fluent reading: print twice the smallest size read (2:1)"),
        new(nameof(ReserveChoice.Sustained), "Long or high-speed reading: print three times the smallest size read (3:1)"),
    ];

    public const string Lead = "Work out a starting plan without a client record: the power each published method asks for, and the kinds of device that could give it, with what each costs in field, working distance and depth of focus. Nothing you enter here is saved.";
    public const string ReserveHint = "The acuity reserve: how many times larger than the smallest print read the target print should look.";
    public const string MeasurementsHint = "Give a distance acuity, a near acuity, or both: each gives its own estimate.";

    public const string DistanceAcuityField = DistanceAcuityLabel + ", both eyes or the better eye";
    public const string DistanceAcuityHint = "With the distance correction, such as 6/60, 20/200, logMAR 1.0 or dec 0.1";
    public const string NearAcuityField = NearAcuityLabel + ": smallest print read and its distance";
    public const string NearAcuityHint = "Such as 4M at 40 cm, N24 at 25 cm or 0.40/2.5M, read with the add for that distance";
    public const string TargetPrintHint = "Such as 1M (newsprint), 0.8M (small print, e.g. medicine leaflets), N10 or 1.5 mm x-height. Sizes of everyday print are common practice, not exact.";
    public const string WorkingDistanceField = WorkingDistanceLabel + " the client prefers";
    public const string WorkingDistanceHint = "With its unit, such as 25 cm, 40 cm or 10 in. For distance viewing, the distance to the screen or sign, such as 3 m.";
    public const string GoalAcuityField = GoalAcuityLabel + " (distance viewing only)";
    public const string GoalAcuityHint = "Such as 6/12 for television or 6/18 for faces";
    public const string AgeField = "Age in years";
    public const string AgeHint = "Used to estimate how much the client can still focus, such as 78";
    public const string HandsFreeField = "Wants both hands free";
    public const string TremorField = "Has a tremor or cannot hold a lens steady";
    public const string OneUsefulEyeField = "Only one eye has useful vision";

    public const string StartingPointCaution = "these figures are a starting point for the licensed practitioner, not a prescription. Confirm the choice with a trial of the device on the client's own reading material.";
    public const string EstimatesAgree = "The estimates agree within 0.2 log units (two chart lines).";
    public const string ReferenceOnly = "No: shown for reference. It brings 1M print only to threshold (1:1), so it is not like for like with the estimates above (methods §2.6).";
    public const string OrderRules = "The order follows fixed rules, one after another (for example: does it give the power, enough letters in view, hands free, both eyes); the reasons are listed under each option.";

    /// <summary>One flagged disagreement between two estimates, as the page says it.</summary>
    public static string Disagreement(DisagreementView d, IFormatProvider provider)
    {
        ArgumentNullException.ThrowIfNull(d);
        return string.Create(provider, $"The {d.Higher} asks for {d.PowerRatio:0.0} times the power of the {d.Lower} ({d.DifferenceLogUnits:0.00} log units apart; more than 0.2 is flagged).");
    }

    /// <summary>The "×" labels a magnifier of this power would carry: F/4 and F/4 + 1, against 25 cm.</summary>
    public static string MagnifierLabels(double nominal, double trade, IFormatProvider provider) =>
        $"{Times(nominal, provider)} (F/4) or {Times(trade, provider)} (F/4 + 1), against 25 cm";

    /// <summary>A magnification, one decimal and "×".</summary>
    public static string Times(double value, IFormatProvider provider) => value.ToString("0.0", provider) + "×";

    /// <summary>
    /// The optics core's one dioptre label, signed as the plan page and the trade write powers ("+20.00 D"); arithmetic
    /// noise below the shown digits is dropped before rounding.
    /// </summary>
    public static string Dioptres(double value, IFormatProvider provider) =>
        Power.FromDioptres(Math.Abs(value) < 0.005 ? 0 : value).ToString(null, provider);

    /// <summary>A length in centimetres, or millimetres below 1 cm.</summary>
    public static string Centimetres(double value, IFormatProvider provider) => value < 1
        ? (value * 10).ToString("0.0", provider) + " mm"
        : value.ToString(value < 10 ? "0.0" : "0", provider) + " cm";

    public static string Letters(int? letters, IFormatProvider provider) => letters switch
    {
        null => "not limited by a lens",
        < 1 => "less than one",
        _ => letters.Value.ToString(provider),
    };

    /// <summary>Whether both eyes can be used, with the convergence and any base-in prism.</summary>
    public static string BothEyes(OptionView option, IFormatProvider provider)
    {
        ArgumentNullException.ThrowIfNull(option);
        if (!option.BothEyesPossible)
        {
            return "One eye only";
        }

        var text = "Possible";
        if (option.ConvergenceDemandPrismDioptres > 0)
        {
            text += "; convergence " + option.ConvergenceDemandPrismDioptres.ToString("0.#", provider) + " Δ";
        }

        if (option.BaseInPrismEachEyeDioptres is { } prism)
        {
            text += "; " + prism.ToString("0.#", provider) + " Δ base-in in each lens (add + 2 each eye)";
            if (option.ConvergenceLeftAfterPrismDioptres is { } left)
            {
                text += "; convergence left after the prism " + left.ToString("0.#", provider) + " Δ";
            }
        }

        return text;
    }

    /// <summary>The zoom or text size a screen option needs.</summary>
    public static string Zoom(double percent, double? pixels, IFormatProvider provider) =>
        $"{percent.ToString("0", provider)} % (text about {(pixels ?? 0).ToString("0", provider)} px)";

    /// <summary>The label of an option's field, as the plan page words it (<see cref="OptionNotes.FieldLabel"/>).</summary>
    public static string FieldLabel(OptionView option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return OptionNotes.FieldLabel(Enum.Parse<OptionKind>(option.Kind));
    }

    /// <summary>The label of an option's focusing, as the plan page words it (<see cref="OptionNotes.FocusingLabel"/>).</summary>
    public static string FocusingLabel(OptionView option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return OptionNotes.FocusingLabel(Enum.Parse<OptionKind>(option.Kind));
    }

    /// <summary>The power an option gives against the power needed.</summary>
    public static string PowerGiven(OptionView option, IFormatProvider provider)
    {
        ArgumentNullException.ThrowIfNull(option);
        return $"{Dioptres(option.DeliveredPowerDioptres, provider)} ({(option.MeetsRequiredPower ? "meets" : "falls short of")} the {Dioptres(option.RequiredPowerDioptres, provider)} needed)";
    }

    /// <summary>A magnification with the magnification needed, when known.</summary>
    public static string Magnification(double times, double? needed, IFormatProvider provider) =>
        Times(times, provider) + (needed is { } n ? " (" + Times(n, provider) + " needed)" : "");

    public static string BasisEstimate(PowerMethod method, double dioptres, IFormatProvider provider) =>
        $"The options are worked out for {Dioptres(dioptres, provider)}, from the {PlanText.Method(method)} estimate.";

    public static string BasisDistanceTask(double dioptres, IFormatProvider provider) =>
        $"The options are worked out for {Dioptres(dioptres, provider)}, from the ratio of the present acuity to the acuity wanted, at the viewing distance.";
}

/// <summary>One radio choice: the value posted and its label.</summary>
public sealed record CalculatorChoice(string Value, string Label);
