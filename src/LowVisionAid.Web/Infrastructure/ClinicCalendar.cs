using System.Globalization;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// The clinic's calendar: today's date and the local time of stored instants in the clinic's time zone, over the
/// app's <see cref="TimeProvider"/>. Instants are stored in UTC; staff see them in the clinic's zone, and dates are
/// taken in that zone, so a plan made at 23:30 local time is dated that day, not the next.
/// </summary>
public sealed class ClinicCalendar
{
    /// <summary>Configuration key for the clinic's time zone (an IANA or Windows id, e.g. "Europe/Dublin"); default the machine's own.</summary>
    public const string TimeZoneKey = "ClinicTimeZone";

    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;
    private readonly TimeProvider _clock;

    public ClinicCalendar(TimeProvider clock, TimeZoneInfo? zone = null)
    {
        ArgumentNullException.ThrowIfNull(clock);
        _clock = clock;
        Zone = zone ?? clock.LocalTimeZone;
    }

    public TimeZoneInfo Zone { get; }

    /// <summary>Now, in the clinic's zone.</summary>
    public DateTimeOffset Now => TimeZoneInfo.ConvertTime(_clock.GetUtcNow(), Zone);

    /// <summary>Today's date in the clinic's zone.</summary>
    public DateOnly Today => DateOnly.FromDateTime(Now.DateTime);

    /// <summary>A stored UTC instant in the clinic's zone.</summary>
    public DateTimeOffset Local(DateTime utc) =>
        TimeZoneInfo.ConvertTime(new DateTimeOffset(DateTime.SpecifyKind(utc, DateTimeKind.Utc)), Zone);

    /// <summary>The clinic's date of a stored UTC instant.</summary>
    public DateOnly DateOf(DateTime utc) => DateOnly.FromDateTime(Local(utc).DateTime);

    /// <summary>A stored UTC instant as the clinic's time of day, e.g. "14:05".</summary>
    public string TimeOf(DateTime utc) => Local(utc).ToString("HH:mm", Invariant);

    /// <summary>A stored UTC instant as the clinic's date and time, e.g. "3 Dec 2026 14:05".</summary>
    public string DateAndTime(DateTime utc) => Local(utc).ToString("d MMM yyyy HH:mm", Invariant);

    /// <summary>The calendar for the configured zone; an unknown zone id fails at start with a message that names the key.</summary>
    public static ClinicCalendar From(IConfiguration configuration, TimeProvider clock)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var id = configuration[TimeZoneKey];
        if (string.IsNullOrWhiteSpace(id))
        {
            return new ClinicCalendar(clock);
        }

        try
        {
            return new ClinicCalendar(clock, TimeZoneInfo.FindSystemTimeZoneById(id.Trim()));
        }
        catch (TimeZoneNotFoundException e)
        {
            throw new InvalidOperationException($"The setting {TimeZoneKey} names a time zone this machine does not know: \"{id}\". Use an id such as Europe/Dublin, or leave it empty for the machine's own zone.", e);
        }
    }
}
