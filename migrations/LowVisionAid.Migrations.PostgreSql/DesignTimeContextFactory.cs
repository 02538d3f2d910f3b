using LowVisionAid.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace LowVisionAid.Migrations.PostgreSql;

/// <summary>Lets <c>dotnet ef</c> build the server context without starting the web app (no server is contacted).</summary>
public sealed class DesignTimeContextFactory : IDesignTimeDbContextFactory<ClinicDbContext>
{
    public ClinicDbContext CreateDbContext(string[] args)
    {
        var options = new DbContextOptionsBuilder<ClinicDbContext>();
        options.UseClinicServer("Host=localhost;Database=lowvisionaid_design");
        return new ClinicDbContext(options.Options);
    }
}
