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
        var result = await base.PasswordSignInAsync(userName, password, isPersistent, lockoutOnFailure).ConfigureAwait(false);
        if (!result.Succeeded)
        {
            var user = await UserManager.FindByNameAsync(userName).ConfigureAwait(false);
            if (user?.UserName is { } known)
            {
                AppLog.SignInRefused(events, known, Outcome(result));
            }
            else
            {
                AppLog.SignInUnknownName(events);
            }
        }

        return result;
    }

    private static string Outcome(SignInResult result) =>
        result.IsLockedOut ? "locked out after repeated failed sign-ins"
        : result.IsNotAllowed ? "not allowed to sign in"
        : result.RequiresTwoFactor ? "second factor required"
        : "wrong password";
}
