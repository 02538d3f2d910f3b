using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Conversions;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Quantities;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Identity.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Query;

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
        if (Database.IsServer())
        {
            // PostgreSQL's timestamptz takes only UTC times; SQLite keeps none of the kind, so a time read from a file
            // (moving a clinic to a server) comes back Unspecified. Every stored time here is UTC already.
            configurationBuilder.Properties<DateTime>().HaveConversion<UtcDateTimeConverter>();
        }
    }

    // Identity's own tables are configured by IdentityDbContext; every other entity has its configuration in Configurations/.
    protected override void OnModelCreating(ModelBuilder builder)
    {
        base.OnModelCreating(builder);
        builder.ApplyConfigurationsFromAssembly(typeof(ClinicDbContext).Assembly);

        // Codes are unique and found whatever their case ("ab-1" is "AB-1"), with each provider's own collation.
        var caseInsensitive = "NOCASE";
        if (Database.IsServer())
        {
            caseInsensitive = ClinicDatabase.ServerCaseInsensitiveCollation;
            builder.HasCollation(caseInsensitive, locale: "und-u-ks-level2", provider: "icu", deterministic: false);

            // Any part of a name or code: a trigram index over the folded search text serves LIKE '%…%'
            // (postgresql.org/docs/current/pgtrgm.html, "Index Support"); SQLite has its FTS5 table instead (ClientSearch).
            builder.HasPostgresExtension("pg_trgm");
            builder.Entity<Client>().HasIndex(c => c.SearchText, "IX_Clients_SearchText_Trigram").HasMethod("gin").HasOperators("gin_trgm_ops");
        }

        builder.Entity<Client>().Property(c => c.Code).UseCollation(caseInsensitive);
        builder.Entity<KitDevice>().Property(k => k.Code).UseCollation(caseInsensitive);
    }

    public override int SaveChanges(bool acceptAllChangesOnSuccess)
    {
        StampVersions();
        var visits = ChangedVisits();
        if (visits.Count == 0)
        {
            return base.SaveChanges(acceptAllChangesOnSuccess);
        }

        using var own = Database.CurrentTransaction is null ? Database.BeginTransaction() : null;
        var saved = base.SaveChanges(acceptAllChangesOnSuccess);
        LatestVisitOf(visits).ExecuteUpdate(LatestVisitDate);
        own?.Commit();
        return saved;
    }

    public override async Task<int> SaveChangesAsync(bool acceptAllChangesOnSuccess, CancellationToken cancellationToken = default)
    {
        StampVersions();
        var visits = ChangedVisits();
        if (visits.Count == 0)
        {
            return await base.SaveChangesAsync(acceptAllChangesOnSuccess, cancellationToken).ConfigureAwait(false);
        }

        var own = Database.CurrentTransaction is null ? await Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false) : null;
        await using (own)
        {
            var saved = await base.SaveChangesAsync(acceptAllChangesOnSuccess, cancellationToken).ConfigureAwait(false);
            await LatestVisitOf(visits).ExecuteUpdateAsync(LatestVisitDate, cancellationToken).ConfigureAwait(false);
            if (own is not null)
            {
                await own.CommitAsync(cancellationToken).ConfigureAwait(false);
            }

            return saved;
        }
    }

    // The visits a save adds, changes or removes, with the client each belonged to before the save (a changed visit
    // could in principle move to another client: both clients' latest dates are refreshed).
    private List<(Visit Visit, int? ClientBefore)> ChangedVisits() =>
    [
        .. ChangeTracker.Entries<Visit>()
            .Where(e => e.State is EntityState.Added or EntityState.Modified or EntityState.Deleted)
            .Select(e => (e.Entity, e.State == EntityState.Added ? (int?)null : (int)e.OriginalValues[nameof(Visit.ClientId)]!)),
    ];

    // After the save: keys of added visits are known, so every client concerned can be named.
    private IQueryable<Client> LatestVisitOf(List<(Visit Visit, int? ClientBefore)> visits)
    {
        var ids = visits.Select(v => v.Visit.ClientId).Concat(visits.Where(v => v.ClientBefore is not null).Select(v => v.ClientBefore!.Value)).Distinct().ToList();
        return Clients.Where(c => ids.Contains(c.Id));
    }

    private void LatestVisitDate(UpdateSettersBuilder<Client> set) =>
        set.SetProperty(c => c.LastVisitDate, c => Visits.Where(v => v.ClientId == c.Id).Max(v => (DateOnly?)v.VisitDate));

    // Every save of a versioned record gives it a new token; EF Core then refuses a save whose original token
    // no longer matches the row, which is how a second editor learns that someone else saved first.
    private void StampVersions()
    {
        var now = _clock.GetUtcNow().UtcDateTime;
        foreach (var client in ChangeTracker.Entries<Client>().Where(e => e.State is EntityState.Added or EntityState.Modified))
        {
            client.Entity.SearchText = ClientSearch.For(client.Entity.Code, client.Entity.Name);
        }

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
