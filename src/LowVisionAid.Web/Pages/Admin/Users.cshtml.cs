using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.Admin;

public sealed record UserRow(string Id, string UserName, string Roles, bool LockedOut, int FailedTries, bool Disabled)
{
    public string State => Disabled ? "Disabled by an administrator" : LockedOut ? "Locked after failed sign-ins" : FailedTries > 0 ? $"{FailedTries} failed tries" : "Active";
}

public sealed class UsersModel(UserManager<IdentityUser> users, NewAccountHandler handler, AuditTrail audit, AccessSettings settings, TimeProvider clock) : PageModel
{
    [BindProperty]
    public NewAccountInput Input { get; set; } = new();

    public IReadOnlyList<UserRow> Accounts { get; private set; } = [];

    public bool SignInRequired => settings.SignInRequired;

    public string? Done { get; private set; }

    public async Task OnGetAsync(CancellationToken ct) => await LoadAsync(ct).ConfigureAwait(false);

    public async Task<IActionResult> OnPostAddAsync(CancellationToken ct)
    {
        var errors = await handler.HandleAsync(Input, ct).ConfigureAwait(false);
        foreach (var (field, message) in errors)
        {
            ModelState.AddModelError($"{nameof(Input)}.{field}", message);
        }

        if (errors.Count == 0)
        {
            Done = "Account " + Input.UserName.Trim() + " created.";
            Input = new();
        }

        Input.Password = "";
        await LoadAsync(ct).ConfigureAwait(false);
        return Page();
    }

    public async Task<IActionResult> OnPostUnlockAsync(string id, CancellationToken ct)
    {
        var user = await users.FindByIdAsync(id).ConfigureAwait(false);
        if (user is null)
        {
            return NotFound();
        }

        await users.SetLockoutEndDateAsync(user, null).ConfigureAwait(false);
        await users.ResetAccessFailedCountAsync(user).ConfigureAwait(false);
        await audit.RecordAsync(AuditAction.Changed, "User", null, "Unlocked account " + user.UserName, ct).ConfigureAwait(false);
        Done = "Account " + user.UserName + " unlocked.";
        await LoadAsync(ct).ConfigureAwait(false);
        return Page();
    }

    /// <summary>
    /// Disables an account: it cannot sign in until an administrator unlocks it, and every session it has (a copied
    /// sign-in cookie too) ends at its next request, because its security stamp changes (<see cref="SessionChecks"/>).
    /// </summary>
    public async Task<IActionResult> OnPostDisableAsync(string id, CancellationToken ct)
    {
        var user = await users.FindByIdAsync(id).ConfigureAwait(false);
        if (user is null)
        {
            return NotFound();
        }

        if (string.Equals(user.Id, users.GetUserId(User), StringComparison.Ordinal))
        {
            ModelState.AddModelError("", "You cannot disable the account you are signed in with; ask another administrator.");
        }
        else
        {
            await SessionChecks.DisableAsync(users, user).ConfigureAwait(false);
            await audit.RecordAsync(AuditAction.Changed, "User", null, "Disabled account " + user.UserName, ct).ConfigureAwait(false);
            Done = "Account " + user.UserName + " disabled; it is signed out everywhere.";
        }

        await LoadAsync(ct).ConfigureAwait(false);
        return Page();
    }

    private async Task LoadAsync(CancellationToken ct)
    {
        var rows = new List<UserRow>();
        var now = clock.GetUtcNow();
        foreach (var user in await users.Users.OrderBy(u => u.UserName).ToListAsync(ct).ConfigureAwait(false))
        {
            var roles = await users.GetRolesAsync(user).ConfigureAwait(false);
            rows.Add(new UserRow(user.Id, user.UserName ?? "", string.Join(", ", roles), user.LockoutEnd > now, user.AccessFailedCount, SessionChecks.IsDisabled(user)));
        }

        Accounts = rows;
    }
}
