using LowVisionAid.Data.Conversions;
using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class ClinicSettingsConfiguration : IEntityTypeConfiguration<ClinicSettings>
{
    public void Configure(EntityTypeBuilder<ClinicSettings> builder)
    {
        builder.Property(s => s.Id).ValueGeneratedNever();
        builder.Property(s => s.ClinicName).HasMaxLength(FieldLimits.Name);
        builder.Property(s => s.ClinicContact).HasMaxLength(FieldLimits.Notes);
        builder.Property(s => s.Version).IsConcurrencyToken();
        builder.Property(s => s.CostClasses)
            .HasConversion(new CostClassesConverter(), CostClassesConverter.Comparer)
            .HasMaxLength(FieldLimits.Notes);
    }
}
