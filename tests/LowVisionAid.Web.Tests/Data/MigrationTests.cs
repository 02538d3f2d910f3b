using LowVisionAid.Data;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;

namespace LowVisionAid.Web.Tests.Data;

public class MigrationTests
{
    [Fact]
    public async Task Starting_the_app_creates_the_database_file_and_applies_every_migration()
    {
        using var app = new ClinicApp();
        using var client = app.Browser();

        // Arrange / Act: the first request starts the app, which migrates.
        await client.GetAsync(new Uri("/Clients", UriKind.Relative));

        // Assert
        Assert.True(File.Exists(Path.Combine(app.DataFolder, ClinicDatabase.FileName)));
        var (applied, known) = await app.WithDbAsync(async db =>
            ((await db.Database.GetAppliedMigrationsAsync()).ToList(), db.Database.GetMigrations().ToList()));
        Assert.NotEmpty(known);
        Assert.Equal(known, applied);
    }

    [Fact]
    public async Task The_migrations_assembly_is_the_top_level_migrations_project()
    {
        using var app = new ClinicApp();
        var assembly = await app.WithDbAsync(db => Task.FromResult(db.GetService<IMigrationsAssembly>().Assembly.GetName().Name));
        Assert.Equal(ClinicDatabase.MigrationsAssembly, assembly);
    }
}
