using LowVisionAid.Data;
using LowVisionAid.Web.Demo;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>The database: where its file lives, how it is opened, and what happens to it at start.</summary>
internal static class ClinicDataSetup
{
    /// <summary>Configuration key for the folder that holds the database file; default <c>&lt;content root&gt;/data</c>.</summary>
    public const string DataFolderKey = "DataFolder";

    /// <summary>Configuration key that turns off loading the demo clinic into an empty database.</summary>
    public const string LoadDemoKey = "LoadDemoClinic";

    public static WebApplicationBuilder AddClinicData(this WebApplicationBuilder builder)
    {
        var folder = builder.Configuration[DataFolderKey];
        folder = string.IsNullOrWhiteSpace(folder)
            ? Path.Combine(builder.Environment.ContentRootPath, "data")
            : Path.GetFullPath(folder, builder.Environment.ContentRootPath);
        var connectionString = ClinicDatabase.ConnectionStringFor(folder);

        builder.Services.AddSingleton(TimeProvider.System);
        builder.Services.AddSingleton(sp => ClinicCalendar.From(sp.GetRequiredService<IConfiguration>(), sp.GetRequiredService<TimeProvider>()));
        builder.Services.AddDbContext<ClinicDbContext>(options => options.UseClinicSqlite(connectionString));
        builder.Services.AddScoped<DemoClinic>();
        return builder;
    }

    /// <summary>Applies pending migrations, then loads the demo clinic when the database is empty.</summary>
    public static async Task PrepareClinicDatabaseAsync(this WebApplication app)
    {
        await using var scope = app.Services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<ClinicDbContext>();
        await db.UpgradeAsync().ConfigureAwait(false);
        if (app.Configuration.GetValue(LoadDemoKey, defaultValue: true))
        {
            await scope.ServiceProvider.GetRequiredService<DemoClinic>().LoadIntoEmptyDatabaseAsync(CancellationToken.None).ConfigureAwait(false);
        }
    }
}
