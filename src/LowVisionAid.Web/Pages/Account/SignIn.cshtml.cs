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

/// <remarks>
/// Every refused sign-in gets the same words, whether the name is unknown, the password wrong or the account locked or
/// disabled, and the same work: for an unknown name (and a locked account, which Identity refuses before it checks the
/// password) a password is still hashed, so neither the answer nor its time tells whether an account exists.
/// </remarks>
public sealed class SignInModel(SignInManager<IdentityUser> signIn, UserManager<IdentityUser> users, IPasswordHasher<IdentityUser> hasher, AuditTrail audit) : PageModel
{
    public const string Refused =
        "The user name or password is not right, or the account is locked. Check both and try again. After 5 failed tries an account " +
        "is locked for 15 minutes; an administrator can unlock it sooner.";

    private static readonly IdentityUser NoOne = new("no-such-account");
    private static string? _noOnesHash;

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
        var user = await users.FindByNameAsync(name).ConfigureAwait(false);
        // An unknown name goes through the name overload, which refuses it (and logs that no account has that name).
        var result = user is null
            ? await signIn.PasswordSignInAsync(name, Input.Password, isPersistent: false, lockoutOnFailure: true).ConfigureAwait(false)
            : await signIn.PasswordSignInAsync(user, Input.Password, isPersistent: false, lockoutOnFailure: true).ConfigureAwait(false);
        if (user is null || result.IsLockedOut)
        {
            HashAnyway(Input.Password);
        }

        if (result.Succeeded)
        {
            await audit.RecordAsync(AuditAction.SignedIn, "User", null, null, ct, name).ConfigureAwait(false);
            return LocalRedirect(Url.IsLocalUrl(ReturnUrl) ? ReturnUrl : "/");
        }

        // Only a known user's name goes in the trail; anything typed for an unknown name stays out of it.
        await audit.RecordAsync(result.IsLockedOut ? AuditAction.LockedOut : AuditAction.SignInFailed, "User", null, null, ct, user?.UserName ?? "unknown user name").ConfigureAwait(false);
        ModelState.AddModelError("", Refused);
        Input.Password = "";
        return Page();
    }

    // The same PBKDF2 work a known account's password check does.
    private void HashAnyway(string password)
    {
        _noOnesHash ??= hasher.HashPassword(NoOne, Guid.NewGuid().ToString("N"));
        hasher.VerifyHashedPassword(NoOne, _noOnesHash, password);
    }
}
