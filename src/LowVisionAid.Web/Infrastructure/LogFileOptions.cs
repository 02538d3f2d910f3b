using Serilog;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// The rolling log file in the data folder's <c>logs</c> folder, from configuration section <c>LogFile</c>. What is
/// written to it (and to the console) is set by <c>Logging:LogLevel</c>; this says only how the files roll.
/// </summary>
public sealed class LogFileOptions
{
    public const string Section = "LogFile";

    /// <summary>The file name before the date the sink adds, e.g. <c>lowvisionaid-20261203.log</c>.</summary>
    public const string FileNamePattern = "lowvisionaid-.log";

    /// <summary>The smallest size limit accepted (a limit below it would roll on almost every line).</summary>
    public const long MinimumFileSizeLimitBytes = 1024;

    /// <summary>A new file each <c>Day</c> (default); also <c>Hour</c>, <c>Month</c>, <c>Year</c> or <c>Infinite</c> (size only).</summary>
    public RollingInterval RollingInterval { get; set; } = RollingInterval.Day;

    /// <summary>A new file once the current one reaches this size (default 10 MB = 10485760 bytes).</summary>
    public long FileSizeLimitBytes { get; set; } = 10 * 1024 * 1024;

    /// <summary>How many files are kept; the oldest is deleted when a new one starts (default 31).</summary>
    public int RetainedFileCountLimit { get; set; } = 31;

    public const string SizeProblem = "LogFile:FileSizeLimitBytes must be at least 1024 bytes, e.g. 10485760 for 10 MB.";

    public const string CountProblem = "LogFile:RetainedFileCountLimit must be at least 1, e.g. 31 to keep a month of daily files.";
}
