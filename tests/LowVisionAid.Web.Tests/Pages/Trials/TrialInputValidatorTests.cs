using LowVisionAid.Web.Pages.Trials;

namespace LowVisionAid.Web.Tests.Pages.Trials;

public class TrialInputValidatorTests
{
    private static readonly TrialInputValidator Validator = new();

    private static TrialInput Valid() => new()
    {
        TrialDate = "2026-05-30",
        DeviceDescription = "12 D hand magnifier",
        Outcome = "Dispensed",
    };

    public static TheoryData<string, string, string> Refused => new()
    {
        // field to spoil, what is typed, the property that must carry the message
        { "TrialDate", "yesterday", "TrialDate" },
        { "DeviceDescription", "", "DeviceDescription" },
        { "KitDeviceId", "HM-12", "KitDeviceId" },
        { "Task", "Gardening", "Task" },
        { "Result", "much better", "Result" },
        { "ResultWordsPerMinute", "-5", "ResultWordsPerMinute" },
        { "ResultWordsPerMinute", "1001", "ResultWordsPerMinute" },
        { "Outcome", "", "Outcome" },
        { "Outcome", "Sold", "Outcome" },
        { "FollowUpDue", "2026-05-01", "FollowUpDue" },
        { "FollowUpDue", "next month", "FollowUpDue" },
    };

    [Theory]
    [MemberData(nameof(Refused))]
    public void Refuses_each_bad_field_with_a_message_on_that_field(string field, string typed, string property)
    {
        var input = Valid();
        typeof(TrialInput).GetProperty(field)!.SetValue(input, typed);

        var failure = Assert.Single(Validator.Validate(input).Errors);

        Assert.Equal(property, failure.PropertyName);
        Assert.False(string.IsNullOrWhiteSpace(failure.ErrorMessage));
    }

    [Theory]
    [InlineData("1M", "")]
    [InlineData("6/12", "70")]
    [InlineData("", "0")]
    public void Accepts_a_print_size_or_an_acuity_as_the_result(string result, string wordsPerMinute)
    {
        var input = Valid();
        input.Result = result;
        input.ResultWordsPerMinute = wordsPerMinute;
        input.FollowUpDue = "2026-06-30";
        Assert.True(Validator.Validate(input).IsValid);
    }
}
