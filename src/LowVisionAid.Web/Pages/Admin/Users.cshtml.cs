using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.Admin;

public sealed record UserRow(string Id, string UserName, string Roles, bool LockedOut, int FailedTries);

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

    private async Task LoadAsync(CancellationToken ct)
    {
        var rows = new List<UserRow>();
        var now = clock.GetUtcNow();
        foreach (var user in await users.Users.OrderBy(u => u.UserName).ToListAsync(ct).ConfigureAwait(false))
        {
            var roles = await users.GetRolesAsync(user).ConfigureAwait(false);
            rows.Add(new UserRow(user.Id, user.UserName ?? "", string.Join(", ", roles), user.LockoutEnd > now, user.AccessFailedCount));
        }

        Accounts = rows;
    }
}
