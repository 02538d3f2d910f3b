namespace LowVisionAid.Web.Tests.Support;

/// <summary>A clock stopped at one instant, in UTC.</summary>
public sealed class FixedClock(DateTimeOffset now) : TimeProvider
{
    public override DateTimeOffset GetUtcNow() => now;

    public override TimeZoneInfo LocalTimeZone => TimeZoneInfo.Utc;
}
