using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.Options;

namespace LowVisionAid.Web.Security;

/// <summary>
/// Identity's sign-in, with each refused password sign-in written to the log (<see cref="AppLog.SignInRefused"/>):
/// the account's name when the name typed is an account, never the text typed for an unknown name (it may be a
/// password typed in the wrong box), and never the password.
/// </summary>
internal sealed class ClinicSignInManager(
    UserManager<IdentityUser> userManager,
    IHttpContextAccessor contextAccessor,
    IUserClaimsPrincipalFactory<IdentityUser> claimsFactory,
    IOptions<IdentityOptions> optionsAccessor,
    ILogger<SignInManager<IdentityUser>> logger,
    IAuthenticationSchemeProvider schemes,
    IUserConfirmation<IdentityUser> confirmation,
    ILogger<ClinicSignInManager> events)
    : SignInManager<IdentityUser>(userManager, contextAccessor, claimsFactory, optionsAccessor, logger, schemes, confirmation)
{
    public override async Task<SignInResult> PasswordSignInAsync(string userName, string password, bool isPersistent, bool lockoutOnFailure)
    {
        if (await UserManager.FindByNameAsync(userName).ConfigureAwait(false) is not { } user)
        {
            AppLog.SignInUnknownName(events);
            return SignInResult.Failed;
        }

        return await PasswordSignInAsync(user, password, isPersistent, lockoutOnFailure).ConfigureAwait(false);
    }

    public override async Task<SignInResult> PasswordSignInAsync(IdentityUser user, string password, bool isPersistent, bool lockoutOnFailure)
    {
        ArgumentNullException.ThrowIfNull(user);
        var result = await base.PasswordSignInAsync(user, password, isPersistent, lockoutOnFailure).ConfigureAwait(false);
        if (!result.Succeeded)
        {
            AppLog.SignInRefused(events, user.UserName ?? "(no name)", Outcome(result));
        }

        return result;
    }

    private static string Outcome(SignInResult result) =>
        result.IsLockedOut ? "locked out after repeated failed sign-ins"
        : result.IsNotAllowed ? "not allowed to sign in"
        : result.RequiresTwoFactor ? "second factor required"
        : "wrong password";
}
