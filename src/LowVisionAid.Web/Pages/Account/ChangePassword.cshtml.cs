using LowVisionAid.Data.Audit;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Account;

public sealed class ChangePasswordInput
{
    public string CurrentPassword { get; set; } = "";

    public string NewPassword { get; set; } = "";
}

/// <summary>
/// The signed-in user changes their own password. Identity gives the account a new security stamp, so every other
/// session of it (another PC, a copied cookie) ends (<see cref="SessionChecks"/>); this browser is signed in again.
/// </summary>
public sealed class ChangePasswordModel(SignInManager<IdentityUser> signIn, UserManager<IdentityUser> users, AuditTrail audit) : PageModel
{
    public const string Changed = "Your password is changed. Any other place where you were signed in is signed out.";

    [BindProperty]
    public ChangePasswordInput Input { get; set; } = new();

    public string? Done { get; private set; }

    public async Task<IActionResult> OnGetAsync() =>
        await users.GetUserAsync(User).ConfigureAwait(false) is null ? SignInFirst() : Page();

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        var user = await users.GetUserAsync(User).ConfigureAwait(false);
        if (user is null)
        {
            return SignInFirst();
        }

        if (string.IsNullOrEmpty(Input.CurrentPassword))
        {
            ModelState.AddModelError($"{nameof(Input)}.{nameof(ChangePasswordInput.CurrentPassword)}", "Type your current password.");
        }

        if (Input.NewPassword.Length < 10)
        {
            ModelState.AddModelError($"{nameof(Input)}.{nameof(ChangePasswordInput.NewPassword)}", "Type a new password of at least 10 characters; a short sentence is easy to remember and hard to guess.");
        }

        if (ModelState.IsValid)
        {
            var result = await users.ChangePasswordAsync(user, Input.CurrentPassword, Input.NewPassword).ConfigureAwait(false);
            if (result.Succeeded)
            {
                await signIn.RefreshSignInAsync(user).ConfigureAwait(false);
                await audit.RecordAsync(AuditAction.Changed, "User", null, "Changed own password", ct).ConfigureAwait(false);
                Done = Changed;
            }
            else
            {
                ModelState.AddModelError($"{nameof(Input)}.{nameof(ChangePasswordInput.CurrentPassword)}",
                    result.Errors.Any(e => e.Code == "PasswordMismatch") ? "The current password is not right; type it again." : string.Join(" ", result.Errors.Select(e => e.Description)));
            }
        }

        Input = new();
        return Page();
    }

    private RedirectToPageResult SignInFirst() => RedirectToPage("/Account/SignIn", new { ReturnUrl = "/Account/ChangePassword" });
}
