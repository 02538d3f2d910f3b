using LowVisionAid.Data;
using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Backup;
using LowVisionAid.Web.Demo;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// What the database gets at start, in one place: a backup of an existing database before a migration is applied to
/// it, the migrations (<see cref="ClinicDatabase.UpgradeAsync"/>, which also upgrades a database of the earlier
/// two-context version), the three roles, and the demo clinic on a new database. The web start, the create-admin
/// command and a restore run it under <see cref="StartUpLock"/>, so two starts never migrate one file at once.
/// </summary>
public sealed class DatabaseStartUp(
    ClinicDbContext clinic, DatabaseBackups backups, RoleManager<IdentityRole> roles, AuditTrail audit, DemoClinic demo, ILogger<DatabaseStartUp> logger)
{
    /// <summary>Takes the start-up lock, then prepares the database once (<see cref="PrepareAsync"/>).</summary>
    public static async Task RunAsync(IServiceProvider root, bool loadDemo, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(root);
        var logger = root.GetRequiredService<ILogger<DatabaseStartUp>>();
        await using (await StartUpLock.TakeAsync(root, logger, ct).ConfigureAwait(false))   // one start at a time; frees a migration lock a killed start left
        {
            await using var scope = root.CreateAsyncScope();
            await scope.ServiceProvider.GetRequiredService<DatabaseStartUp>().PrepareAsync(loadDemo, ct).ConfigureAwait(false);
        }
    }

    /// <summary>
    /// A backup of an existing database that has a migration to apply (or still has the earlier separate access
    /// history), then <see cref="UpgradeAsync"/>, then the demo clinic if asked for and the database is new.
    /// </summary>
    public async Task PrepareAsync(bool loadDemo, CancellationToken ct)
    {
        BackupFile? taken = null;
        await clinic.EnsureMigrationHistoryAsync(ct).ConfigureAwait(false);
        if (clinic.Database.IsServer())
        {
            if ((await clinic.Database.GetPendingMigrationsAsync(ct).ConfigureAwait(false)).Any()
                && (await clinic.Database.GetAppliedMigrationsAsync(ct).ConfigureAwait(false)).Any())
            {
                AppLog.ServerBackupIsTheAdministrators(logger);
            }
        }
        else if (File.Exists(backups.DatabasePath) && new FileInfo(backups.DatabasePath).Length > 0)
        {
            var hasSchema = (await clinic.Database.GetAppliedMigrationsAsync(ct).ConfigureAwait(false)).Any();
            var pending = (await clinic.Database.GetPendingMigrationsAsync(ct).ConfigureAwait(false)).Any();
            if (hasSchema && pending)
            {
                taken = backups.Create("before-migration");
                AppLog.BackupTaken(logger, taken.Name, "before a migration");
            }
        }

        await UpgradeAsync(ct).ConfigureAwait(false);
        if (taken is not null)
        {
            await audit.RecordAsync(AuditAction.BackedUp, "Database", null, "Before migration: " + taken.Name, ct, AuditActors.System).ConfigureAwait(false);
        }

        if (loadDemo && await demo.LoadIntoEmptyDatabaseAsync(ct).ConfigureAwait(false))
        {
            AppLog.DemoClinicLoaded(logger, DemoClinic.ClinicName);
        }
    }

    /// <summary>Brings the schema up to date and makes sure the three roles exist (at start and after a restore).</summary>
    public async Task UpgradeAsync(CancellationToken ct)
    {
        var before = (await clinic.Database.GetAppliedMigrationsAsync(ct).ConfigureAwait(false)).ToHashSet(StringComparer.Ordinal);
        await clinic.UpgradeAsync(ct).ConfigureAwait(false);
        var after = (await clinic.Database.GetAppliedMigrationsAsync(ct).ConfigureAwait(false)).ToList();
        var latest = after.Count > 0 ? after[^1] : "(none)";
        var applied = after.Count(m => !before.Contains(m));
        if (applied > 0)
        {
            AppLog.DatabaseMigrated(logger, applied, latest);
        }
        else
        {
            AppLog.DatabaseUpToDate(logger, latest);
        }

        await SecuritySetup.EnsureRolesAsync(roles).ConfigureAwait(false);
    }
}
