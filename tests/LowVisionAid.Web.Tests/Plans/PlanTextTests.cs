using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Web.Plans;
using DeviceKind = LowVisionAid.Optics.Kit.DeviceKind;

namespace LowVisionAid.Web.Tests.Plans;

public class PlanTextTests
{
    [Fact]
    public void A_kit_device_kind_reads_the_same_as_the_class_of_option_it_becomes()
    {
        // One label table: the kit page, the plan page, the calculator and the reports use the same words.
        Assert.Equal(PlanText.Kind(OptionKind.SpectacleAdd), PlanText.Device(DeviceKind.SpectacleAdd));
        Assert.Equal(PlanText.Kind(OptionKind.NearTelescope), PlanText.Device(DeviceKind.NearTelescope));
        Assert.Equal(PlanText.Kind(OptionKind.VideoMagnifier), PlanText.Device(DeviceKind.VideoMagnifier));
    }

    [Fact]
    public void Every_class_of_option_task_and_method_has_words_not_an_internal_name()
    {
        Assert.All(Enum.GetValues<OptionKind>(), k => Assert.Contains(" ", PlanText.Kind(k), StringComparison.Ordinal));
        Assert.All(Enum.GetValues<GoalTask>(), t => Assert.DoesNotMatch("[a-z][A-Z]", PlanText.Task(t)));
        Assert.Equal("Medication labels", PlanText.Task(GoalTask.MedicationLabels));
    }

    [Fact]
    public void The_usual_reserves_carry_their_names()
    {
        // Spot 1:1, fluent 2:1, sustained 3:1 (Lovie-Kitchin and Whittaker; common practice).
        Assert.Equal("2:1 (fluent)", PlanText.Reserve(AcuityReserve.FromRatio(2)));
        Assert.Equal("3:1 (sustained)", PlanText.Reserve(AcuityReserve.FromRatio(3)));
    }

    [Fact]
    public void The_calculator_names_methods_and_options_as_the_plan_page_does()
    {
        var view = LowVisionAid.Web.Pages.Calculator.CalculatorText.BasisEstimate(Optics.Requirement.PowerMethod.NearAcuity, 20, System.Globalization.CultureInfo.InvariantCulture);

        Assert.Contains(PlanText.Method(Optics.Requirement.PowerMethod.NearAcuity), view, StringComparison.Ordinal);
    }

    [Fact]
    public void A_saved_plan_words_a_distance_telescope_s_field_and_focusing_as_the_calculator_does()
    {
        // 6/60 to 6/12 at 3 m: a 6× Keplerian set for far asks the eye for +13.53 D (methods §3.5, derived in the optics
        // tests). Its field is at what is viewed and its focusing its own (common practice); the calculator uses the same
        // labels (OptionNotes, one home).
        var plan = Planner.Build(new PlanRequest
        {
            TargetPrint = PrintSize.FromM(1),
            PreferredDistance = Distance.FromMetres(3),
            Task = ReadingTask.DistanceViewing,
            DistanceAcuity = Acuity.FromSnellen(6, 60),
            GoalDistanceAcuity = Acuity.FromSnellen(6, 12),
        });
        var telescope = plan.Options.Select(r => r.Option).OfType<DistanceTelescopeOption>().Single(o => !o.SpectacleMounted);

        var figures = PlanText.Figures(telescope, imperial: false);

        Assert.Equal("+13.53 D", Assert.Single(figures, f => f.Label == "Focusing from its far setting").Value);
        Assert.Single(figures, f => f.Label == "Field at the viewing distance");
        Assert.DoesNotContain(figures, f => f.Label is "Field on the page" or "Letters in view" or "Focusing or add needed");
        Assert.Equal("Not counted (distance)", PlanText.LettersInBrief(telescope));
        Assert.Equal("Not counted (distance)", PlanText.LettersInBrief(plan.Options.Select(r => r.Option).OfType<MovingCloserOption>().Single()));
        var hand = Planner.Build(new PlanRequest
        {
            TargetPrint = PrintSize.FromM(1),
            PreferredDistance = Distance.FromCentimetres(25),
            Task = ReadingTask.SustainedReading,
            RequiredPower = Power.FromDioptres(20),
        }).Options.Select(r => r.Option).OfType<HandMagnifierOption>().Single();
        var near = PlanText.Figures(hand, imperial: false).Select(f => f.Label).ToList();
        Assert.Contains("Field on the page", near);
        Assert.Contains("Focusing or add needed", near);
        Assert.Matches("^[0-9]+$", PlanText.LettersInBrief(hand));
    }
}
