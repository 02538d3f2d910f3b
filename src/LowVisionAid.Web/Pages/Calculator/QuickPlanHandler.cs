using System.Globalization;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Web.Plans;

namespace LowVisionAid.Web.Pages.Calculator;

/// <summary>The outcome of the quick calculator: messages keyed by input name, or the plan.</summary>
/// <param name="Errors">What to correct, keyed by the <see cref="QuickPlanInput"/> property ("" for the form as a whole).</param>
/// <param name="Plan">The plan, when there were no errors.</param>
public sealed record QuickPlanOutcome(IReadOnlyDictionary<string, string> Errors, QuickPlanView? Plan);

/// <summary>
/// Works out a plan from typed inputs, for the quick calculator page and the API alike: reads each input with the
/// optics core's parsers, estimates the required power by every method that has its inputs, compares them, and asks
/// the planner for the options. Stores nothing.
/// </summary>
public sealed class QuickPlanHandler
{
    /// <summary>
    /// Used only to count letters in view for distance viewing when no print size is given (the telescope's power
    /// comes from the acuities). Stated beside the result.
    /// </summary>
    private static readonly PrintSize DistanceTaskDetail = PrintSize.FromM(1);

    public QuickPlanOutcome Handle(QuickPlanInput input, IFormatProvider provider)
    {
        ArgumentNullException.ThrowIfNull(input);
        var errors = new Dictionary<string, string>(StringComparer.Ordinal);
        var understood = new List<UnderstoodInput>();

        var task = ReadTask(input.Task, errors);
        var distanceTask = task == ReadingTask.DistanceViewing;
        var reserve = ReadReserve(input.Reserve, errors);

        var distanceAcuity = Optional(input.DistanceAcuity, nameof(input.DistanceAcuity), CalculatorText.DistanceAcuityLabel,
            text => DistanceAcuityNotation.Parse(text, provider),
            a => $"{DistanceAcuityNotation.Format(a, AcuityNotation.SnellenMetres, provider)} = {DistanceAcuityNotation.Format(a, AcuityNotation.SnellenFeet, provider)} ({DistanceAcuityNotation.Format(a, AcuityNotation.LogMar, provider)})",
            errors, understood);
        var nearAcuity = Optional(input.NearAcuity, nameof(input.NearAcuity), CalculatorText.NearAcuityLabel,
            text => NearAcuityNotation.Parse(text, provider),
            n => $"{NearAcuityNotation.Format(n, provider)} (logMAR {n.Acuity.LogMar.ToString("0.00", provider)})",
            errors, understood);
        var target = Optional(input.TargetPrint, nameof(input.TargetPrint), CalculatorText.TargetPrintLabel,
            text => PrintSizeNotation.Parse(text, provider),
            p => ReadBackText.PrintSize(p, provider),
            errors, understood);
        var distance = Optional(input.WorkingDistance, nameof(input.WorkingDistance), CalculatorText.WorkingDistanceLabel,
            text => DistanceNotation.Parse(text, provider),
            d => DistanceNotation.Format(d, provider),
            errors, understood);
        var goal = distanceTask
            ? Optional(input.GoalDistanceAcuity, nameof(input.GoalDistanceAcuity), CalculatorText.GoalAcuityLabel,
                text => DistanceAcuityNotation.Parse(text, provider),
                a => $"{DistanceAcuityNotation.Format(a, AcuityNotation.SnellenMetres, provider)} ({DistanceAcuityNotation.Format(a, AcuityNotation.LogMar, provider)})",
                errors, understood)
            : null;
        var age = ReadAge(input.Age, errors);
        if (age is { } years)
        {
            understood.Add(new(nameof(input.Age), "Age", input.Age!.Trim(), years.ToString(provider) + " years", null));
        }

        RequireWhenMissing(input, task, distanceAcuity, nearAcuity, target, distance, goal, errors);
        if (task is { } kind && distance is { } typed && TaskRules.For(kind).CheckDistance(typed) is { } outOfRange)
        {
            errors.TryAdd(nameof(input.WorkingDistance), outOfRange);
        }

        if (errors.Count > 0 || task is null || reserve is not { } readReserve || distance is null)
        {
            return new(errors, null);
        }

        var targetPrint = target ?? DistanceTaskDetail;
        if (target is null)
        {
            understood.Add(new(nameof(input.TargetPrint), CalculatorText.TargetPrintLabel, "", PrintSizeNotation.Format(targetPrint, PrintSizeUnit.MUnits, provider), CalculatorText.DistanceTaskDetailNote));
        }

        // The planner makes every estimate the measurements allow, compares them, and works the options out from
        // the preferred one (methods §2.1–2.6); the calculator only reads what was typed and shows the result.
        var request = new PlanRequest
        {
            TargetPrint = targetPrint,
            PreferredDistance = distance.Value,
            Task = task.Value,
            DistanceAcuity = distanceAcuity,
            GoalDistanceAcuity = goal,
            Estimates = new EstimateInputs
            {
                ReserveChoice = readReserve.Choice,
                NearThresholdPrint = nearAcuity?.Threshold,
                NearTestDistance = nearAcuity?.TestDistance,
            },
            Constraints = new ClientConstraints
            {
                HandsFreeWanted = input.HandsFree,
                Tremor = input.Tremor,
                UsefulEyes = input.OneUsefulEye ? 1 : 2,
                AgeYears = age,
            },
        };

        var problems = Planner.Check(request);
        if (!problems.IsEmpty)
        {
            errors[""] = string.Join(" ", problems);
            return new(errors, null);
        }

        var result = Planner.Build(request);
        var comparison = result.Estimates;
        var basis = result.RequiredPowerFrom is { } method
            ? CalculatorText.BasisEstimate(method, result.RequiredPower.Dioptres, provider)
            : CalculatorText.BasisDistanceTask(result.RequiredPower.Dioptres, provider);

        var view = new QuickPlanView(
            result.MethodVersion,
            understood,
            comparison is null ? [] : [.. comparison.Estimates.Select(e => View(e, provider))],
            comparison is null ? [] : [.. comparison.Disagreements.Select(d => new DisagreementView(
                PlanText.Method(d.Lower.Method), PlanText.Method(d.Higher.Method), d.DifferenceLogUnits, d.PowerRatio))],
            result.RequiredPower.Dioptres,
            basis,
            [.. result.Options.Select(o => View(o, provider))],
            [.. result.NotConsidered.Select(n => new NotConsideredView(n.Kind.ToString(), PlanText.Kind(n.Kind), n.Reason))],
            [.. result.Cautions.Select(c => new CautionView(c.Id, c.Text))])
        {
            ReserveUsed = result.Reserve?.Reserve.ToString(null, provider),
            ReserveWhy = result.Reserve?.FormatWhy(provider),
            ReferenceEstimates = comparison is null ? [] : [.. comparison.ForReference.Select(e => View(e, provider))],
            PossibleReasons = comparison is null ? [] : comparison.FormatPossibleReasons(provider),
            BlurToleranceDioptres = result.BlurTolerance.Dioptres,
        };
        return new(errors, view);
    }

