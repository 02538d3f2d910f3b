using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class VisitGoalConfiguration : IEntityTypeConfiguration<VisitGoal>
{
    public void Configure(EntityTypeBuilder<VisitGoal> builder)
    {
        builder.Property(g => g.Detail).HasMaxLength(FieldLimits.Name);
        builder.Property(g => g.TargetText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(g => g.ViewingDistanceText).HasMaxLength(FieldLimits.Measurement);
    }
}
