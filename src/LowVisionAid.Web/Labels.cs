using System.Globalization;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Kit;
using Microsoft.AspNetCore.Mvc.Rendering;

namespace LowVisionAid.Web;

/// <summary>The words the pages show for stored values: dates, choices and outcomes, in one place.</summary>
internal static class Labels
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public static string Date(DateOnly date) => date.ToString("d MMM yyyy", Invariant);

    public static string Date(DateOnly? date, string missing = "—") => date is { } d ? Date(d) : missing;

    public static string Number(int? value, string missing = "—") => value?.ToString(Invariant) ?? missing;

    public static string Text(string? value, string missing = "—") => string.IsNullOrWhiteSpace(value) ? missing : value;

    public static string Outcome(TrialOutcome outcome) => outcome switch
    {
        TrialOutcome.Dispensed => "Dispensed",
        TrialOutcome.Loaned => "Loaned",
        TrialOutcome.Ordered => "Ordered",
        TrialOutcome.Declined => "Declined",
        _ => outcome.ToString(),
    };

    public static string FollowUp(DateOnly? due, DateOnly? done) => (due, done) switch
    {
        (_, { } d) => "Done " + Date(d),
        ({ } d, null) => "Due " + Date(d),
        _ => "None booked",
    };

    public static string Task(GoalTask task) => task switch
    {
        GoalTask.Newspaper => "Newspaper",
        GoalTask.Book => "Book or magazine",
        GoalTask.MedicationLabels => "Medication labels",
        GoalTask.Phone => "Phone screen",
        GoalTask.Writing => "Writing and forms",
        GoalTask.Mail => "Letters and bills",
        GoalTask.Television => "Television",
        GoalTask.Faces => "Faces",
        GoalTask.Other => "Other task",
        GoalTask.Whiteboard => "Whiteboard or board",
        GoalTask.Signs => "Signs",
        _ => task.ToString(),
    };

    public static string Eyes(UsefulEyes eyes) => eyes switch
    {
        UsefulEyes.Both => "Both eyes",
        UsefulEyes.RightOnly => "Right eye only",
        UsefulEyes.LeftOnly => "Left eye only",
        _ => eyes.ToString(),
    };

    public static string Lighting(HomeLighting lighting) => lighting switch
    {
        HomeLighting.NotAsked => "Not asked",
        HomeLighting.Good => "Good",
        HomeLighting.Dim => "Dim",
        HomeLighting.Poor => "Poor",
        _ => lighting.ToString(),
    };

    public static string Kind(DeviceKind kind) => kind switch
    {
        DeviceKind.SpectacleAdd => "Reading spectacles (high add)",
        DeviceKind.HandMagnifier => "Hand magnifier",
        DeviceKind.StandMagnifier => "Stand magnifier",
        DeviceKind.NearTelescope => "Near telescope",
        DeviceKind.DistanceTelescope => "Distance telescope",
        DeviceKind.VideoMagnifier => "Video magnifier",
        _ => kind.ToString(),
    };

    public static IReadOnlyList<SelectListItem> Choices<T>(Func<T, string> label) where T : struct, Enum =>
        [.. Enum.GetValues<T>().Select(v => new SelectListItem(label(v), v.ToString()))];
}
