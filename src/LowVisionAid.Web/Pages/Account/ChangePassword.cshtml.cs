using FluentValidation;
using LowVisionAid.Data.Audit;
using LowVisionAid.Web.Infrastructure;
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

/// <summary>What a password change needs before Identity checks the current password.</summary>
public sealed class ChangePasswordInputValidator : AbstractValidator<ChangePasswordInput>
{
    public const int MinimumLength = PasswordRules.MinimumLength;

    public ChangePasswordInputValidator()
    {
        RuleFor(i => i.CurrentPassword).NotEmpty().WithMessage("Type your current password.");
        RuleFor(i => i.NewPassword).MinimumLength(MinimumLength)
            .WithMessage(PasswordRules.TooShort("a new password"));
    }
}

/// <summary>
/// The signed-in user changes their own password. Identity gives the account a new security stamp, so every other
/// session of it (another PC, a copied cookie) ends (<see cref="SessionChecks"/>); this browser is signed in again.
/// </summary>
public sealed class ChangePasswordModel(SignInManager<IdentityUser> signIn, UserManager<IdentityUser> users, AuditTrail audit, IValidator<ChangePasswordInput> validator) : PageModel
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

        var check = await validator.ValidateAsync(Input, ct).ConfigureAwait(false);
        ModelState.AddErrors(check, nameof(Input));
        if (check.IsValid)
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
