using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class ClientConfiguration : IEntityTypeConfiguration<Client>
{
    public void Configure(EntityTypeBuilder<Client> builder)
    {
        builder.Property(c => c.Code).HasMaxLength(FieldLimits.Code);   // case-insensitive: ClinicDbContext.OnModelCreating
        builder.HasIndex(c => c.Code).IsUnique();
        builder.Property(c => c.Name).HasMaxLength(FieldLimits.Name);
        builder.HasIndex(c => c.Name);
        builder.Property(c => c.SearchText).HasMaxLength(ClientSearch.MaximumLength);
        // The client list: most recently seen first, then by code, read in index order a page at a time. The search text
        // is in the index too, so a search walks the index alone and reads a client's row only when it matches.
        builder.HasIndex(c => new { c.LastVisitDate, c.Code, c.SearchText }).IsDescending(true, false, false);
        builder.Property(c => c.Notes).HasMaxLength(FieldLimits.Notes);
        builder.Property(c => c.Version).IsConcurrencyToken();
        builder.HasMany(c => c.Visits).WithOne(v => v.Client).HasForeignKey(v => v.ClientId).OnDelete(DeleteBehavior.Cascade);
    }
}
