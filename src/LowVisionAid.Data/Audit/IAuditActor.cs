namespace LowVisionAid.Data.Audit;

/// <summary>Names the person responsible for the current change (the web app supplies the signed-in user).</summary>
public interface IAuditActor
{
    string CurrentActor { get; }
}
