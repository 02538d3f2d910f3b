using System.Globalization;
using LowVisionAid.Data.Entities;
using Microsoft.AspNetCore.Mvc.Rendering;

namespace LowVisionAid.Web;

/// <summary>
/// The words the pages show for stored record values: dates, choices and outcomes. A plan's words (classes of
/// option, device kinds, methods, tasks, reserves) are <see cref="Plans.PlanText"/>'s.
/// </summary>
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

    public static IReadOnlyList<SelectListItem> Choices<T>(Func<T, string> label) where T : struct, Enum =>
        [.. Enum.GetValues<T>().Select(v => new SelectListItem(label(v), v.ToString()))];
}
