using LowVisionAid.TestSupport;
using LowVisionAid.Web.Tests.Pages.Clients;
using Xunit.Abstractions;
using Xunit.Sdk;

namespace LowVisionAid.Web.Tests.Support;

/// <summary>The order the test collections start in: the most Slow tests first, the rest as given (common practice for packing long jobs first).</summary>
public sealed class SlowClassesFirstTests
{
    private static readonly IAssemblyInfo ThisAssembly = Reflector.Wrap(typeof(SlowClassesFirstTests).Assembly);

    [Fact]
    public void A_class_tagged_slow_counts_each_of_its_tests_and_an_untagged_class_none()
    {
        var counts = SlowClassesFirst.SlowTestsByCollection(typeof(SlowClassesFirstTests).Assembly);

        Assert.Equal(4, counts["Test collection for " + typeof(ClientListAtScaleTests).FullName]);   // Slow on the class, four facts
        Assert.False(counts.ContainsKey("Test collection for " + typeof(SlowClassesFirstTests).FullName));
    }

    [Fact]
    public void The_collection_with_the_most_slow_tests_starts_first_and_the_others_keep_their_order()
    {
        var testAssembly = new TestAssembly(ThisAssembly);
        ITestCollection Collection(Type type) => new TestCollection(testAssembly, null, "Test collection for " + type.FullName);
        var quick = Collection(typeof(SlowClassesFirstTests));
        var alsoQuick = Collection(typeof(ClientListTests));
        var slow = Collection(typeof(ClientListAtScaleTests));

        var ordered = new SlowClassesFirst().OrderTestCollections([quick, alsoQuick, slow]).ToList();

        Assert.Equal([slow, quick, alsoQuick], ordered);
    }
}
