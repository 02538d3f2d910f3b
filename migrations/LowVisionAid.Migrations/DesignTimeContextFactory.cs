using LowVisionAid.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace LowVisionAid.Migrations;

/// <summary>Lets <c>dotnet ef</c> build the context without starting the web app.</summary>
public sealed class DesignTimeContextFactory : IDesignTimeDbContextFactory<ClinicDbContext>
{
    public ClinicDbContext CreateDbContext(string[] args)
    {
        var options = new DbContextOptionsBuilder<ClinicDbContext>();
        options.UseClinicSqlite("Data Source=design-time.db");
        return new ClinicDbContext(options.Options);
    }
}
