using System.Linq.Expressions;
using System.Reflection;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata;
using Microsoft.EntityFrameworkCore.Storage;

namespace LowVisionAid.Data.Moving;

/// <summary>
/// One table of the clinic model as a move copies and checks it: its entity type and every property, in one fixed
/// order, each read through the model (its value converter applied), as the app itself reads it.
/// </summary>
public sealed class ModelTable
{
    private static readonly MethodInfo RowsMethod = typeof(ModelTable).GetMethod(nameof(Rows), BindingFlags.NonPublic | BindingFlags.Static)!;

    private ModelTable(IEntityType entityType, IReadOnlyList<IProperty> properties)
    {
        EntityType = entityType;
        Name = entityType.GetTableName()!;
        Schema = entityType.GetSchema();
        Properties = properties;
    }

    public IEntityType EntityType { get; }

    /// <summary>The table's name (AspNetUsers, Clients, AuditEntries…).</summary>
    public string Name { get; }

    public string? Schema { get; }

    /// <summary>Every property of the entity type (keys, foreign keys, shadow properties included), in one fixed order.</summary>
    public IReadOnlyList<IProperty> Properties { get; }

    /// <summary>The column that holds <paramref name="property"/> in this table.</summary>
    public string ColumnOf(IProperty property)
    {
        ArgumentNullException.ThrowIfNull(property);
        return property.GetColumnName(StoreObjectIdentifier.Table(Name, Schema))!;
    }

    /// <summary>
    /// Every table of <paramref name="model"/> (each entity type mapped to a table), a parent table before the tables
    /// whose foreign keys point at it, so that rows copied in this order never point at a row not yet copied.
    /// </summary>
    public static IReadOnlyList<ModelTable> InForeignKeyOrder(IModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        var types = model.GetEntityTypes().Where(t => t.GetTableName() is not null).OrderBy(t => t.GetTableName(), StringComparer.Ordinal).ToList();
        if (types.GroupBy(t => (t.GetSchema(), t.GetTableName())).FirstOrDefault(g => g.Count() > 1) is { } shared)
        {
            throw new NotSupportedException($"Table {shared.Key.Item2} holds more than one entity type; a move copies one entity type per table.");
        }

        var ordered = new List<ModelTable>();
        var placed = new HashSet<IEntityType>();
        while (ordered.Count < types.Count)
        {
            // A key that points at its own table (none in this model) would need its rows in order too.
            var next = types.FirstOrDefault(t => !placed.Contains(t) && t.GetForeignKeys().All(k => k.PrincipalEntityType == t || placed.Contains(k.PrincipalEntityType)))
                ?? throw new NotSupportedException("The model's foreign keys form a cycle between tables; no copy order exists.");
            placed.Add(next);
            ordered.Add(new ModelTable(next, [.. next.GetProperties()]));
        }

        return ordered;
    }

    /// <summary>The same table in another provider's model (<paramref name="model"/>), its properties in <paramref name="table"/>'s order.</summary>
    public static ModelTable Like(IModel model, ModelTable table)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(table);
        var type = model.FindEntityType(table.EntityType.Name)
            ?? throw new InvalidOperationException($"The other model has no entity type {table.EntityType.Name}.");
        var properties = table.Properties.Select(p => type.FindProperty(p.Name)
            ?? throw new InvalidOperationException($"The other model has no property {type.DisplayName()}.{p.Name}.")).ToList();
        return properties.Count == type.GetProperties().Count()
            ? new ModelTable(type, properties)
            : throw new InvalidOperationException($"The two models differ in the properties of {type.DisplayName()}.");
    }

    /// <summary>
    /// Every row of the table through <paramref name="db"/>'s model, one value per <see cref="Properties"/> entry, as
    /// the app's own CLR values (a power, a date, an enum), read without tracking.
    /// </summary>
    public IAsyncEnumerable<object?[]> ReadAsync(DbContext db)
    {
        ArgumentNullException.ThrowIfNull(db);
        return (IAsyncEnumerable<object?[]>)RowsMethod.MakeGenericMethod(EntityType.ClrType).Invoke(null, [db, this])!;
    }

    private static IAsyncEnumerable<object?[]> Rows<TEntity>(DbContext db, ModelTable table)
        where TEntity : class
    {
        // row => new object[] { EF.Property<T1>(row, "P1"), … }: one query, each value through the property's converter.
        var row = Expression.Parameter(typeof(TEntity), "row");
        var values = table.Properties.Select(p => (Expression)Expression.Convert(
            Expression.Call(typeof(EF), nameof(EF.Property), [p.ClrType], row, Expression.Constant(p.Name)),
            typeof(object)));
        var select = Expression.Lambda<Func<TEntity, object?[]>>(Expression.NewArrayInit(typeof(object), values), row);
        return db.Set<TEntity>().AsNoTracking().Select(select).AsAsyncEnumerable();
    }
}
