using Xunit.Sdk;

namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// Counts the assertion failures and browser errors raised in this test process (xunit 2 tells a test class nothing
/// of its own outcome). The browser tests run one at a time, so a count that grew during a test means it failed.
/// </summary>
internal static class FailureWatch
{
    private static int _failures;

    static FailureWatch() => AppDomain.CurrentDomain.FirstChanceException += (_, e) =>
    {
        if (e.Exception is XunitException or PlaywrightException or TimeoutException)
        {
            Interlocked.Increment(ref _failures);
        }
    };

    public static int Count => Volatile.Read(ref _failures);
}
