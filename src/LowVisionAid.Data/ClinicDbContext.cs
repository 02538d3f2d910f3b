using LowVisionAid.Data.Conversions;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Quantities;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Data;

/// <summary>The clinic's one database: clients, visits, plans, trials, the kit and the settings.</summary>
public sealed class ClinicDbContext(DbContextOptions<ClinicDbContext> options, TimeProvider? clock = null) : DbContext(options)
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

    protected override void ConfigureConventions(ModelConfigurationBuilder configurationBuilder)
    {
        ArgumentNullException.ThrowIfNull(configurationBuilder);
        configurationBuilder.Properties<Power>().HaveConversion<PowerConverter>();
        configurationBuilder.Properties<Distance>().HaveConversion<DistanceConverter>();
        configurationBuilder.Properties<PrintSize>().HaveConversion<PrintSizeConverter>();
        configurationBuilder.Properties<Acuity>().HaveConversion<AcuityConverter>();
        configurationBuilder.Properties<AcuityReserve>().HaveConversion<AcuityReserveConverter>();
        configurationBuilder.Properties<VisualAngle>().HaveConversion<VisualAngleConverter>();
        configurationBuilder.Properties<Enum>().HaveConversion<string>().HaveMaxLength(40);
    }

    protected override void OnModelCreating(ModelBuilder modelBuilder) =>
        modelBuilder.ApplyConfigurationsFromAssembly(typeof(ClinicDbContext).Assembly);

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
