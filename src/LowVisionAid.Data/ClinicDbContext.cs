using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Conversions;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Quantities;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Identity.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Data;

/// <summary>
/// The clinic's one database: clients, visits, plans, trials, the kit and the settings, who may sign in (ASP.NET
/// Core Identity: users, hashed passwords, lockout, roles) and the audit trail. One context, one migration history.
/// </summary>
public sealed class ClinicDbContext(DbContextOptions<ClinicDbContext> options, TimeProvider? clock = null)
    : IdentityDbContext<IdentityUser, IdentityRole, string>(options)
{
    private readonly TimeProvider _clock = clock ?? TimeProvider.System;

    public DbSet<Client> Clients => Set<Client>();

    public DbSet<Visit> Visits => Set<Visit>();

    public DbSet<VisitGoal> VisitGoals => Set<VisitGoal>();

    public DbSet<ReadingSpeed> ReadingSpeeds => Set<ReadingSpeed>();

    public DbSet<Plan> Plans => Set<Plan>();

    public DbSet<Trial> Trials => Set<Trial>();

    public DbSet<KitDevice> KitDevices => Set<KitDevice>();

    public DbSet<ClinicSettings> Settings => Set<ClinicSettings>();

    public DbSet<AuditEntry> AuditEntries => Set<AuditEntry>();

    protected override void ConfigureConventions(ModelConfigurationBuilder configurationBuilder)
    {
        ArgumentNullException.ThrowIfNull(configurationBuilder);
        base.ConfigureConventions(configurationBuilder);
        configurationBuilder.Properties<Power>().HaveConversion<PowerConverter>();
        configurationBuilder.Properties<Distance>().HaveConversion<DistanceConverter>();
        configurationBuilder.Properties<PrintSize>().HaveConversion<PrintSizeConverter>();
        configurationBuilder.Properties<Acuity>().HaveConversion<AcuityConverter>();
        configurationBuilder.Properties<AcuityReserve>().HaveConversion<AcuityReserveConverter>();
        configurationBuilder.Properties<VisualAngle>().HaveConversion<VisualAngleConverter>();
        configurationBuilder.Properties<Enum>().HaveConversion<string>().HaveMaxLength(40);
    }

    // Identity's own tables are configured by IdentityDbContext; every other entity has its configuration in Configurations/.
    protected override void OnModelCreating(ModelBuilder builder)
    {
        base.OnModelCreating(builder);
        builder.ApplyConfigurationsFromAssembly(typeof(ClinicDbContext).Assembly);
    }

    public override int SaveChanges(bool acceptAllChangesOnSuccess)
    {
        StampVersions();
        return base.SaveChanges(acceptAllChangesOnSuccess);
    }

    public override Task<int> SaveChangesAsync(bool acceptAllChangesOnSuccess, CancellationToken cancellationToken = default)
    {
        StampVersions();
        return base.SaveChangesAsync(acceptAllChangesOnSuccess, cancellationToken);
    }

    // Every save of a versioned record gives it a new token; EF Core then refuses a save whose original token
    // no longer matches the row, which is how a second editor learns that someone else saved first.
    private void StampVersions()
    {
        var now = _clock.GetUtcNow().UtcDateTime;
        foreach (var entry in ChangeTracker.Entries<IVersioned>())
        {
            if (entry.State == EntityState.Added)
            {
                entry.Entity.CreatedUtc = now;
            }

            if (entry.State is EntityState.Added or EntityState.Modified)
            {
                entry.Entity.UpdatedUtc = now;
                entry.Entity.Version = Guid.NewGuid();
            }
        }
    }
}
