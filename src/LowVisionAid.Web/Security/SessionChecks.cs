using Microsoft.AspNetCore.Identity;

namespace LowVisionAid.Web.Security;

/// <summary>
/// Ends sessions on the server, not only in the browser. The sign-in cookie carries the account's security stamp, and
/// the stamp is checked against the database on every request (Identity's security stamp validator with no
/// interval). Signing out, changing the password and an administrator disabling the account each change the stamp,
/// so a copy of the cookie taken before is refused from then on.
/// </summary>
internal static class SessionChecks
{
    /// <summary>The lockout end that marks an account an administrator disabled (as opposed to locked after failed tries).</summary>
    public static readonly DateTimeOffset DisabledUntil = DateTimeOffset.MaxValue;

    /// <summary>Checks the security stamp of the sign-in cookie on every request.</summary>
    public static IServiceCollection AddSessionChecks(this IServiceCollection services) =>
        services.Configure<SecurityStampValidatorOptions>(o => o.ValidationInterval = TimeSpan.Zero);

    /// <summary>Signs the user out here and ends every other session of the account (a new security stamp).</summary>
    public static async Task SignOutEverywhereAsync(SignInManager<IdentityUser> signIn, System.Security.Claims.ClaimsPrincipal principal)
    {
        ArgumentNullException.ThrowIfNull(signIn);
        if (await signIn.UserManager.GetUserAsync(principal).ConfigureAwait(false) is { } user)
        {
            await signIn.UserManager.UpdateSecurityStampAsync(user).ConfigureAwait(false);
        }

        await signIn.SignOutAsync().ConfigureAwait(false);
    }

    /// <summary>Locks the account with no end and ends its sessions (a new security stamp).</summary>
    public static async Task DisableAsync(UserManager<IdentityUser> users, IdentityUser user)
    {
        ArgumentNullException.ThrowIfNull(users);
        await users.SetLockoutEnabledAsync(user, true).ConfigureAwait(false);
        await users.SetLockoutEndDateAsync(user, DisabledUntil).ConfigureAwait(false);
        await users.UpdateSecurityStampAsync(user).ConfigureAwait(false);
    }

    public static bool IsDisabled(IdentityUser user)
    {
        ArgumentNullException.ThrowIfNull(user);
        return user.LockoutEnd is { } end && end.UtcDateTime.Year == DisabledUntil.Year;
    }
}
