using System.Text;
using LowVisionAid.Data.Access;
using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Web.Pages.Admin;
using Microsoft.AspNetCore.Identity;

namespace LowVisionAid.Web.Security;

/// <summary>What the command line asked for: the create-admin command and its user name, and the arguments left for the host.</summary>
internal sealed record AdminCommandLine(string? UserName, string[] HostArgs)
{
    public const string Command = "create-admin";
    public const string UserOption = "--user";

    /// <summary>
    /// <c>create-admin --user &lt;name&gt; [host settings such as --DataFolder &lt;path&gt;]</c>, or null when the
    /// first argument is not the command (the web app then starts as usual). The password is never an argument.
    /// </summary>
    public static AdminCommandLine? Parse(string[] args) =>
        CommandLineCommand.Take(args, Command, UserOption) is { } taken ? new AdminCommandLine(taken.Value, taken.HostArgs) : null;
}

/// <summary>
/// <c>dotnet run --project src/LowVisionAid.Web -- create-admin --user &lt;name&gt;</c>: creates an administrator
/// account from the PC's own command line, without starting the web server. The password is read from standard
/// input (hidden, and asked twice, at a terminal; the first line when piped), never from the command line, and checked
/// with the same rules as the Users page (Identity's password rules). An existing user name is refused. The creation
/// is written in the audit trail. Exit code 0 when created, 1 when refused, 2 when the command was mistyped.
/// </summary>
internal static class CreateAdminCommand
{
    public const int Created = 0;
    public const int Refused = 1;
    public const int Usage = 2;

    public const string UsageText =
        "Usage: dotnet run --project src/LowVisionAid.Web -- create-admin --user <name> [--DataFolder <folder>]\n" +
        "The password is read from standard input (typed without being shown, or piped as one line); never put it on the command line.";

    /// <summary>Reads the password: <paramref name="prompt"/> is shown, the typed text is not.</summary>
    public delegate string? SecretReader(string prompt);

    /// <summary>Runs the command against the app's database (migrated first, as at start) and returns the exit code.</summary>
    public static async Task<int> RunAsync(IServiceProvider root, AdminCommandLine command, SecretReader readSecret, bool askTwice, TextWriter output, TextWriter errors, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(command);
        ArgumentNullException.ThrowIfNull(readSecret);
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(errors);
        var name = command.UserName?.Trim();
        if (string.IsNullOrEmpty(name))
        {
            await errors.WriteLineAsync("Name the account: create-admin --user <name>, e.g. --user a.khan.\n" + UsageText).ConfigureAwait(false);
            return Usage;
        }

        await DatabaseStartUp.RunAsync(root, loadDemo: false, ct).ConfigureAwait(false);   // as at start, under the start-up lock

        await using var scope = root.CreateAsyncScope();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<IdentityUser>>();
        if (await users.FindByNameAsync(name).ConfigureAwait(false) is not null)
        {
            await errors.WriteLineAsync($"An account named {name} already exists; nothing was changed. Choose another name, or ask an administrator to unlock {name} under Admin > Users.").ConfigureAwait(false);
            return Refused;
        }

        var password = readSecret($"Password for {name} (at least {PasswordRules.MinimumLength} characters; a short sentence is good; not shown): ");
        if (password is null)
        {
            await errors.WriteLineAsync("No password was given on standard input; nothing was changed. Type it when asked, or pipe it as one line.").ConfigureAwait(false);
            return Refused;
        }

        if (askTwice && !string.Equals(password, readSecret("Type the password again: "), StringComparison.Ordinal))
        {
            await errors.WriteLineAsync("The two passwords were not the same; nothing was changed. Run the command again.").ConfigureAwait(false);
            return Refused;
        }

        var input = new NewAccountInput { UserName = name, Password = password, Role = ClinicRoles.Administrator };
        var actor = $"{AdminCommandLine.Command} command (PC account {Environment.UserName})";
        var problems = await scope.ServiceProvider.GetRequiredService<NewAccountHandler>().HandleAsync(input, ct, actor).ConfigureAwait(false);
        if (problems.Count > 0)
        {
            foreach (var (_, message) in problems)
            {
                await errors.WriteLineAsync(message).ConfigureAwait(false);
            }

            await errors.WriteLineAsync("Nothing was changed.").ConfigureAwait(false);
            return Refused;
        }

        var next = scope.ServiceProvider.GetRequiredService<AccessSettings>().SharedDatabase
            ? $"Start the app (sign-in is always on with a shared database) and sign in as {name}"
            : $"Start the app with --Access:RequireSignIn=true (or --Access:AllowLan=true on the clinic network) and sign in as {name}";
        await output.WriteLineAsync($"Administrator {name} created. {next}; add the other staff under Admin > Users.").ConfigureAwait(false);
        return Created;
    }

    /// <summary>The console's reader: hidden typing at a terminal, one line from standard input when it is piped.</summary>
    public static string? ReadFromConsole(string prompt)
    {
        if (Console.IsInputRedirected)
        {
            return Console.In.ReadLine();
        }

        Console.Error.Write(prompt);
        var typed = new StringBuilder();
        while (true)
        {
            var key = Console.ReadKey(intercept: true);
            if (key.Key == ConsoleKey.Enter)
            {
                Console.Error.WriteLine();
                return typed.ToString();
            }

            if (key.Key == ConsoleKey.Backspace)
            {
                if (typed.Length > 0)
                {
                    typed.Length--;
                }
            }
            else if (!char.IsControl(key.KeyChar))
            {
                typed.Append(key.KeyChar);
            }
        }
    }
}
