using LowVisionAid.TestSupport;
using LowVisionAid.Web.Tests.Pages.Clients;
using Xunit.Abstractions;
using Xunit.Sdk;

namespace LowVisionAid.Web.Tests.Support;

/// <summary>The order the test collections start in: the most Slow tests first, the rest as given (common practice for packing long jobs first).</summary>
public sealed class SlowClassesFirstTests
{
    private static readonly ITestAssembly ThisAssembly = new TestAssembly(Reflector.Wrap(typeof(SlowClassesFirstTests).Assembly));

    // The collection xunit itself gives a class without [Collection] (its default: one collection per class).
    private static ITestCollection XunitCollectionOf(Type type) =>
        new CollectionPerClassTestCollectionFactory(ThisAssembly, new NullMessageSink()).Get(Reflector.Wrap(type));

    [Fact]
    public void A_class_tagged_slow_counts_each_of_its_tests_under_the_collection_xunit_gives_it_and_an_untagged_class_none()
    {
        var counts = SlowClassesFirst.SlowTestsByCollection(typeof(SlowClassesFirstTests).Assembly);

        Assert.Equal(XunitCollectionOf(typeof(ClientListAtScaleTests)).DisplayName, SlowClassesFirst.CollectionOf(typeof(ClientListAtScaleTests)));
        Assert.Equal(4, counts[XunitCollectionOf(typeof(ClientListAtScaleTests)).DisplayName]);   // Slow on the class, four facts
        Assert.False(counts.ContainsKey(XunitCollectionOf(typeof(SlowClassesFirstTests)).DisplayName));
    }

    [Fact]
    public void The_collection_with_the_most_slow_tests_starts_first_and_the_others_keep_their_order()
    {
        var quick = XunitCollectionOf(typeof(SlowClassesFirstTests));
        var alsoQuick = XunitCollectionOf(typeof(ClientListTests));
        var slow = XunitCollectionOf(typeof(ClientListAtScaleTests));

        var ordered = new SlowClassesFirst().OrderTestCollections([quick, alsoQuick, slow]).ToList();

        Assert.Equal([slow, quick, alsoQuick], ordered);
    }
}
