using System.Reflection;
using Xunit.Abstractions;
using Xunit.Sdk;

namespace LowVisionAid.TestSupport;

/// <summary>
/// Starts the test collections that hold the most <c>Slow</c> tests first, the others after in their usual order.
/// xunit runs two collections at a time on two cores; a long class started last (a fuzz run of 10,000 posts, a class
/// fixture that writes 100,000 clients) ran alone at the end with one core idle. Started first, the short classes
/// fill the other core beside it. Which tests run, and what they check, does not change.
/// </summary>
/// <remarks>Used by an assembly through <c>[assembly: TestCollectionOrderer(SlowClassesFirst.TypeName, SlowClassesFirst.AssemblyName)]</c>.</remarks>
public sealed class SlowClassesFirst : ITestCollectionOrderer
{
    public const string TypeName = "LowVisionAid.TestSupport.SlowClassesFirst";
    public const string AssemblyName = "LowVisionAid.TestSupport";
    public const string SlowCategory = "Slow";

    private const string DefaultCollectionPrefix = "Test collection for ";

    public IEnumerable<ITestCollection> OrderTestCollections(IEnumerable<ITestCollection> testCollections)
    {
        ArgumentNullException.ThrowIfNull(testCollections);
        var collections = testCollections.ToList();
        if (collections.Count == 0)
        {
            return collections;
        }

        var slowByCollection = SlowTestsByCollection(((IReflectionAssemblyInfo)collections[0].TestAssembly.Assembly).Assembly);
        return collections.OrderByDescending(c => slowByCollection.GetValueOrDefault(c.DisplayName));   // a stable sort: ties keep their order
    }

    /// <summary>The number of <c>Slow</c> test methods in each collection of the assembly, by the collection's display name.</summary>
    public static IReadOnlyDictionary<string, int> SlowTestsByCollection(Assembly assembly)
    {
        ArgumentNullException.ThrowIfNull(assembly);
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var type in assembly.GetTypes().Where(t => t is { IsClass: true, IsAbstract: false }))
        {
            var classIsSlow = IsSlow(type);
            var slowTests = type.GetMethods(BindingFlags.Public | BindingFlags.Instance)
                .Count(m => m.IsDefined(typeof(FactAttribute), inherit: true) && (classIsSlow || IsSlow(m)));
            if (slowTests > 0)
            {
                var name = CollectionOf(type);
                counts[name] = counts.GetValueOrDefault(name) + slowTests;
            }
        }

        return counts;
    }

    private static bool IsSlow(MemberInfo member) =>
        member.GetCustomAttributesData().Any(a => a.AttributeType == typeof(TraitAttribute)
            && a.ConstructorArguments is [{ Value: "Category" }, { Value: SlowCategory }]);

    /// <summary>The display name of the collection a test class runs in: its <c>[Collection("name")]</c>, else xunit's one-class collection.</summary>
    public static string CollectionOf(Type type)
    {
        ArgumentNullException.ThrowIfNull(type);
        return type.GetCustomAttributesData().FirstOrDefault(a => a.AttributeType == typeof(CollectionAttribute)) is { } named
            ? named.ConstructorArguments[0].Value as string ?? ""
            : DefaultCollectionPrefix + type.FullName;
    }
}
