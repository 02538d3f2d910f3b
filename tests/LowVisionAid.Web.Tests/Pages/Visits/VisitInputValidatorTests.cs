using LowVisionAid.Web.Pages.Visits;
using LowVisionAid.Web.Tests.Support;

namespace LowVisionAid.Web.Tests.Pages.Visits;

public class VisitInputValidatorTests
{
    private static readonly VisitInputValidator Validator = new(new Web.Infrastructure.ClinicCalendar(new FixedClock(new DateTimeOffset(2026, 6, 1, 12, 0, 0, TimeSpan.Zero))));

    private static VisitInput Valid() => new VisitInput
    {
        VisitDate = "2026-05-30",
        DistanceBoth = "6/60",
        NearThreshold = "4M",
        NearTestDistance = "40 cm",
        WorkingDistance = "25 cm",
        Goals = [new GoalInput { Task = "Newspaper", TargetPrint = "1M" }],
    }.WithBlankRows();

    public static TheoryData<string, string, string> Refused => new()
    {
        // field to spoil, what is typed, the property that must carry the message
        { "VisitDate", "30/05/2026", "VisitDate" },
        { "VisitDate", "2026-06-10", "VisitDate" },
        { "DistanceBoth", "6/0", "DistanceBoth" },
        { "DistanceBoth", "CF at", "DistanceBoth" },
        // Sane working distances for reading (common practice; issue 10): 2 mm and 25 m are refused, with what to type.
        { "WorkingDistance", "2 mm", "WorkingDistance" },
        { "WorkingDistance", "25 m", "WorkingDistance" },
        { "NearThreshold", "", "NearThreshold" },
        { "NearTestDistance", "", "NearTestDistance" },
        { "NearTestDistance", "40", "NearTestDistance" },
        { "WorkingDistance", "-25 cm", "WorkingDistance" },
        { "AddWorn", "plus two", "AddWorn" },
        { "Accommodation", "100", "Accommodation" },
        { "Accommodation", "31", "Accommodation" },
        { "Accommodation", "-2", "Accommodation" },
        { "AddWorn", "-1.00", "AddWorn" },
        { "ContrastSensitivity", "3.1", "ContrastSensitivity" },
        { "Goal.TargetPrint", "", "Goals[0].TargetPrint" },
        { "Goal.TargetPrint", "big", "Goals[0].TargetPrint" },
        { "Goal.Task", "Knitting", "Goals[0].Task" },
        { "Speed.WordsPerMinute", "fast", "ReadingSpeeds[0].WordsPerMinute" },
        { "Speed.WordsPerMinute", "5000", "ReadingSpeeds[0].WordsPerMinute" },
    };

    [Theory]
    [MemberData(nameof(Refused))]
    public void Refuses_each_bad_field_with_a_message_on_that_field(string field, string typed, string property)
    {
        var input = Valid();
        switch (field)
        {
            case "VisitDate": input.VisitDate = typed; break;
            case "DistanceBoth": input.DistanceBoth = typed; break;
            case "NearThreshold": input.NearThreshold = typed; break;
            case "NearTestDistance": input.NearTestDistance = typed; break;
            case "WorkingDistance": input.WorkingDistance = typed; break;
            case "AddWorn": input.AddWorn = typed; break;
            case "Accommodation": input.Accommodation = typed; break;
            case "ContrastSensitivity": input.ContrastSensitivity = typed; break;
            case "Goal.TargetPrint": input.Goals[0].TargetPrint = typed; break;
            case "Goal.Task": input.Goals[0].Task = typed; break;
            case "Speed.WordsPerMinute": input.ReadingSpeeds[0] = new ReadingSpeedInput { PrintSize = "2M", WordsPerMinute = typed }; break;
            default: throw new ArgumentOutOfRangeException(nameof(field), field, "Unknown field in the table.");
        }

        var result = Validator.Validate(input);

        var failure = Assert.Single(result.Errors);
        Assert.Equal(property, failure.PropertyName);
        Assert.False(string.IsNullOrWhiteSpace(failure.ErrorMessage));
    }

    [Fact]
    public void Accepts_a_complete_visit_and_empty_optional_lines() => Assert.True(Validator.Validate(Valid()).IsValid);

    [Fact]
    public void A_distance_task_takes_an_acuity_as_its_target_and_refuses_a_print_size()
    {
        var input = Valid();
        input.Goals[1] = new GoalInput { Task = "Television", TargetPrint = "6/12" };
        Assert.True(Validator.Validate(input).IsValid);

        input.Goals[1].TargetPrint = "1M";
        Assert.Equal("Goals[1].TargetPrint", Assert.Single(Validator.Validate(input).Errors).PropertyName);
    }
}