    private static T? Optional<T>(
        string? text, string field, string label, Func<string, Optics.Text.ParseResult<T>> parse, Func<T, string> show,
        Dictionary<string, string> errors, List<UnderstoodInput> understood)
        where T : struct
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return null;
        }

        var result = parse(text);
        if (!result.TryGetValue(out var value))
        {
            errors[field] = result.Error!;
            return null;
        }

        understood.Add(new(field, label, text.Trim(), show(value), result.Warning));
        return value;
    }

    private static ReadingTask? ReadTask(string? text, Dictionary<string, string> errors)
    {
        if (Enum.TryParse<ReadingTask>(text, ignoreCase: true, out var task) && Enum.IsDefined(task) && !int.TryParse(text, out _))
        {
            return task;
        }

        errors[nameof(QuickPlanInput.Task)] = CalculatorText.TaskMissing;
        return null;
    }

    /// <summary>The reserve level chosen, or null in <c>Choice</c> for the task's usual level (<see cref="TaskRules"/>); null overall when unreadable.</summary>
    private static (ReserveLevel? Choice, bool Read)? ReadReserve(string? text, Dictionary<string, string> errors)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return (null, true);
        }

        if (Enum.TryParse<ReserveChoice>(text, ignoreCase: true, out var choice) && Enum.IsDefined(choice) && !int.TryParse(text, out _))
        {
            ReserveLevel? reserve = choice switch
            {
                ReserveChoice.Spot => ReserveLevel.Spot,
                ReserveChoice.Fluent => ReserveLevel.Fluent,
                ReserveChoice.Sustained => ReserveLevel.Sustained,
                _ => null,
            };
            return (reserve, true);
        }

        errors[nameof(QuickPlanInput.Reserve)] = CalculatorText.ReserveMissing;
        return null;
    }

    private static int? ReadAge(string? text, Dictionary<string, string> errors)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return null;
        }

        if (int.TryParse(text.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var age) && age is >= 0 and <= 120)
        {
            return age;
        }

        errors[nameof(QuickPlanInput.Age)] = CalculatorText.AgeInvalid;
        return null;
    }

    private static void RequireWhenMissing(
        QuickPlanInput input, ReadingTask? task, Acuity? distanceAcuity, NearAcuity? nearAcuity, PrintSize? target, Distance? distance, Acuity? goal,
        Dictionary<string, string> errors)
    {
        void Need(string field, bool typed, bool read, string message)
        {
            // A field that was typed but not read already has the parser's message.
            if (!typed && !read)
            {
                errors.TryAdd(field, message);
            }
        }

        Need(nameof(input.WorkingDistance), !string.IsNullOrWhiteSpace(input.WorkingDistance), distance is not null, CalculatorText.WorkingDistanceMissing);
        if (task == ReadingTask.DistanceViewing)
        {
            Need(nameof(input.DistanceAcuity), !string.IsNullOrWhiteSpace(input.DistanceAcuity), distanceAcuity is not null, CalculatorText.DistanceAcuityMissingForDistanceTask);
            Need(nameof(input.GoalDistanceAcuity), !string.IsNullOrWhiteSpace(input.GoalDistanceAcuity), goal is not null, CalculatorText.GoalAcuityMissing);
        }
        else if (task is not null)
        {
            Need(nameof(input.TargetPrint), !string.IsNullOrWhiteSpace(input.TargetPrint), target is not null, CalculatorText.TargetPrintMissing);
            if (string.IsNullOrWhiteSpace(input.DistanceAcuity) && string.IsNullOrWhiteSpace(input.NearAcuity))
            {
                errors.TryAdd(nameof(input.DistanceAcuity), CalculatorText.AcuityMissing);
            }
        }
    }

    private static EstimateView View(PowerEstimate e, IFormatProvider provider) => new(
        e.Method.ToString(),
        PlanText.Method(e.Method),
        e.EquivalentPower.Dioptres,
        e.EquivalentViewingDistance.Centimetres,
        e.Magnification,
        e.ReferenceDistance.Centimetres,
        e.Reserve?.ToString(null, provider),
        e.Reserve?.Ratio,
        e.LogUnits,
        e.Assumptions);

    private static OptionView View(RankedOption ranked, IFormatProvider provider)
    {
        var o = ranked.Option;
        return new OptionView
        {
            Position = ranked.Position,
            Kind = o.Kind.ToString(),
            Name = PlanText.Kind(o.Kind),
            Summary = o.Summary(provider),
            IsApplicable = o.IsApplicable,
            NotApplicableBecause = o.NotApplicableBecause,
            MeetsRequiredPower = o.MeetsRequiredPower,
            IsPractical = o.IsPractical,
            PracticalNote = o.PracticalNote,
            RequiredPowerDioptres = o.RequiredPower.Dioptres,
            DeliveredPowerDioptres = o.DeliveredPower.Dioptres,
            LensPowerDioptres = o.LensPower?.Dioptres,
            LabelNominal = o.Labels?.Nominal,
            LabelTrade = o.Labels?.Trade,
            WorkingDistanceCm = o.WorkingDistance.Abs().Centimetres,
            EyeToLensCm = o.EyeToLens?.Abs().Centimetres,
            LinearFieldCm = o.LinearField?.Abs().Centimetres,
            CharactersInView = o.CharactersInView,
            LettersInView = o.LettersInView,
            Magnification = (o as DistanceTelescopeOption)?.Magnification ?? (o as NearTelescopeOption)?.Magnification,
            MagnificationNeeded = (o as DistanceTelescopeOption)?.MagnificationNeeded,
            ZoomPercent = (o as ScreenMagnificationOption)?.ZoomPercent,
            TextSizePixels = (o as ScreenMagnificationOption)?.FontSizePixels,
            DepthOfFieldCm = o.DepthOfField?.Abs().Centimetres,
            BothEyesPossible = o.Binocular.Feasible,
            ConvergenceDemandPrismDioptres = o.Binocular.ConvergenceDemand,
            BaseInPrismEachEyeDioptres = o.Binocular.BaseInPrismEachEye,
            ConvergenceLeftAfterPrismDioptres = o.Binocular.BaseInPrismEachEye is null ? null : o.Binocular.ResidualConvergence,
            AccommodationOrAddNeededDioptres = o.AccommodationOrAddNeeded.Dioptres,
            HandsFree = o.HandsFree,
            SuitsTremor = o.SuitsTremor,
            Posture = o.Posture,
            LightAndContrast = o.LightAndContrast,
            FluencyWarning = MagnifierOption.FluencyText(o.Fluency),
            AberrationAdvice = o.Aberrations is null ? null : AberrationNotes.Advice,
            Reasons = [.. ranked.Reasons.Select(r => new ReasonView(r.Rule.ToString(), r.InFavour, r.Text))],
        };
    }
}
