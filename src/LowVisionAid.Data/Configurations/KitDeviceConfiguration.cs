using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class KitDeviceConfiguration : IEntityTypeConfiguration<KitDevice>
{
    public void Configure(EntityTypeBuilder<KitDevice> builder)
    {
        builder.Property(k => k.Code).HasMaxLength(FieldLimits.Code);   // case-insensitive: ClinicDbContext.OnModelCreating
        builder.HasIndex(k => k.Code).IsUnique();
        builder.Property(k => k.Name).HasMaxLength(FieldLimits.Name);
        builder.Property(k => k.Notes).HasMaxLength(FieldLimits.Notes);
        builder.Property(k => k.Version).IsConcurrencyToken();
    }
}
