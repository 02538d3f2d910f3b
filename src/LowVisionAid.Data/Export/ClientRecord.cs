using System.Data.Common;
using System.Globalization;
using LowVisionAid.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata;
using Microsoft.EntityFrameworkCore.Storage;

namespace LowVisionAid.Data.Export;

/// <summary>One stored row: its table, primary key and every column as stored (text, number or null).</summary>
public sealed record RecordRow(string Table, long Id, IReadOnlyList<KeyValuePair<string, object?>> Fields, IReadOnlyList<RecordRow> Children);

/// <summary>
/// Everything the database holds about one client: the client row and, recursively, every row that refers to it
/// (visits, their goals, reading speeds and plans, the plans' trials, and whatever tables are added later). The walk
/// follows the model's foreign keys, so a new table that refers to a client or a visit is exported and erased too.
/// </summary>
public static class ClientRecord
{
    /// <summary>Reads the whole record of client <paramref name="clientId"/>, or null when there is no such client.</summary>
    public static async Task<RecordRow?> ReadAsync(ClinicDbContext db, int clientId, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(db);
        var clientType = db.Model.FindEntityType(typeof(Client))!;
        await db.Database.OpenConnectionAsync(ct).ConfigureAwait(false);
        try
        {
            var connection = db.Database.GetDbConnection();
            var transaction = db.Database.CurrentTransaction?.GetDbTransaction();
            var rows = await ReadRowsAsync(connection, transaction, clientType, KeyColumn(clientType), clientId, ct).ConfigureAwait(false);
            return rows.Count == 0 ? null : rows[0];
        }
        finally
        {
            await db.Database.CloseConnectionAsync().ConfigureAwait(false);
        }
    }

    /// <summary>Every row of the record, children before their parent (the order to delete in).</summary>
    public static IEnumerable<RecordRow> ChildrenFirst(RecordRow root)
    {
        ArgumentNullException.ThrowIfNull(root);
        foreach (var child in root.Children)
        {
            foreach (var row in ChildrenFirst(child))
            {
                yield return row;
            }
        }

        yield return root;
    }

    internal static string KeyColumn(IEntityType type) =>
        type.FindPrimaryKey()!.Properties[0].GetColumnName(StoreObjectIdentifier.Table(type.GetTableName()!, type.GetSchema()))!;

    /// <summary>
    /// A value as the export writes it, the same from either provider: SQLite hands back what it stores (integers as
    /// long, times and keys as EF Core's text forms); PostgreSQL's typed values are put in those forms.
    /// </summary>
    public static object AsStored(object value) => value switch
    {
        int or short or byte => Convert.ToInt64(value, CultureInfo.InvariantCulture),
        bool b => b ? 1L : 0L,
        float f => (double)f,
        DateTime t => t.ToString("yyyy-MM-dd HH:mm:ss.FFFFFFF", CultureInfo.InvariantCulture),
        DateTimeOffset t => t.ToString("yyyy-MM-dd HH:mm:ss.FFFFFFFzzz", CultureInfo.InvariantCulture),
        DateOnly d => d.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture),
        Guid g => g.ToString().ToUpperInvariant(),
        _ => value,
    };

    private static async Task<List<RecordRow>> ReadRowsAsync(
        DbConnection connection, DbTransaction? transaction, IEntityType type, string whereColumn, long value, CancellationToken ct)
    {
        var table = type.GetTableName()!;
        var rows = new List<(long Id, List<KeyValuePair<string, object?>> Fields)>();
        var keyColumn = KeyColumn(type);
        await using (var command = connection.CreateCommand())
        {
            command.Transaction = transaction;
            command.CommandText = $"SELECT * FROM \"{table}\" WHERE \"{whereColumn}\" = @value ORDER BY \"{keyColumn}\"";
            var parameter = command.CreateParameter();
            parameter.ParameterName = "@value";   // named as both SQLite and PostgreSQL read it
            parameter.Value = value;
            command.Parameters.Add(parameter);
            await using var reader = await command.ExecuteReaderAsync(ct).ConfigureAwait(false);
            while (await reader.ReadAsync(ct).ConfigureAwait(false))
            {
                var fields = new List<KeyValuePair<string, object?>>(reader.FieldCount);
                long id = 0;
                for (var i = 0; i < reader.FieldCount; i++)
                {
                    var cell = reader.IsDBNull(i) ? null : AsStored(reader.GetValue(i));
                    fields.Add(new(reader.GetName(i), cell));
                    if (string.Equals(reader.GetName(i), keyColumn, StringComparison.Ordinal))
                    {
                        id = Convert.ToInt64(cell, CultureInfo.InvariantCulture);
                    }
                }

                rows.Add((id, fields));
            }
        }

        var result = new List<RecordRow>(rows.Count);
        foreach (var (id, fields) in rows)
        {
            var children = new List<RecordRow>();
            foreach (var foreignKey in type.GetReferencingForeignKeys()
                         .Where(fk => fk.Properties.Count == 1 && !fk.DeclaringEntityType.IsOwned() && fk.DeclaringEntityType.GetTableName() is not null)
                         .OrderBy(fk => fk.DeclaringEntityType.GetTableName(), StringComparer.Ordinal))
            {
                var dependent = foreignKey.DeclaringEntityType;
                var column = foreignKey.Properties[0].GetColumnName(StoreObjectIdentifier.Table(dependent.GetTableName()!, dependent.GetSchema()))!;
                children.AddRange(await ReadRowsAsync(connection, transaction, dependent, column, id, ct).ConfigureAwait(false));
            }

            result.Add(new RecordRow(table, id, fields, children));
        }

        return result;
    }
}
