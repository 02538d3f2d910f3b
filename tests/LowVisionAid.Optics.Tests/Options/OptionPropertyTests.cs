using CsCheck;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Tests.Options;

public class OptionPropertyTests
{
    private static readonly Gen<PlanRequest> Requests =
        Gen.Select(Gen.Double[1.5, 40], Gen.Double[20, 100], Gen.Double[0.4, 4], Gen.Int[1, 4], Gen.Int[1, 2])
            .SelectMany(t => Gen.Select(Gen.Double[0, 4], Gen.Double[1, 4], Gen.Bool, Gen.Double[-6, 4]).Select(u => new PlanRequest
            {
                RequiredPower = Power.FromDioptres(t.Item1),
                PreferredDistance = Distance.FromCentimetres(t.Item2),
                TargetPrint = PrintSize.FromM(t.Item3),
                Task = (ReadingTask)t.Item4,
                Constraints = new ClientConstraints
                {
                    UsefulEyes = t.Item5,
                    UsableAccommodation = Power.FromDioptres(u.Item1),
                    AddWorn = Power.FromDioptres(u.Item2),
                    Tremor = u.Item3,
                    DistanceRefraction = Power.FromDioptres(u.Item4),
                },
            }));

    [Fact]
    public void Every_option_meets_the_required_power_within_tolerance_or_says_it_does_not()
    {
        // The property: delivered ≥ required × tolerance exactly when MeetsRequiredPower is true, and the options
        // designed for the requirement (all but moving closer) always meet it.
        Requests.Sample(request =>
        {
            var plan = Planner.Build(request);
            var tolerance = request.Settings.PowerTolerance;
            return plan.Options.All(r =>
                r.Option.MeetsRequiredPower == (r.Option.DeliveredPower.Dioptres >= r.Option.RequiredPower.Dioptres * tolerance)
                && (r.Option.Kind == OptionKind.MovingCloser || r.Option.MeetsRequiredPower));
        });
    }

    [Fact]
    public void Positions_are_one_to_n_and_every_option_gives_a_reason_for_each_rule_used()
    {
        Requests.Sample(request =>
        {
            var plan = Planner.Build(request);
            var rules = Ranking.RulesFor(request);
            return plan.Options.Select(r => r.Position).SequenceEqual(Enumerable.Range(1, plan.Options.Length))
                && plan.Options.All(r => r.Reasons.Select(x => x.Rule).SequenceEqual(rules));
        });
    }

    [Fact]
    public void Fluency_warnings_follow_the_characters_in_view()
    {
        // Methods §4.3: below 4 characters always; below 10 for sustained reading.
        Requests.Sample(request => Planner.Build(request).Options.All(r => r.Option.Fluency == r.Option.CharactersInView switch
        {
            null => FluencyWarning.None,
            < 4 => FluencyWarning.FewerThanFour,
            < 10 when request.Task == ReadingTask.SustainedReading => FluencyWarning.FewerThanTenForSustainedReading,
            _ => FluencyWarning.None,
        }));
    }
}
