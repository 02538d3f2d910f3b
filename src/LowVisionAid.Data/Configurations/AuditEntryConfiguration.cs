using LowVisionAid.Data.Audit;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class AuditEntryConfiguration : IEntityTypeConfiguration<AuditEntry>
{
    public void Configure(EntityTypeBuilder<AuditEntry> builder)
    {
        builder.ToTable(AuditEntry.Table);
        builder.Property(e => e.Actor).HasMaxLength(AuditEntry.ActorLength);
        builder.Property(e => e.Action).HasConversion<string>().HasMaxLength(20);
        builder.Property(e => e.RecordType).HasMaxLength(40);
        builder.Property(e => e.Detail).HasMaxLength(AuditEntry.DetailLength);
        builder.HasIndex(e => e.AtUtc);
        builder.HasIndex(e => new { e.RecordType, e.RecordId });
    }
}
