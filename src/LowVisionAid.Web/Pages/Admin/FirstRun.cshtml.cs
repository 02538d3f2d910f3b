using LowVisionAid.Data.Access;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Admin;

/// <summary>
/// Creates the first administrator. Reachable only from the clinic PC itself (loopback) and only while no account
/// exists; anywhere else it answers "not found".
/// </summary>
public sealed class FirstRunModel(UserManager<IdentityUser> users, SignInManager<IdentityUser> signIn, NewAccountHandler handler) : PageModel
{
    [BindProperty]
    public NewAccountInput Input { get; set; } = new() { Role = ClinicRoles.Administrator };

    public IActionResult OnGet() => Available() ? Page() : NotFound();

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        if (!Available())
        {
            return NotFound();
        }

        Input.Role = ClinicRoles.Administrator;
        var errors = await handler.HandleAsync(Input, ct).ConfigureAwait(false);
        if (errors.Count > 0)
        {
            foreach (var (field, message) in errors)
            {
                ModelState.AddModelError($"{nameof(Input)}.{field}", message);
            }

            Input.Password = "";
            return Page();
        }

        var user = await users.FindByNameAsync(Input.UserName.Trim()).ConfigureAwait(false);
        await signIn.SignInAsync(user!, isPersistent: false).ConfigureAwait(false);
        return LocalRedirect("/Admin/Users");
    }

    private bool Available() => NetworkExposure.IsLocalRequest(HttpContext) && !users.Users.Any();
}
