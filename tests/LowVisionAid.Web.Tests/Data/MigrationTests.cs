using LowVisionAid.Data;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;

namespace LowVisionAid.Web.Tests.Data;

public class MigrationTests
{
    [Fact]
    [Trait("Category", TestServer.SqliteFileCategory)]
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
    public async Task The_migrations_assembly_is_the_top_level_migrations_project_of_the_provider()
    {
        using var app = new ClinicApp();
        var assembly = await app.WithDbAsync(db => Task.FromResult(db.GetService<IMigrationsAssembly>().Assembly.GetName().Name));
        Assert.Equal(TestServer.InUse ? ClinicDatabase.ServerMigrationsAssembly : ClinicDatabase.MigrationsAssembly, assembly);
    }

    [Fact]
    [Trait("Category", TestServer.ServerOnlyCategory)]
    public async Task Starting_the_app_on_an_empty_server_database_applies_every_server_migration_and_loads_the_demo_clinic()
    {
        TestServer.Require();
        using var app = new ClinicApp { UseTemplateDatabase = false, LoadDemo = true };
        using var client = app.Browser();

        // Arrange / Act: the first request starts the app, which migrates the empty server database.
        using var response = await client.GetAsync(new Uri("/Clients", UriKind.Relative));

        // Assert
        Assert.Equal(System.Net.HttpStatusCode.OK, response.StatusCode);
        var (applied, known, server, clients) = await app.WithDbAsync(async db =>
            ((await db.Database.GetAppliedMigrationsAsync()).ToList(), db.Database.GetMigrations().ToList(), db.Database.IsServer(), await db.Clients.CountAsync()));
        Assert.True(server);
        Assert.NotEmpty(known);
        Assert.Equal(known, applied);
        Assert.True(clients > 0, "the demo clinic was loaded");
        Assert.False(File.Exists(Path.Combine(app.DataFolder, ClinicDatabase.FileName)), "no SQLite file is made beside a server database");
    }
}
