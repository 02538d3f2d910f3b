using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace LowVisionAid.Data.Configurations;

internal sealed class ReadingSpeedConfiguration : IEntityTypeConfiguration<ReadingSpeed>
{
    public void Configure(EntityTypeBuilder<ReadingSpeed> builder) =>
        builder.Property(r => r.PrintSizeText).HasMaxLength(FieldLimits.Measurement);
}
