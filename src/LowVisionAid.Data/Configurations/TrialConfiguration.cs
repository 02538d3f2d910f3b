using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class TrialConfiguration : IEntityTypeConfiguration<Trial>
{
    public void Configure(EntityTypeBuilder<Trial> builder)
    {
        builder.Property(t => t.DeviceDescription).HasMaxLength(FieldLimits.Name);
        builder.Property(t => t.ResultText).HasMaxLength(FieldLimits.Measurement);
        builder.Property(t => t.ClientComment).HasMaxLength(FieldLimits.Notes);
        builder.Property(t => t.Version).IsConcurrencyToken();
        builder.HasIndex(t => t.FollowUpDue);
        // The follow-ups list (open ones, earliest first): only the open follow-ups are in this index.
        builder.HasIndex(t => new { t.FollowUpDue, t.Id }, "IX_Trials_OpenFollowUps").HasFilter("\"FollowUpDue\" IS NOT NULL AND \"FollowUpDone\" IS NULL");
        builder.HasOne(t => t.KitDevice).WithMany().HasForeignKey(t => t.KitDeviceId).OnDelete(DeleteBehavior.SetNull);
    }
}
