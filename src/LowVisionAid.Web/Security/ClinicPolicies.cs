using LowVisionAid.Data.Access;
using Microsoft.AspNetCore.Authorization;

namespace LowVisionAid.Web.Security;

/// <summary>Authorization policy names. When sign-in is off (loopback only) every policy passes.</summary>
public static class ClinicPolicies
{
    /// <summary>Users, audit trail, backup and restore: administrators.</summary>
    public const string Administer = "Administer";

    /// <summary>Export, erasure and deletion of records: clinicians and administrators (not teachers).</summary>
    public const string ExportOrDelete = "ExportOrDelete";
}

internal sealed class ClinicRoleRequirement(params string[] roles) : IAuthorizationRequirement
{
    public IReadOnlyList<string> Roles { get; } = roles;
}

internal sealed class ClinicRoleHandler(AccessSettings settings) : AuthorizationHandler<ClinicRoleRequirement>
{
    protected override Task HandleRequirementAsync(AuthorizationHandlerContext context, ClinicRoleRequirement requirement)
    {
        if (!settings.SignInRequired || requirement.Roles.Any(context.User.IsInRole))
        {
            context.Succeed(requirement);
        }

        return Task.CompletedTask;
    }

    public static IReadOnlyList<string> RolesFor(string policy) => policy switch
    {
        ClinicPolicies.Administer => [ClinicRoles.Administrator],
        _ => [ClinicRoles.Clinician, ClinicRoles.Administrator],
    };
}
