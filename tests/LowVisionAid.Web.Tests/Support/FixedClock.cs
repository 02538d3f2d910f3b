using Microsoft.Extensions.Time.Testing;

namespace LowVisionAid.Web.Tests.Support;

/// <summary>A clock stopped at one instant, in UTC: the framework's fake clock, which never moves unless told to.</summary>
public sealed class FixedClock(DateTimeOffset now) : FakeTimeProvider(now);
