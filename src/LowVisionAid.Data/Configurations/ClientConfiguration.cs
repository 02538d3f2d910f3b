using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class ClientConfiguration : IEntityTypeConfiguration<Client>
{
    public void Configure(EntityTypeBuilder<Client> builder)
    {
        builder.Property(c => c.Code).HasMaxLength(FieldLimits.Code).UseCollation("NOCASE");
        builder.HasIndex(c => c.Code).IsUnique();
        builder.Property(c => c.Name).HasMaxLength(FieldLimits.Name);
        builder.HasIndex(c => c.Name);
        builder.Property(c => c.SearchText).HasMaxLength(ClientSearch.MaximumLength);
        // The client list: most recently seen first, then by code, read in index order a page at a time.
        builder.HasIndex(c => new { c.LastVisitDate, c.Code }).IsDescending(true, false);
        builder.Property(c => c.Notes).HasMaxLength(FieldLimits.Notes);
        builder.Property(c => c.Version).IsConcurrencyToken();
        builder.HasMany(c => c.Visits).WithOne(v => v.Client).HasForeignKey(v => v.ClientId).OnDelete(DeleteBehavior.Cascade);
    }
}
