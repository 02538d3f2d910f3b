namespace LowVisionAid.Web.Security;

/// <summary>
/// The one rule for the passwords of the clinic's accounts, in one place: Identity's options, the forms' hints and
/// messages, and the create-admin command all read it here.
/// </summary>
public static class PasswordRules
{
    /// <summary>The fewest characters a password may have (length beats complexity rules: NIST SP 800-63B, 5.1.1).</summary>
    public const int MinimumLength = 10;

    /// <summary>The hint under a new password field.</summary>
    public static string Hint { get; } = $"At least {MinimumLength} characters; a short sentence works well.";

    /// <summary>The message for a password that is too short; <paramref name="which"/> is "a password" or "a new password".</summary>
    public static string TooShort(string which) =>
        $"Type {which} of at least {MinimumLength} characters; a short sentence is easy to remember and hard to guess.";
}
