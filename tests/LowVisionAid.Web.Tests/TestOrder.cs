using LowVisionAid.TestSupport;

// The classes with the most Slow tests start first, so no long class runs alone at the end (SlowClassesFirst).
[assembly: TestCollectionOrderer(SlowClassesFirst.TypeName, SlowClassesFirst.AssemblyName)]
