using System.Collections.Immutable;
using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Benchmarks;

/// <summary>Time and allocation of one full plan: every class, the ranking and a ten-device kit (docs/performance.md).</summary>
[MemoryDiagnoser]
[Config(typeof(ShortInProcess))]
public class PlanBenchmarks
{
    /// <summary>
    /// A short job run in process: 1 launch, 3 warm-up and 10 measured iterations. In process, because building the
    /// usual separate benchmark project can exceed BenchmarkDotNet's two-minute build timeout on a busy 2-core machine.
    /// </summary>
    private sealed class ShortInProcess : ManualConfig
    {
        public ShortInProcess() =>
            AddJob(Job.Default.WithToolchain(InProcessEmitToolchain.Instance).WithLaunchCount(1).WithWarmupCount(3).WithIterationCount(10));
    }

    // An invented clinic's ten devices (no real products).
    private static readonly ImmutableArray<KitDevice> Kit =
    [
        new() { Id = "SA-10", Name = "Reading spectacles +10 D", Kind = DeviceKind.SpectacleAdd, Power = Power.FromDioptres(10) },
        new() { Id = "SA-6", Name = "Reading spectacles +6 D", Kind = DeviceKind.SpectacleAdd, Power = Power.FromDioptres(6) },
        new() { Id = "H-12", Name = "Hand lens 12 D", Kind = DeviceKind.HandMagnifier, Power = Power.FromDioptres(12), Aperture = Distance.FromMillimetres(50) },
        new() { Id = "H-8", Name = "Hand lens 3× trade", Kind = DeviceKind.HandMagnifier, Label = new KitLabel(3, LabelConvention.Trade), Aperture = Distance.FromMillimetres(70) },
        new() { Id = "S-20", Name = "Stand 20 D", Kind = DeviceKind.StandMagnifier, ImageBelowLens = Distance.FromCentimetres(10), EnlargementRatio = 3, Aperture = Distance.FromMillimetres(45) },
        new() { Id = "S-12", Name = "Stand 12 D", Kind = DeviceKind.StandMagnifier, Power = Power.FromDioptres(12), StandHeight = Distance.FromCentimetres(6.25), Aperture = Distance.FromMillimetres(50), Illuminated = true },
        new() { Id = "T-4", Name = "Near telescope 4×", Kind = DeviceKind.NearTelescope, Magnification = 4, ReadingCap = Power.FromDioptres(2.5) },
        new() { Id = "T-3", Name = "Near telescope 3×", Kind = DeviceKind.NearTelescope, Magnification = 3, ReadingCap = Power.FromDioptres(4) },
        new() { Id = "V-1", Name = "Video magnifier", Kind = DeviceKind.VideoMagnifier, Magnification = 40 },
        new() { Id = "D-4", Name = "Distance telescope 4×", Kind = DeviceKind.DistanceTelescope, Magnification = 4 },
    ];

    private readonly PlanRequest _near = new()
    {
        RequiredPower = Power.FromDioptres(10),
        TargetPrint = PrintSize.FromM(1),
        PreferredDistance = Distance.FromCentimetres(40),
        Task = ReadingTask.SustainedReading,
        Constraints = new ClientConstraints { UsableAccommodation = Power.Zero, AddWorn = Power.FromDioptres(2.5), LogContrastSensitivity = 0.9, Tremor = true },
        Kit = Kit,
    };

    private readonly PlanRequest _distance = new()
    {
        TargetPrint = PrintSize.FromM(1),
        PreferredDistance = Distance.FromMetres(3),
        Task = ReadingTask.DistanceViewing,
        DistanceAcuity = Acuity.FromSnellen(6, 60),
        GoalDistanceAcuity = Acuity.FromSnellen(6, 12),
        Kit = Kit,
    };

    private readonly PlanRequest _estimated = new()
    {
        TargetPrint = PrintSize.FromM(1),
        PreferredDistance = Distance.FromCentimetres(40),
        Task = ReadingTask.SustainedReading,
        DistanceAcuity = Acuity.FromSnellen(6, 60),
        Estimates = new EstimateInputs { NearThresholdPrint = PrintSize.FromM(4), NearTestDistance = Distance.FromCentimetres(40) },
        Constraints = new ClientConstraints { AgeYears = 74, AddWorn = Power.FromDioptres(2.5), LogContrastSensitivity = 0.9, Tremor = true },
        Kit = Kit,
    };

    /// <summary>A near plan: seven classes, ranking, ten-device kit matching, cautions.</summary>
    [Benchmark(Baseline = true)]
    public PlanResult NearPlanWithTenDeviceKit() => Planner.Build(_near);

    /// <summary>The same near plan with its required power taken from three estimates compared side by side.</summary>
    [Benchmark]
    public PlanResult NearPlanFromEstimates() => Planner.Build(_estimated);

    /// <summary>A distance plan: moving closer and the distance telescope, ranking, the same kit.</summary>
    [Benchmark]
    public PlanResult DistancePlanWithTenDeviceKit() => Planner.Build(_distance);
}
