using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Identity;

namespace LowVisionAid.Web.Pages.Admin;

/// <summary>A new account as typed on the first-run or users page.</summary>
public sealed class NewAccountInput
{
    public string UserName { get; set; } = "";

    public string Password { get; set; } = "";

    public string Role { get; set; } = ClinicRoles.Clinician;
}

/// <summary>Creates accounts (hashed password, lockout on, one role) and records each creation in the audit trail.</summary>
public sealed class NewAccountHandler(UserManager<IdentityUser> users, RoleManager<IdentityRole> roles, AuditTrail audit)
{
    public const int MaxUserName = 60;

    /// <summary>
    /// Returns the messages to show beside the fields (field name → message); empty when the account was made.
    /// <paramref name="actor"/> names who made it in the audit trail when that is not the signed-in user (a command).
    /// </summary>
    public async Task<IReadOnlyList<KeyValuePair<string, string>>> HandleAsync(NewAccountInput input, CancellationToken ct, string? actor = null)
    {
        ArgumentNullException.ThrowIfNull(input);
        var errors = new List<KeyValuePair<string, string>>();
        var name = input.UserName.Trim();
        if (name.Length == 0 || name.Length > MaxUserName || !name.All(c => char.IsAsciiLetterOrDigit(c) || c is '.' or '-' or '_'))
        {
            errors.Add(new(nameof(NewAccountInput.UserName), $"Type a user name of 1 to {MaxUserName} letters, digits, dots, dashes or underscores, such as a.khan."));
        }

        if (input.Password.Length < PasswordRules.MinimumLength)
        {
            errors.Add(new(nameof(NewAccountInput.Password), PasswordRules.TooShort("a password")));
        }

        if (!ClinicRoles.All.Contains(input.Role))
        {
            errors.Add(new(nameof(NewAccountInput.Role), "Choose clinician, teacher or administrator."));
        }

        if (errors.Count > 0)
        {
            return errors;
        }

        await SecuritySetup.EnsureRolesAsync(roles).ConfigureAwait(false);
        var user = new IdentityUser(name);
        var created = await users.CreateAsync(user, input.Password).ConfigureAwait(false);
        if (!created.Succeeded)
        {
            return created.Errors.Select(e => new KeyValuePair<string, string>(
                e.Code.Contains("UserName", StringComparison.Ordinal) ? nameof(NewAccountInput.UserName) : nameof(NewAccountInput.Password),
                e.Code == "DuplicateUserName" ? "Another account already has this user name. Type a different one." : e.Description)).ToList();
        }

        await users.AddToRoleAsync(user, input.Role).ConfigureAwait(false);
        await audit.RecordAsync(AuditAction.Created, "User", null, "Account " + name + " with role " + input.Role, ct, actor).ConfigureAwait(false);
        return [];
    }
}
