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
}
