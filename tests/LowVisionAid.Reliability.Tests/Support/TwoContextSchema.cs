using LowVisionAid.Data;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>
/// The schema the two-context version added for sign-in and the audit trail, frozen: the script <c>dotnet ef
/// migrations script --context AccessDbContext</c> wrote for its one migration (InitialAccess) before that context
/// was merged into the clinic context. Tests build databases "as the earlier version left them" with it.
/// </summary>
public static class TwoContextSchema
{
    public const string HistoryTable = "__AccessMigrationsHistory";

    public const string InitialAccess = "20261201222101_InitialAccess";

    /// <summary>The clinic migration the earlier version had applied when it added the access schema.</summary>
    public const string ClinicMigrationThen = "20261201224900_KitOpticsAndDistanceGoals";

    public const string AccessScript = """
    CREATE TABLE IF NOT EXISTS "__AccessMigrationsHistory" (
        "MigrationId" TEXT NOT NULL CONSTRAINT "PK___AccessMigrationsHistory" PRIMARY KEY,
        "ProductVersion" TEXT NOT NULL
    );

    BEGIN TRANSACTION;
    CREATE TABLE "AspNetRoles" (
        "Id" TEXT NOT NULL CONSTRAINT "PK_AspNetRoles" PRIMARY KEY,
        "Name" TEXT NULL,
        "NormalizedName" TEXT NULL,
        "ConcurrencyStamp" TEXT NULL
    );

    CREATE TABLE "AspNetUsers" (
        "Id" TEXT NOT NULL CONSTRAINT "PK_AspNetUsers" PRIMARY KEY,
        "UserName" TEXT NULL,
        "NormalizedUserName" TEXT NULL,
        "Email" TEXT NULL,
        "NormalizedEmail" TEXT NULL,
        "EmailConfirmed" INTEGER NOT NULL,
        "PasswordHash" TEXT NULL,
        "SecurityStamp" TEXT NULL,
        "ConcurrencyStamp" TEXT NULL,
        "PhoneNumber" TEXT NULL,
        "PhoneNumberConfirmed" INTEGER NOT NULL,
        "TwoFactorEnabled" INTEGER NOT NULL,
        "LockoutEnd" TEXT NULL,
        "LockoutEnabled" INTEGER NOT NULL,
        "AccessFailedCount" INTEGER NOT NULL
    );

    CREATE TABLE "AuditEntries" (
        "Id" INTEGER NOT NULL CONSTRAINT "PK_AuditEntries" PRIMARY KEY AUTOINCREMENT,
        "AtUtc" TEXT NOT NULL,
        "Actor" TEXT NOT NULL,
        "Action" TEXT NOT NULL,
        "RecordType" TEXT NOT NULL,
        "RecordId" INTEGER NULL,
        "Detail" TEXT NULL
    );

    CREATE TABLE "AspNetRoleClaims" (
        "Id" INTEGER NOT NULL CONSTRAINT "PK_AspNetRoleClaims" PRIMARY KEY AUTOINCREMENT,
        "RoleId" TEXT NOT NULL,
        "ClaimType" TEXT NULL,
        "ClaimValue" TEXT NULL,
        CONSTRAINT "FK_AspNetRoleClaims_AspNetRoles_RoleId" FOREIGN KEY ("RoleId") REFERENCES "AspNetRoles" ("Id") ON DELETE CASCADE
    );

    CREATE TABLE "AspNetUserClaims" (
        "Id" INTEGER NOT NULL CONSTRAINT "PK_AspNetUserClaims" PRIMARY KEY AUTOINCREMENT,
        "UserId" TEXT NOT NULL,
        "ClaimType" TEXT NULL,
        "ClaimValue" TEXT NULL,
        CONSTRAINT "FK_AspNetUserClaims_AspNetUsers_UserId" FOREIGN KEY ("UserId") REFERENCES "AspNetUsers" ("Id") ON DELETE CASCADE
    );

    CREATE TABLE "AspNetUserLogins" (
        "LoginProvider" TEXT NOT NULL,
        "ProviderKey" TEXT NOT NULL,
        "ProviderDisplayName" TEXT NULL,
        "UserId" TEXT NOT NULL,
        CONSTRAINT "PK_AspNetUserLogins" PRIMARY KEY ("LoginProvider", "ProviderKey"),
        CONSTRAINT "FK_AspNetUserLogins_AspNetUsers_UserId" FOREIGN KEY ("UserId") REFERENCES "AspNetUsers" ("Id") ON DELETE CASCADE
    );

    CREATE TABLE "AspNetUserRoles" (
        "UserId" TEXT NOT NULL,
        "RoleId" TEXT NOT NULL,
        CONSTRAINT "PK_AspNetUserRoles" PRIMARY KEY ("UserId", "RoleId"),
        CONSTRAINT "FK_AspNetUserRoles_AspNetRoles_RoleId" FOREIGN KEY ("RoleId") REFERENCES "AspNetRoles" ("Id") ON DELETE CASCADE,
        CONSTRAINT "FK_AspNetUserRoles_AspNetUsers_UserId" FOREIGN KEY ("UserId") REFERENCES "AspNetUsers" ("Id") ON DELETE CASCADE
    );

    CREATE TABLE "AspNetUserTokens" (
        "UserId" TEXT NOT NULL,
        "LoginProvider" TEXT NOT NULL,
        "Name" TEXT NOT NULL,
        "Value" TEXT NULL,
        CONSTRAINT "PK_AspNetUserTokens" PRIMARY KEY ("UserId", "LoginProvider", "Name"),
        CONSTRAINT "FK_AspNetUserTokens_AspNetUsers_UserId" FOREIGN KEY ("UserId") REFERENCES "AspNetUsers" ("Id") ON DELETE CASCADE
    );

    CREATE INDEX "IX_AspNetRoleClaims_RoleId" ON "AspNetRoleClaims" ("RoleId");

    CREATE UNIQUE INDEX "RoleNameIndex" ON "AspNetRoles" ("NormalizedName");

    CREATE INDEX "IX_AspNetUserClaims_UserId" ON "AspNetUserClaims" ("UserId");

    CREATE INDEX "IX_AspNetUserLogins_UserId" ON "AspNetUserLogins" ("UserId");

    CREATE INDEX "IX_AspNetUserRoles_RoleId" ON "AspNetUserRoles" ("RoleId");

    CREATE INDEX "EmailIndex" ON "AspNetUsers" ("NormalizedEmail");

    CREATE UNIQUE INDEX "UserNameIndex" ON "AspNetUsers" ("NormalizedUserName");

    CREATE INDEX "IX_AuditEntries_AtUtc" ON "AuditEntries" ("AtUtc");

    CREATE INDEX "IX_AuditEntries_RecordType_RecordId" ON "AuditEntries" ("RecordType", "RecordId");

    INSERT INTO "__AccessMigrationsHistory" ("MigrationId", "ProductVersion")
    VALUES ('20261201222101_InitialAccess', '10.0.15');

    COMMIT;
    """;

