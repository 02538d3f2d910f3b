using LowVisionAid.Optics.Requirement;

namespace LowVisionAid.Web.Calculator;

/// <summary>
/// The quick calculator's field labels and messages (the page and the API share them). Names of methods and classes of
/// option are <see cref="Plans.PlanText"/>'s, the same as on the plan page.
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

    public static string BasisEstimate(PowerMethod method, double dioptres, IFormatProvider provider) =>
        string.Create(provider, $"The options are worked out for {dioptres:0.00} D, from the {Plans.PlanText.Method(method)} estimate.");

    public static string BasisDistanceTask(double dioptres, IFormatProvider provider) =>
        string.Create(provider, $"The options are worked out for {dioptres:0.00} D, from the ratio of the present acuity to the acuity wanted, at the viewing distance.");
}
