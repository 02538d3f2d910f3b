using System.Collections;
using System.Diagnostics;
using System.Net;
using System.Security.Claims;
using System.Security.Cryptography;
using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Entities;
using LowVisionAid.Data.Moving;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Moving;
using Microsoft.AspNetCore.Identity;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Metadata;
using Microsoft.EntityFrameworkCore.Migrations;
using Microsoft.Extensions.DependencyInjection;
using Npgsql;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// <c>move-to-server --to &lt;connection string&gt;</c>: a clinic's SQLite file copied to an empty PostgreSQL database,
/// every table of the model with its keys, checked per table, the file never written, a non-empty target refused.
/// The rows are compared here independently of the command's own checksum: every entity read through EF from both
/// databases and compared property by property, keyed by primary key.
/// </summary>
public sealed class MoveToServerTests
{
    private const string Password = "a long sentence for the move";

    // ClinicHost puts a host's database on the test server in the server pass unless told otherwise: the source must be a file.
    private static readonly Dictionary<string, string?> OnSqlite = new() { ["Database:Provider"] = nameof(DatabaseProvider.Sqlite) };

    [Fact]
    [Trait("Category", "ServerOnly")]
    [Trait("Category", "Slow")]
    public async Task The_demo_clinic_moves_as_a_process_with_every_table_checked_its_file_unchanged_and_the_app_then_runs_on_the_server()
    {
        TestServer.Require();

        // Arrange: the demo clinic in its own SQLite file, the app stopped; an empty database on the server (no schema yet)
        using var data = new TempFolder("move-demo");
        using (var source = new ClinicApp("move-demo", loadDemo: true, settings: OnSqlite, data: data))
        {
            _ = source.Services;   // started: migrated and loaded with the demo clinic
        }

        SqliteConnection.ClearAllPools();
        var fileBefore = FileHash(data.DatabasePath);
        var target = TestServer.CreateDatabase(migrated: false);
        try
        {
            // Act: the real command line, as an administrator runs it
            var run = await RunProcessAsync(data.Path, target);

            // Assert: moved, each table of the model printed as matching, the password never shown, the file byte for byte the same
            Assert.True(run.ExitCode == MoveToServerCommand.Moved, run.Output + run.Errors);
            var password = new NpgsqlConnectionStringBuilder(target).Password!;
            Assert.DoesNotContain(password, run.Output + run.Errors, StringComparison.Ordinal);
            await using (var model = SourceContext(data.DatabasePath))
            {
                foreach (var table in model.Model.GetEntityTypes().Select(t => t.GetTableName()).OfType<string>())
                {
                    Assert.Matches($@"(?m)^{table} +\d+ +\d+ +[0-9a-f]{{16}} +[0-9a-f]{{16}} +yes\r?$", run.Output);
                }
            }

            Assert.Equal(fileBefore, FileHash(data.DatabasePath));
            var rows = await AssertSameRowsAsync(data.DatabasePath, target);
            Assert.True(rows["Clients"] > 0 && rows["Plans"] > 0 && rows["AuditEntries"] > 0, "the demo clinic has clients, plans and audit lines");

            // The app starts on the server database; the first administrator is set up there and a client added, whose
            // key and audit line come after the copied ones (the identity sequences were set past them).
            var (lastClient, lastAudit) = await LastKeysAsync(data.DatabasePath);
            using var onServer = ServerApp("move-demo-after", target);
            using var client = onServer.NewClient();
            await Accounts.CreateFirstAdministratorAsync(client);
            var added = await ClinicForms.AddClientAsync(client, "MOVED-0001", "Invented Newcomer");
            Assert.True(added > lastClient, $"the new client took key {added}; the copied clients end at {lastClient}");
            var audit = await onServer.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().AuditEntries.AsNoTracking().MaxAsync(e => e.Id));
            Assert.True(audit > lastAudit, $"the newest audit line has key {audit}; the copied lines end at {lastAudit}");
        }
        finally
        {
            TestServer.DropDatabase(target);
        }
    }

    [Fact]
    [Trait("Category", "ServerOnly")]
    public async Task A_clinic_with_every_table_filled_moves_with_every_row_of_every_table_the_same_and_its_accounts_sign_in()
    {
        TestServer.Require();

        // Arrange: the demo clinic plus a row in every table it leaves empty (accounts, their claims, logins and tokens,
        // a role claim, a reading speed), text in several scripts, a lockout time kept with a non-UTC offset
        using var data = new TempFolder("move-filled");
        var target = TestServer.CreateDatabase(migrated: true);   // migrated and empty: the command finds the schema current
        try
        {
            using var source = new ClinicApp("move-filled", loadDemo: true, settings: OnSqlite, data: data);
            await FillEveryTableAsync(source);
            var counts = await source.ServiceAsync(sp => CountEveryTableAsync(sp.GetRequiredService<ClinicDbContext>()));
            Assert.All(counts, table => Assert.True(table.Value > 0, $"{table.Key} has no row: the test must fill every table of the model"));
            var fileBefore = FileHash(data.DatabasePath);

            // Act: the command's own entry, over the app's services (its configuration and data folder)
            using var output = new StringWriter();
            using var errors = new StringWriter();
            var code = await MoveToServerCommand.RunAsync(source.Services, new MoveCommandLine(target, []), output, errors, CancellationToken.None);

            // Assert
            Assert.True(code == MoveToServerCommand.Moved, output + errors.ToString());
            Assert.Contains("every count and checksum is the same", output.ToString(), StringComparison.Ordinal);
            Assert.Equal(fileBefore, FileHash(data.DatabasePath));
            var moved = await AssertSameRowsAsync(data.DatabasePath, target);
            Assert.Equal(counts, moved);

            // The copied account signs in on the server with its password, and its clinic takes new records
            using var onServer = ServerApp("move-filled-after", target);
            using var client = onServer.NewClient();
            using (var signIn = await Accounts.SignInAsync(client, "moved.admin", Password))
            {
                Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
            }

            var (lastClient, _) = await LastKeysAsync(data.DatabasePath);
            Assert.True(await ClinicForms.AddClientAsync(client, "MOVED-0002") > lastClient);
        }
        finally
        {
            TestServer.DropDatabase(target);
        }
    }

    [Theory]
    [Trait("Category", "ServerOnly")]
    [InlineData("AuditEntries")]
    [InlineData("AspNetUsers")]
    [InlineData("Clients")]
    public async Task A_target_that_already_holds_a_row_is_refused_and_left_as_it_was(string table)
    {
        TestServer.Require();
        using var data = new TempFolder("move-refused");
        var target = TestServer.CreateDatabase(migrated: true);
        try
        {
            using var source = new ClinicApp("move-refused", loadDemo: true, settings: OnSqlite, data: data);
            _ = source.Services;
            await using (var server = ServerContext(target))
            {
                _ = table switch
                {
                    "AuditEntries" => server.Add((object)new AuditEntry { AtUtc = DateTime.UtcNow, Actor = "someone", RecordType = "Client", Action = AuditAction.Created }),
                    "AspNetUsers" => server.Add((object)new IdentityUser("already.there")),
                    _ => server.Add((object)new Client { Code = "THERE-0001" }),
                };
                await server.SaveChangesAsync();
            }

            var before = await ServerRowsAsync(target);
            var fileBefore = FileHash(data.DatabasePath);
            using var output = new StringWriter();
            using var errors = new StringWriter();

            var code = await MoveToServerCommand.RunAsync(source.Services, new MoveCommandLine(target, []), output, errors, CancellationToken.None);

            Assert.Equal(MoveToServerCommand.Refused, code);
            Assert.Contains($"already holds rows ({table}: 1); nothing was copied and nothing there was changed", errors.ToString(), StringComparison.Ordinal);
            AssertSameRows(before, await ServerRowsAsync(target));
            Assert.Equal(fileBefore, FileHash(data.DatabasePath));
        }
        finally
        {
            TestServer.DropDatabase(target);
        }
    }

    [Fact]
    [Trait("Category", "ServerOnly")]
    public async Task A_database_of_another_application_is_refused_before_any_table_is_added_to_it()
    {
        TestServer.Require();
        using var data = new TempFolder("move-foreign");
        var target = TestServer.CreateDatabase(migrated: false);
        try
        {
            using var source = new ClinicApp("move-foreign", loadDemo: true, settings: OnSqlite, data: data);
            _ = source.Services;
            await using (var connection = new NpgsqlConnection(target))
            {
                await connection.OpenAsync();
                await using var create = new NpgsqlCommand("CREATE TABLE invoices (id integer PRIMARY KEY)", connection);
                await create.ExecuteNonQueryAsync();
            }

            var report = await ClinicMove.ToServerAsync(data.DatabasePath, target);

            Assert.Equal(MoveOutcome.Refused, report.Outcome);
            Assert.Contains("holds tables that are not LowVisionAid's (public.invoices); nothing was copied", report.Message, StringComparison.Ordinal);
            Assert.Equal(["invoices"], await TableNamesAsync(target));
        }
        finally
        {
            TestServer.DropDatabase(target);
        }
    }

    [Fact]
    [Trait("Category", "ServerOnly")]
    public async Task A_row_the_server_cannot_store_rolls_the_whole_copy_back_and_leaves_the_target_empty()
    {
        TestServer.Require();

        // Arrange: SQLite does not enforce a text column's length; the server does (FieldLimits.Notes)
        using var data = new TempFolder("move-too-long");
        var target = TestServer.CreateDatabase(migrated: false);
        try
        {
            using var source = new ClinicApp("move-too-long", loadDemo: true, settings: OnSqlite, data: data);
            var tooLong = new string('n', FieldLimits.Notes + 1);
            await source.WithDbAsync(db => db.Database.ExecuteSqlAsync($"UPDATE \"Clients\" SET \"Notes\" = {tooLong} WHERE \"Id\" = (SELECT MAX(\"Id\") FROM \"Clients\")"));
            using var output = new StringWriter();
            using var errors = new StringWriter();

            // Act
            var code = await MoveToServerCommand.RunAsync(source.Services, new MoveCommandLine(target, []), output, errors, CancellationToken.None);

            // Assert: failed, said where, and not one row kept (parent tables copied before Clients were rolled back too)
            Assert.Equal(MoveToServerCommand.Failed, code);
            Assert.Contains("Copying Clients to PostgreSQL database", errors.ToString(), StringComparison.Ordinal);
            Assert.Contains("The copy was rolled back; nothing was kept on the server.", errors.ToString(), StringComparison.Ordinal);
            await using var server = ServerContext(target);
            Assert.All(await CountEveryTableAsync(server), table => Assert.Equal(0, table.Value));
        }
        finally
        {
            TestServer.DropDatabase(target);
        }
    }

    [Fact]
    [Trait("Category", "ServerOnly")]
    public async Task A_file_of_an_earlier_version_is_refused_unread_and_unchanged()
    {
        TestServer.Require();
        using var data = new TempFolder("move-earlier");
        await using (var earlier = EarlierFileContext(data.DatabasePath))
        {
            var first = earlier.Database.GetMigrations().First();
            await earlier.GetService<IMigrator>().MigrateAsync(first);   // as a clinic that has not started this version yet left it
        }

        SqliteConnection.ClearAllPools();
        var fileBefore = FileHash(data.DatabasePath);
        var target = TestServer.CreateDatabase(migrated: false);
        try
        {
            var report = await ClinicMove.ToServerAsync(data.DatabasePath, target);

            Assert.Equal(MoveOutcome.Refused, report.Outcome);
            Assert.Contains("was last opened by an earlier version of LowVisionAid. Start this version once on it", report.Message, StringComparison.Ordinal);
            Assert.Equal(fileBefore, FileHash(data.DatabasePath));
            Assert.Empty(await TableNamesAsync(target));
        }
        finally
        {
            TestServer.DropDatabase(target);
        }
    }

    [Fact]
    [Trait("Category", "ServerOnly")]
    public async Task An_app_configured_for_a_server_is_told_to_run_the_move_on_its_sqlite_file_and_the_target_is_not_touched()
    {
        TestServer.Require();
        var target = TestServer.CreateDatabase(migrated: false);
        try
        {
            using var app = new ClinicApp("move-from-server", loadDemo: false);   // the server pass: this host's database is on the server
            using var output = new StringWriter();
            using var errors = new StringWriter();

            var code = await MoveToServerCommand.RunAsync(app.Services, new MoveCommandLine(target, []), output, errors, CancellationToken.None);

            Assert.Equal(MoveToServerCommand.Refused, code);
            Assert.Contains("Database:Provider is PostgreSql: this app already uses a server.", errors.ToString(), StringComparison.Ordinal);
            Assert.Contains("--Database:Provider=Sqlite", errors.ToString(), StringComparison.Ordinal);
            Assert.Empty(await TableNamesAsync(target));
        }
        finally
        {
            TestServer.DropDatabase(target);
        }
    }

    [Fact]
    public void The_command_line_takes_the_target_and_passes_every_other_setting_to_the_host()
    {
        var parsed = MoveCommandLine.Parse(["move-to-server", "--DataFolder", "/tmp/x", "--to", "Host=h;Database=d", "--Database:Provider=Sqlite"]);

        Assert.NotNull(parsed);
        Assert.Equal("Host=h;Database=d", parsed.To);
        Assert.Equal(["--DataFolder", "/tmp/x", "--Database:Provider=Sqlite"], parsed.HostArgs);
        Assert.Equal("Host=h;Database=d", MoveCommandLine.Parse(["move-to-server", "--to=Host=h;Database=d"])!.To);
        Assert.Null(MoveCommandLine.Parse(["create-admin", "--user", "a.khan"]));
    }

    [Theory]
    [InlineData("Host=clinic-server;Password=hunter2-secret;Username", "--to is not a PostgreSQL connection string")]
    [InlineData("Password=hunter2-secret;Database=lowvisionaid", "--to must name the server and the database")]
    [InlineData("", "Name the PostgreSQL database to move into")]
    public async Task A_mistyped_target_exits_with_the_usage_code_and_never_echoes_its_password(string to, string message)
    {
        using var output = new StringWriter();
        using var errors = new StringWriter();

        await using var nothing = new ServiceCollection().BuildServiceProvider();   // a mistyped target is answered before any setting is read

        var code = await MoveToServerCommand.RunAsync(nothing, new MoveCommandLine(to, []), output, errors, CancellationToken.None);

        Assert.Equal(MoveToServerCommand.Usage, code);
        Assert.Contains(message, errors.ToString(), StringComparison.Ordinal);
        Assert.DoesNotContain("hunter2", output.ToString() + errors, StringComparison.Ordinal);
    }

    [Fact]
    public void The_checksum_is_the_same_in_any_row_order_and_changes_with_any_value_but_not_below_a_microsecond()
    {
        // The rule of docs/moving-to-server.md ("What is checked"), on the Clients table of the model
        using var db = EarlierFileContext(Path.Combine(Path.GetTempPath(), "never-opened.db"));   // the model only: no connection is opened
        var clients = ModelTable.InForeignKeyOrder(db.Model).Single(t => t.Name == "Clients");
        var created = new DateTime(2026, 12, 3, 9, 30, 15, DateTimeKind.Unspecified).AddTicks(1_234_560);   // 0.123456 s
        object?[] Row(int id, string? notes = "", DateTime? at = null) =>
            [.. clients.Properties.Select(p => p.Name switch
            {
                nameof(Client.Id) => id,
                nameof(Client.Code) => $"C-{id}",
                nameof(Client.Notes) => notes,
                nameof(Client.CreatedUtc) or nameof(Client.UpdatedUtc) => at ?? created,
                nameof(Client.Version) => Guid.Empty,
                _ => p.ClrType.IsValueType && Nullable.GetUnderlyingType(p.ClrType) is null ? Activator.CreateInstance(p.ClrType) : null,
            })];
        string Sum(params object?[][] rows)
        {
            var sum = new TableChecksum();
            foreach (var row in rows)
            {
                sum.Add(clients.Properties, row);
            }

            return sum.Hex;
        }

        var both = Sum(Row(1), Row(2));
        Assert.Equal(both, Sum(Row(2), Row(1)));                                        // order of rows
        Assert.NotEqual(both, Sum(Row(1), Row(3)));                                     // another key
        Assert.NotEqual(both, Sum(Row(1), Row(2, notes: null)));                        // null is not an empty text
        Assert.NotEqual(both, Sum(Row(1), Row(2, notes: "x")));                         // any value
        Assert.NotEqual(both, Sum(Row(1)));                                             // a missing row
        Assert.Equal(both, Sum(Row(1), Row(2, at: DateTime.SpecifyKind(created, DateTimeKind.Utc))));   // the kind of a UTC time
        Assert.Equal(both, Sum(Row(1), Row(2, at: created.AddTicks(9))));               // below a microsecond (PostgreSQL's resolution)
        Assert.NotEqual(both, Sum(Row(1), Row(2, at: created.AddTicks(10))));           // one microsecond
        Assert.Equal(64, both.Length);
    }

    private static async Task FillEveryTableAsync(ClinicApp app) =>
        await app.ServiceAsync(async sp =>
        {
            var users = sp.GetRequiredService<UserManager<IdentityUser>>();
            var user = new IdentityUser("moved.admin") { Email = "moved.admin@clinic.invalid" };
            Succeeded(await users.CreateAsync(user, Password));
            Succeeded(await users.AddToRoleAsync(user, ClinicRoles.Administrator));
            Succeeded(await users.AddClaimAsync(user, new Claim("room", "Room 2 – Zoë's")));
            Succeeded(await users.AddLoginAsync(user, new UserLoginInfo("clinic-directory", "key-0001", "Clinic directory")));
            Succeeded(await users.SetAuthenticationTokenAsync(user, "clinic-directory", "refresh", "token-0001"));
            var locked = new IdentityUser("locked.once");
            Succeeded(await users.CreateAsync(locked, Password));
            Succeeded(await users.SetLockoutEndDateAsync(locked, new DateTimeOffset(2026, 11, 30, 9, 15, 30, 123, TimeSpan.FromHours(2))));   // over: not locked now
            var roles = sp.GetRequiredService<RoleManager<IdentityRole>>();
            Succeeded(await roles.AddClaimAsync((await roles.FindByNameAsync(ClinicRoles.Clinician))!, new Claim("may", "print handouts")));

            var db = sp.GetRequiredService<ClinicDbContext>();
            var visit = await db.Visits.OrderBy(v => v.Id).FirstAsync();
            visit.ReadingSpeeds.Add(new ReadingSpeed { Position = 0, PrintSizeText = "1.0M", PrintSize = PrintSize.FromM(1.0), WordsPerMinute = 82 });
            db.Clients.Add(new Client { Code = "ÅR-0042", Name = "Invented Ñandú 中文 \"quoted\"", Notes = "Line one\nline 'two'; emoji 👓", YearOfBirth = null });
            await db.SaveChangesAsync();
            return 0;
        });

    private static void Succeeded(IdentityResult result) => Assert.True(result.Succeeded, string.Join("; ", result.Errors.Select(e => e.Description)));

    // Every table of the model, read through EF entity by entity on both sides and compared property by property.
    private static async Task<Dictionary<string, int>> AssertSameRowsAsync(string sqliteFile, string target)
    {
        await using var file = SourceContext(sqliteFile);
        var source = await RowsByTableAsync(file);
        AssertSameRows(source, await ServerRowsAsync(target));
        return source.ToDictionary(t => t.Key, t => t.Value.Count);
    }

    private static void AssertSameRows(Dictionary<string, Dictionary<string, Dictionary<string, object?>>> expected, Dictionary<string, Dictionary<string, Dictionary<string, object?>>> actual)
    {
        Assert.Equal(expected.Keys.Order(StringComparer.Ordinal), actual.Keys.Order(StringComparer.Ordinal));
        foreach (var (table, rows) in expected)
        {
            Assert.True(rows.Count == actual[table].Count, $"{table}: {rows.Count} rows expected, {actual[table].Count} found");
            foreach (var (key, values) in rows)
            {
                Assert.True(actual[table].TryGetValue(key, out var other), $"{table}: no row with key {key}");
                foreach (var (property, value) in values)
                {
                    Assert.True(Equals(value, other[property]), $"{table} {key} {property}: {value} expected, {other[property]} found");
                }
            }
        }
    }

    private static async Task<Dictionary<string, Dictionary<string, Dictionary<string, object?>>>> ServerRowsAsync(string target)
    {
        await using var server = ServerContext(target);
        return await RowsByTableAsync(server);
    }

    // Table → primary key → property → comparable value, for every entity type with a table.
    private static async Task<Dictionary<string, Dictionary<string, Dictionary<string, object?>>>> RowsByTableAsync(ClinicDbContext db)
    {
        var tables = new Dictionary<string, Dictionary<string, Dictionary<string, object?>>>();
        foreach (var type in db.Model.GetEntityTypes().Where(t => t.GetTableName() is not null))
        {
            var properties = type.GetProperties().ToList();
            Assert.DoesNotContain(properties, p => p.IsShadowProperty());   // so reading the entities reads every column
            var key = type.FindPrimaryKey()!.Properties;
            var rows = new Dictionary<string, Dictionary<string, object?>>();
            foreach (var entity in await EntitiesAsync(db, type))
            {
                rows.Add(
                    string.Join("|", key.Select(k => Convert.ToString(k.PropertyInfo!.GetValue(entity), CultureInfo.InvariantCulture))),
                    properties.ToDictionary(p => p.Name, p => Comparable(p.PropertyInfo!.GetValue(entity))));
            }

            tables.Add(type.GetTableName()!, rows);
        }

        return tables;
    }

    private static async Task<Dictionary<string, int>> CountEveryTableAsync(ClinicDbContext db)
    {
        var counts = new Dictionary<string, int>();
        foreach (var type in db.Model.GetEntityTypes().Where(t => t.GetTableName() is not null))
        {
            counts.Add(type.GetTableName()!, (await EntitiesAsync(db, type)).Count);
        }

        return counts;
    }

    private static async Task<List<object>> EntitiesAsync(ClinicDbContext db, IEntityType type) =>
        await (Task<List<object>>)typeof(MoveToServerTests).GetMethod(nameof(EntitiesOfAsync), System.Reflection.BindingFlags.NonPublic | System.Reflection.BindingFlags.Static)!
            .MakeGenericMethod(type.ClrType).Invoke(null, [db])!;

    private static async Task<List<object>> EntitiesOfAsync<T>(ClinicDbContext db)
        where T : class =>
        [.. await db.Set<T>().AsNoTracking().ToListAsync()];

    // PostgreSQL keeps times to the microsecond (postgresql.org/docs/current/datatype-datetime.html, "Resolution: 1
    // microsecond"); .NET keeps 100 ns ticks. A time is compared to the microsecond, as UTC (SQLite returns it without a
    // kind, the server as UTC). A dictionary (the clinic's cost classes) is compared by its entries.
    private static object? Comparable(object? value) => value switch
    {
        DateTime t => t.Ticks - (t.Ticks % 10),
        DateTimeOffset t => t.UtcTicks - (t.UtcTicks % 10),
        IDictionary d => string.Join(";", d.Keys.Cast<object>().Select(k => $"{k}={d[k]}").Order(StringComparer.Ordinal)),
        _ => value,
    };

    private static async Task<(int Client, long Audit)> LastKeysAsync(string sqliteFile)
    {
        await using var db = SourceContext(sqliteFile);
        return (await db.Clients.MaxAsync(c => c.Id), await db.AuditEntries.MaxAsync(e => e.Id));
    }

    private static ClinicApp ServerApp(string purpose, string target) =>
        new(purpose, loadDemo: false, settings: new Dictionary<string, string?>
        {
            ["Database:Provider"] = nameof(DatabaseProvider.PostgreSql),
            ["Database:ConnectionString"] = target,
        });

    private static ClinicDbContext SourceContext(string sqliteFile)
    {
        var options = new DbContextOptionsBuilder<ClinicDbContext>();
        options.UseClinicSqlite(new SqliteConnectionStringBuilder { DataSource = sqliteFile, Mode = SqliteOpenMode.ReadOnly, Pooling = false }.ToString());
        return new ClinicDbContext(options.Options);
    }

    private static ClinicDbContext EarlierFileContext(string sqliteFile)
    {
        var options = new DbContextOptionsBuilder<ClinicDbContext>();
        options.UseClinicSqlite(new SqliteConnectionStringBuilder { DataSource = sqliteFile, Pooling = false }.ToString());
        return new ClinicDbContext(options.Options);
    }

    private static ClinicDbContext ServerContext(string target)
    {
        var options = new DbContextOptionsBuilder<ClinicDbContext>();
        options.UseClinicServer(target);
        return new ClinicDbContext(options.Options);
    }

    private static async Task<List<string>> TableNamesAsync(string target)
    {
        await using var connection = new NpgsqlConnection(target);
        await connection.OpenAsync();
        await using var command = new NpgsqlCommand("SELECT table_name FROM information_schema.tables WHERE table_schema = 'public'", connection);
        await using var reader = await command.ExecuteReaderAsync();
        var names = new List<string>();
        while (await reader.ReadAsync())
        {
            names.Add(reader.GetString(0));
        }

        return names;
    }

    private static string FileHash(string path) => Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(path)));

    private sealed record Run(int ExitCode, string Output, string Errors);

    // The built app as a process, as an administrator runs the command; bounded so that a server started by mistake fails the test.
    private static async Task<Run> RunProcessAsync(string dataFolder, string target)
    {
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var argument in new[] { AppProcess.WebAssemblyPath(), MoveCommandLine.Command, MoveCommandLine.ToOption, target, "--DataFolder", dataFolder })
        {
            start.ArgumentList.Add(argument);
        }

        start.Environment["ASPNETCORE_ENVIRONMENT"] = "Production";
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var errors = process.StandardError.ReadToEndAsync();
        using var bound = new CancellationTokenSource(TimeSpan.FromSeconds(120));
        try
        {
            await process.WaitForExitAsync(bound.Token);
        }
        catch (OperationCanceledException)
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException("The move did not finish within 120 s: it may have started the web server.");
        }

        return new Run(process.ExitCode, await output, await errors);
    }
}