    /// <summary>A context on the database file in <paramref name="folder"/>, configured as the app configures it.</summary>
    /// <summary>
    /// A client row as the first clinic schema stores it. Raw SQL, because the current model has columns an earlier
    /// schema lacks (the stored latest-visit date and search text), so EF Core cannot insert into that schema.
    /// </summary>
    public static void AddEarlierClient(ClinicDbContext db, string code, string name)
    {
        ArgumentNullException.ThrowIfNull(db);
        var version = Guid.NewGuid().ToString().ToUpperInvariant();
        var now = DateTime.UtcNow.ToString("yyyy-MM-dd HH:mm:ss.FFFFFFF", System.Globalization.CultureInfo.InvariantCulture);
        db.Database.ExecuteSql($"INSERT INTO Clients (Code, Name, IsDemo, Version, CreatedUtc, UpdatedUtc) VALUES ({code}, {name}, 0, {version}, {now}, {now})");
    }

    public static ClinicDbContext Context(string folder)
    {
        var builder = new DbContextOptionsBuilder<ClinicDbContext>();
        builder.UseClinicSqlite(ClinicDatabase.ConnectionStringFor(folder));
        return new ClinicDbContext(builder.Options);
    }

    /// <summary>
    /// A database as the two-context version left it: the clinic schema up to <paramref name="clinicMigration"/>
    /// (null: none) and, when <paramref name="withAccess"/>, the access schema and its own history table.
    /// </summary>
    public static async Task BuildAsync(string folder, string? clinicMigration, bool withAccess = true)
    {
        await using (var clinic = Context(folder))
        {
            if (clinicMigration is not null)
            {
                await clinic.GetService<IMigrator>().MigrateAsync(clinicMigration);
            }
        }

        if (withAccess)
        {
            using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = Path.Combine(folder, ClinicDatabase.FileName), Pooling = false }.ToString());
            connection.Open();
            using var command = connection.CreateCommand();
            command.CommandText = AccessScript;
            command.ExecuteNonQuery();
        }

        SqliteConnection.ClearAllPools();
    }
}
