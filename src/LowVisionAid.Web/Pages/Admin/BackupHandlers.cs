using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Backup;
using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Web.Security;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.Admin;

/// <summary>Takes a backup now and records it in the audit trail and the log.</summary>
public sealed class TakeBackupHandler(DatabaseBackups backups, AuditTrail audit, ILogger<TakeBackupHandler> logger)
{
    public async Task<BackupFile> HandleAsync(CancellationToken ct)
    {
        var file = backups.Create("manual");
        AppLog.BackupTaken(logger, file.Name, "on request");
        await audit.RecordAsync(AuditAction.BackedUp, "Database", null, file.Name, ct).ConfigureAwait(false);
        return file;
    }
}

/// <summary>
/// Restores a checked backup over the live database (after a "before-restore" backup of it; an older schema is
/// upgraded in a working copy first, so this upgrade finds nothing left to do), and records the restore in the
/// restored audit trail.
/// </summary>
public sealed class RestoreBackupHandler(
    DatabaseBackups backups, ClinicDbContext clinic, DatabaseStartUp startUp, AuditTrail audit,
    IServiceProvider services, ILogger<RestoreBackupHandler> logger)
{
    public async Task<RestoreCheck> HandleAsync(string candidatePath, string shownName, CancellationToken ct)
    {
        var check = await backups.RestoreAsync(candidatePath, clinic.KnownMigrations(), ct).ConfigureAwait(false);
        if (!check.CanRestore)
        {
            AppLog.RestoreRefused(logger, shownName, check.Message);
            return check;
        }

        // As at start: no second start migrates this file meanwhile, and a lock row a killed start left is freed.
        await using (await StartUpLock.TakeAsync(services, logger, ct).ConfigureAwait(false))
        {
            await startUp.UpgradeAsync(ct).ConfigureAwait(false);
        }

        await audit.RecordAsync(AuditAction.Restored, "Database", null, shownName, ct).ConfigureAwait(false);
        AppLog.BackupRestored(logger, shownName);
        return check;
    }
}
