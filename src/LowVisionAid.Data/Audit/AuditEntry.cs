namespace LowVisionAid.Data.Audit;

/// <summary>
/// One line of the audit trail: who did what to which record, and when. It never holds clinical content, names
/// or client codes: the record is named by its table and number only, and <see cref="Detail"/> is limited to counts
/// and file names written by the app itself.
/// </summary>
public sealed class AuditEntry
{
    public const string Table = "AuditEntries";
    public const int ActorLength = 100;
    public const int DetailLength = 200;

    public long Id { get; set; }

    public DateTime AtUtc { get; set; }

    /// <summary>The signed-in user name, or <see cref="AuditActors.LocalUser"/> when sign-in is off.</summary>
    public required string Actor { get; set; }

    public AuditAction Action { get; set; }

    /// <summary>The kind of record (the entity name, e.g. "Client", "Visit"), or "Database" or "User".</summary>
    public required string RecordType { get; set; }

    public long? RecordId { get; set; }

    public string? Detail { get; set; }
}

/// <summary>What was done.</summary>
public enum AuditAction
{
    Created,
    Changed,
    Deleted,
    Exported,
    Erased,
    BackedUp,
    Restored,
    SignedIn,
    SignInFailed,
    LockedOut,
}

/// <summary>Actor names used when no person is signed in.</summary>
public static class AuditActors
{
    /// <summary>The person at the clinic PC when sign-in is off (loopback only).</summary>
    public const string LocalUser = "local user (sign-in off)";

    /// <summary>The app itself (start-up, demo data, automatic backups).</summary>
    public const string System = "the app";
}
