using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace LowVisionAid.Migrations;

/// <summary>Lets <c>dotnet ef</c> build the access context (users, roles, audit) without starting the web app.</summary>
public sealed class AccessDesignTimeContextFactory : IDesignTimeDbContextFactory<AccessDbContext>
{
    public AccessDbContext CreateDbContext(string[] args)
    {
        var options = new DbContextOptionsBuilder<AccessDbContext>()
            .UseSqlite("Data Source=design-time.db", sqlite => sqlite
                .MigrationsAssembly(ClinicDatabase.MigrationsAssembly)
                .MigrationsHistoryTable(AccessDbContext.MigrationsHistoryTable))
            .Options;
        return new AccessDbContext(options);
    }
}
