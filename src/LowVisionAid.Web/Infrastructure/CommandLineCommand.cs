namespace LowVisionAid.Web.Infrastructure;

/// <summary>The command-line commands that run without starting the web server (create-admin, move-to-server): how their arguments are read.</summary>
internal static class CommandLineCommand
{
    /// <summary>
    /// When the first argument is <paramref name="command"/>: the value of <paramref name="option"/> (given as
    /// <c>--option value</c> or <c>--option=value</c>; null when absent) and every other argument, left for the host's
    /// configuration (such as <c>--DataFolder &lt;path&gt;</c>). Null when the first argument is not the command.
    /// </summary>
    public static (string? Value, string[] HostArgs)? Take(string[] args, string command, string option)
    {
        ArgumentNullException.ThrowIfNull(args);
        if (args.Length == 0 || !string.Equals(args[0], command, StringComparison.Ordinal))
        {
            return null;
        }

        string? value = null;
        var host = new List<string>();
        for (var i = 1; i < args.Length; i++)
        {
            if (string.Equals(args[i], option, StringComparison.Ordinal) && i + 1 < args.Length)
            {
                value = args[++i];
            }
            else if (args[i].StartsWith(option + "=", StringComparison.Ordinal))
            {
                value = args[i][(option.Length + 1)..];
            }
            else
            {
                host.Add(args[i]);
            }
        }

        return (value, [.. host]);
    }
}
