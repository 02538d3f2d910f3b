using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Account;

public sealed class SignOutModel(SignInManager<IdentityUser> signIn) : PageModel
{
    public void OnGet()
    {
    }

    public async Task<IActionResult> OnPostAsync()
    {
        await SessionChecks.SignOutEverywhereAsync(signIn, User).ConfigureAwait(false);
        return LocalRedirect("/Account/SignIn");
    }
}
