using LowVisionAid.Data.Audit;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Identity.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Data.Access;

/// <summary>
/// Who may sign in (ASP.NET Core Identity: users, hashed passwords, lockout, roles) and the audit trail. It lives
/// in the same SQLite file as <see cref="ClinicDbContext"/>, so one backup holds both, but keeps its own migration
/// history table so the two schemas evolve independently.
/// </summary>
public sealed class AccessDbContext(DbContextOptions<AccessDbContext> options) : IdentityDbContext<IdentityUser>(options)
{
    /// <summary>The migration history table of this context (the clinic context uses EF Core's default).</summary>
    public const string MigrationsHistoryTable = "__AccessMigrationsHistory";

    public DbSet<AuditEntry> AuditEntries => Set<AuditEntry>();

    protected override void OnModelCreating(ModelBuilder builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        base.OnModelCreating(builder);
        builder.Entity<AuditEntry>(entry =>
        {
            entry.ToTable(AuditEntry.Table);
            entry.Property(e => e.Actor).HasMaxLength(AuditEntry.ActorLength);
            entry.Property(e => e.Action).HasConversion<string>().HasMaxLength(20);
            entry.Property(e => e.RecordType).HasMaxLength(40);
            entry.Property(e => e.Detail).HasMaxLength(AuditEntry.DetailLength);
            entry.HasIndex(e => e.AtUtc);
            entry.HasIndex(e => new { e.RecordType, e.RecordId });
        });
    }
}
