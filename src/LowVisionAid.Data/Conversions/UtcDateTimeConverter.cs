using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace LowVisionAid.Data.Conversions;

/// <summary>
/// A stored time is UTC: written as UTC (a time of unknown kind, as SQLite returns it, is taken to be UTC already; a local
/// time is converted), read back marked UTC. PostgreSQL's <c>timestamp with time zone</c> refuses anything else.
/// </summary>
public sealed class UtcDateTimeConverter() : ValueConverter<DateTime, DateTime>(t => AsUtc(t), t => DateTime.SpecifyKind(t, DateTimeKind.Utc))
{
    private static DateTime AsUtc(DateTime time) => time.Kind switch
    {
        DateTimeKind.Utc => time,
        DateTimeKind.Local => time.ToUniversalTime(),
        _ => DateTime.SpecifyKind(time, DateTimeKind.Utc),
    };
}
