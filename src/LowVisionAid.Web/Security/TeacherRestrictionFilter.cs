using System.Text.RegularExpressions;
using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.Filters;

namespace LowVisionAid.Web.Security;

/// <summary>
/// Keeps deletion and export to clinicians and administrators on every page, including pages written without
/// knowing about roles: a handler or page whose name says Delete, Remove, Erase or Export must pass
/// <see cref="ClinicPolicies.ExportOrDelete"/>.
/// </summary>
internal sealed partial class TeacherRestrictionFilter(IAuthorizationService authorization) : IAsyncPageFilter
{
    public Task OnPageHandlerSelectionAsync(PageHandlerSelectedContext context) => Task.CompletedTask;

    public async Task OnPageHandlerExecutionAsync(PageHandlerExecutingContext context, PageHandlerExecutionDelegate next)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(next);
        if (IsRestricted(context.ActionDescriptor.ViewEnginePath, context.HandlerMethod?.Name))
        {
            var result = await authorization.AuthorizeAsync(context.HttpContext.User, ClinicPolicies.ExportOrDelete).ConfigureAwait(false);
            if (!result.Succeeded)
            {
                context.Result = new ForbidResult();
                return;
            }
        }

        await next().ConfigureAwait(false);
    }

    public static bool IsRestricted(string? pagePath, string? handlerName) =>
        (pagePath is not null && RestrictedWord().IsMatch(pagePath)) || (handlerName is not null && RestrictedWord().IsMatch(handlerName));

    [GeneratedRegex("Delete|Remove|Erase|Export", RegexOptions.IgnoreCase)]
    private static partial Regex RestrictedWord();
}
