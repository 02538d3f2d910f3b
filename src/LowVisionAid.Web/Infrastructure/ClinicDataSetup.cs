using LowVisionAid.Data;
using LowVisionAid.Data.Backup;
using LowVisionAid.Web.Demo;
using Microsoft.Extensions.Options;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>The database: which provider (the SQLite file or a shared server), where its files live, how it is opened, its backups, and what happens to it at start.</summary>
internal static class ClinicDataSetup
{
    public const string FolderProblem =
        "DataFolder or BackupFolder is not a folder path. Give a folder such as D:\\LowVisionAid\\data or /srv/lowvisionaid/data, or leave it empty for the default.";

    public static WebApplicationBuilder AddClinicData(this WebApplicationBuilder builder)
    {
        var services = builder.Services;
        services.AddOptions<ClinicDataOptions>()
            .Bind(builder.Configuration)
            .Validate(o => o.FoldersAreValid(), FolderProblem)
            .ValidateOnStart();
        services.AddOptions<ClinicDatabaseOptions>()
            .BindConfiguration(ClinicDatabaseOptions.Section)
            .Validate(o => o.Problem() is null, "The Database settings are not usable (the start-up message says what to type).")
            .ValidateOnStart();
        services.AddSingleton(sp => ClinicFolders.Resolve(sp.GetRequiredService<IOptions<ClinicDataOptions>>().Value, sp.GetRequiredService<IHostEnvironment>().ContentRootPath));
        services.AddSingleton(sp => ClinicDatabaseTarget.Resolve(sp.GetRequiredService<IOptions<ClinicDatabaseOptions>>().Value, sp.GetRequiredService<ClinicFolders>()));
        services.AddSingleton(TimeProvider.System);
        services.AddSingleton(sp => ClinicCalendar.From(sp.GetRequiredService<IConfiguration>(), sp.GetRequiredService<TimeProvider>()));

        // Options built once: the connection string (and the data folder it creates) does not change while the app runs.
        services.AddDbContext<ClinicDbContext>(
            (sp, options) =>
            {
                var target = sp.GetRequiredService<ClinicDatabaseTarget>();
                options.UseClinicDatabase(target.Provider, target.ConnectionString);
            },
            optionsLifetime: ServiceLifetime.Singleton);
        services.AddScoped(sp =>
        {
            var folders = sp.GetRequiredService<ClinicFolders>();
            return new DatabaseBackups(folders.DatabaseFile, folders.Backups, sp.GetRequiredService<TimeProvider>());
        });
        services.AddScoped<DemoClinic>();
        services.AddScoped<DatabaseStartUp>();
        return builder;
    }

    /// <summary>
    /// The database start-up, once per start, before the first request: the settings are checked, then under the
    /// start-up lock the database is backed up (if a migration is due), migrated, given its roles, and loaded with the
    /// demo clinic when it is new and <see cref="ClinicDataOptions.LoadDemoClinic"/> is on.
    /// </summary>
    public static async Task PrepareClinicDatabaseAsync(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        app.Services.GetRequiredService<IStartupValidator>().Validate();
        var loadDemo = app.Services.GetRequiredService<IOptions<ClinicDataOptions>>().Value.LoadDemoClinic;
        await DatabaseStartUp.RunAsync(app.Services, loadDemo, app.Lifetime.ApplicationStopping).ConfigureAwait(false);
    }
}
