using System.Data.Common;
using System.Globalization;

namespace LowVisionAid.Data.Audit;

/// <summary>
/// Writes audit lines with plain SQL on a connection the caller already holds, so that the line commits or rolls
/// back together with the change it describes.
/// </summary>
public static class AuditWriter
{
    // EF Core's SQLite provider stores DateTime as this text form; the audit view reads it back through EF Core.
    // PostgreSQL takes the UTC time itself (timestamp with time zone).
    private const string StoredDateTime = "yyyy-MM-dd HH:mm:ss.FFFFFFF";

    public static async Task InsertAsync(DbConnection connection, DbTransaction? transaction, AuditEntry entry, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(connection);
        ArgumentNullException.ThrowIfNull(entry);
        await using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText =
            $"INSERT INTO \"{AuditEntry.Table}\" (\"AtUtc\", \"Actor\", \"Action\", \"RecordType\", \"RecordId\", \"Detail\") " +
            "VALUES (@at, @actor, @action, @type, @id, @detail)";
        var at = DateTime.SpecifyKind(entry.AtUtc, DateTimeKind.Utc);
        Add(command, "@at", connection is Npgsql.NpgsqlConnection ? at : at.ToString(StoredDateTime, CultureInfo.InvariantCulture));
        Add(command, "@actor", Truncate(entry.Actor, AuditEntry.ActorLength));
        Add(command, "@action", entry.Action.ToString());
        Add(command, "@type", entry.RecordType);
        Add(command, "@id", entry.RecordId);
        Add(command, "@detail", entry.Detail is null ? null : Truncate(entry.Detail, AuditEntry.DetailLength));
        await command.ExecuteNonQueryAsync(ct).ConfigureAwait(false);
    }

    private static void Add(DbCommand command, string name, object? value)
    {
        var parameter = command.CreateParameter();
        parameter.ParameterName = name;
        parameter.Value = value ?? DBNull.Value;
        command.Parameters.Add(parameter);
    }

    private static string Truncate(string text, int length) => text.Length <= length ? text : text[..length];
}
