using LowVisionAid.Data.Audit;

namespace LowVisionAid.Web.Security;

/// <summary>The audit trail's "who": the signed-in user, the person at the PC when sign-in is off, or the app itself.</summary>
internal sealed class HttpAuditActor(IHttpContextAccessor accessor) : IAuditActor
{
    public string CurrentActor => accessor.HttpContext switch
    {
        null => AuditActors.System,
        { User.Identity: { IsAuthenticated: true, Name: { Length: > 0 } name } } => name,
        _ => AuditActors.LocalUser,
    };
}
