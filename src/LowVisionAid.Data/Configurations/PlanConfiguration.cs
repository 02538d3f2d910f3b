using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class PlanConfiguration : IEntityTypeConfiguration<Plan>
{
    public void Configure(EntityTypeBuilder<Plan> builder)
    {
        builder.Property(p => p.MethodVersion).HasMaxLength(FieldLimits.Code);
        builder.Property(p => p.Choices)
            .HasColumnName("ChosenOptions")
            .HasConversion(c => c.Stored, s => PlanChoices.FromStored(s))
            .HasMaxLength(FieldLimits.Measurement * 4)
            .IsRequired();
        builder.HasMany(p => p.Trials).WithOne(t => t.Plan).HasForeignKey(t => t.PlanId).OnDelete(DeleteBehavior.Cascade);
    }
}
