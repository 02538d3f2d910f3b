using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class VisitConfiguration : IEntityTypeConfiguration<Visit>
{
    public void Configure(EntityTypeBuilder<Visit> builder)
    {
        builder.HasIndex(v => new { v.ClientId, v.VisitDate });
        builder.Property(v => v.Practitioner).HasMaxLength(FieldLimits.Name);
        builder.Property(v => v.DistanceRightText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(v => v.DistanceLeftText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(v => v.DistanceBothText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(v => v.NearThresholdText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(v => v.NearTestDistanceText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(v => v.ContrastSensitivityText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(v => v.RefractionWorn).HasMaxLength(FieldLimits.Name);
        builder.Property(v => v.AddWornText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(v => v.AccommodationText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(v => v.WorkingDistanceText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(v => v.Notes).HasMaxLength(FieldLimits.Notes);
        builder.Property(v => v.Version).IsConcurrencyToken();
        builder.HasMany(v => v.Goals).WithOne().HasForeignKey(g => g.VisitId).OnDelete(DeleteBehavior.Cascade);
        builder.HasMany(v => v.ReadingSpeeds).WithOne().HasForeignKey(r => r.VisitId).OnDelete(DeleteBehavior.Cascade);
        builder.HasMany(v => v.Plans).WithOne(p => p.Visit).HasForeignKey(p => p.VisitId).OnDelete(DeleteBehavior.Cascade);
    }
}
