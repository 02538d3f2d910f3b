using System.Diagnostics;
using System.Globalization;
using System.Reflection;
using LowVisionAid.Web.Security;
using Microsoft.Extensions.Logging.Console;
using Microsoft.Extensions.Options;
using Serilog;
using Serilog.Extensions.Logging;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// The log: levels from <c>Logging:LogLevel</c> (appsettings.json: the app's own events at Information, the framework
/// and EF Core at Warning), one line per request, and a rolling file in the data folder beside the console.
/// </summary>
internal static class ClinicLogging
{
    /// <summary>One line per event in the file: time with offset, level, category, message, then any exception.</summary>
    public const string FileLineTemplate = "{Timestamp:yyyy-MM-dd HH:mm:ss.fff zzz} [{Level:u3}] {SourceContext}: {Message:lj}{NewLine}{Exception}";

    /// <summary>Adds the log file and the fixed privacy rules; <paramref name="quietConsole"/> keeps a command's console to warnings.</summary>
    public static WebApplicationBuilder AddClinicLogging(this WebApplicationBuilder builder, bool quietConsole)
    {
        builder.Services.AddOptions<LogFileOptions>()
            .BindConfiguration(LogFileOptions.Section)
            .Validate(o => o.FileSizeLimitBytes >= LogFileOptions.MinimumFileSizeLimitBytes, LogFileOptions.SizeProblem)
            .Validate(o => o.RetainedFileCountLimit >= 1, LogFileOptions.CountProblem)
            .ValidateOnStart();

        // Created when the first logger is, so a test host that clears the providers never opens a file.
        builder.Services.AddSingleton<ILoggerProvider>(sp => new SerilogLoggerProvider(
            CreateFileLogger(sp.GetRequiredService<ClinicFolders>().Logs, sp.GetRequiredService<IOptions<LogFileOptions>>().Value), dispose: true));

        // The framework's own request lines carry the query string (search text may be a client's name or code).
        // Pinned here, not in appsettings.json, so no configuration can bring them back; the app's request line
        // (UseRequestLog) gives the path without the query instead.
        builder.Logging.AddFilter("Microsoft.AspNetCore.Hosting.Diagnostics", LogLevel.Warning);
        if (quietConsole)
        {
            builder.Logging.AddFilter<ConsoleLoggerProvider>(null, LogLevel.Warning);
        }

        return builder;
    }

    /// <summary>Serilog's file sink, rolling by <see cref="LogFileOptions.RollingInterval"/> and by size, keeping a bounded number of files.</summary>
    public static Serilog.Core.Logger CreateFileLogger(string folder, LogFileOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        return new LoggerConfiguration()
            .MinimumLevel.Verbose()   // the levels are applied by Logging:LogLevel before a line reaches this provider
            .WriteTo.File(
                Path.Combine(folder, LogFileOptions.FileNamePattern),
                outputTemplate: FileLineTemplate,
                formatProvider: CultureInfo.InvariantCulture,
                fileSizeLimitBytes: options.FileSizeLimitBytes,
                rollingInterval: options.RollingInterval,
                rollOnFileSizeLimit: true,
                retainedFileCountLimit: options.RetainedFileCountLimit)
            .CreateLogger();
    }

    /// <summary>The first line of a start: version, environment, data folder, database (without a password) and who may reach the app.</summary>
    public static void LogStarting(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        if (!app.Logger.IsEnabled(LogLevel.Information))
        {
            return;
        }

        var access = app.Services.GetRequiredService<AccessSettings>();
        var version = typeof(ClinicLogging).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "(unknown version)";
        var reach = access.AllowLan ? "clinic network allowed, sign-in required"
            : access.SharedDatabase ? "this computer only, sign-in required (shared database)"
            : access.SignInRequired ? "this computer only, sign-in required"
            : "this computer only, no sign-in";
        var dataFolder = app.Services.GetRequiredService<ClinicFolders>().Data;
        var database = app.Services.GetRequiredService<ClinicDatabaseTarget>().Description;   // never the password
        AppLog.Starting(app.Logger, version, app.Environment.EnvironmentName, dataFolder, database, reach);
    }

    /// <summary>
    /// Outermost middleware: one line per request when it ends (method, path without the query, status, duration).
    /// A request that throws past every handler is logged as 500.
    /// </summary>
    public static WebApplication UseRequestLog(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        var logger = app.Services.GetRequiredService<ILoggerFactory>().CreateLogger(AppLog.RequestCategory);
        app.Use(async (context, next) =>
        {
            var started = Stopwatch.GetTimestamp();
            var status = StatusCodes.Status500InternalServerError;
            try
            {
                await next(context).ConfigureAwait(false);
                status = context.Response.StatusCode;
            }
            finally
            {
                if (logger.IsEnabled(LogLevel.Information))
                {
                    var path = context.Request.PathBase.Add(context.Request.Path).Value;
                    var elapsedMs = Stopwatch.GetElapsedTime(started).TotalMilliseconds;
                    AppLog.Request(logger, context.Request.Method, string.IsNullOrEmpty(path) ? "/" : path, status, elapsedMs);
                }
            }
        });
        return app;
    }
}
