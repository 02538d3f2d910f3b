using LowVisionAid.Data.Audit;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Account;

public sealed class SignInInput
{
    public string UserName { get; set; } = "";

    public string Password { get; set; } = "";
}

public sealed class SignInModel(SignInManager<IdentityUser> signIn, UserManager<IdentityUser> users, AuditTrail audit) : PageModel
{
    public const string WrongNameOrPassword = "The user name or password is not right. Check both and try again; after 5 failed tries the account is locked for 15 minutes.";
    public const string LockedOut = "This account is locked after repeated failed sign-ins. Try again in 15 minutes, or ask an administrator to unlock it.";

    [BindProperty]
    public SignInInput Input { get; set; } = new();

    [BindProperty(SupportsGet = true)]
    public string? ReturnUrl { get; set; }

    public bool HasUsers { get; private set; } = true;

    public void OnGet() => HasUsers = users.Users.Any();

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        if (string.IsNullOrWhiteSpace(Input.UserName))
        {
            ModelState.AddModelError($"{nameof(Input)}.{nameof(SignInInput.UserName)}", "Type your user name.");
        }

        if (string.IsNullOrEmpty(Input.Password))
        {
            ModelState.AddModelError($"{nameof(Input)}.{nameof(SignInInput.Password)}", "Type your password.");
        }

        if (!ModelState.IsValid)
        {
            return Page();
        }

        var name = Input.UserName.Trim();
        var result = await signIn.PasswordSignInAsync(name, Input.Password, isPersistent: false, lockoutOnFailure: true).ConfigureAwait(false);
        var user = await users.FindByNameAsync(name).ConfigureAwait(false);
        if (result.Succeeded)
        {
            await audit.RecordAsync(AuditAction.SignedIn, "User", null, null, ct, name).ConfigureAwait(false);
            return LocalRedirect(Url.IsLocalUrl(ReturnUrl) ? ReturnUrl : "/");
        }

        // Only a known user's name goes in the trail; anything typed for an unknown name stays out of it.
        await audit.RecordAsync(result.IsLockedOut ? AuditAction.LockedOut : AuditAction.SignInFailed, "User", null, null, ct, user?.UserName ?? "unknown user name").ConfigureAwait(false);
        ModelState.AddModelError("", result.IsLockedOut ? LockedOut : WrongNameOrPassword);
        Input.Password = "";
        return Page();
    }
}
