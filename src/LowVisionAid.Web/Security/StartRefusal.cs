namespace LowVisionAid.Web.Security;

/// <summary>
/// Stops the app before it starts when its database settings are unusable, or when it is set to listen on a network
/// address without <c>Access:AllowLan</c>: one paragraph on standard error saying what to set, and exit code <see cref="ExitCode"/>, with no stack trace.
/// </summary>
internal static class StartRefusal
{
    /// <summary>The exit code of a start refused for its configuration.</summary>
    public const int ExitCode = 3;

    /// <summary>Writes the refusal and returns <see cref="ExitCode"/> when the app must not start; otherwise null.</summary>
    public static int? Check(IConfiguration configuration, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(error);
        var refusal = Infrastructure.ClinicDatabaseOptions.From(configuration).Problem()
            ?? NetworkExposure.Refusal(configuration, AccessSettings.From(configuration));
        if (refusal is null)
        {
            return null;
        }

        error.WriteLine("LowVisionAid did not start. " + refusal);
        return ExitCode;
    }
}
