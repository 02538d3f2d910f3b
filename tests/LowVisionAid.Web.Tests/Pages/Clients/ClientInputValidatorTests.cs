using LowVisionAid.Web.Pages.Clients;
using LowVisionAid.Web.Tests.Support;

namespace LowVisionAid.Web.Tests.Pages.Clients;

public class ClientInputValidatorTests
{
    private static readonly ClientInputValidator Validator = new(new FixedClock(new DateTimeOffset(2026, 6, 1, 12, 0, 0, TimeSpan.Zero)));

    public static TheoryData<string, string?, string, string> Refused => new()
    {
        // code, year of birth, the field that must carry the message, part of the message
        { "", null, nameof(ClientInput.Code), "Type the clinic's code" },
        { "   ", null, nameof(ClientInput.Code), "Type the clinic's code" },
        { "-starts-with-dash", null, nameof(ClientInput.Code), "Use letters, digits" },
        { "has<angle>", null, nameof(ClientInput.Code), "Use letters, digits" },
        { new string('A', 41), null, nameof(ClientInput.Code), "40 characters or fewer" },
        { "OK-1", "48", nameof(ClientInput.YearOfBirth), "four digits between 1900 and 2026" },
        { "OK-1", "1899", nameof(ClientInput.YearOfBirth), "four digits between 1900 and 2026" },
        { "OK-1", "2027", nameof(ClientInput.YearOfBirth), "four digits between 1900 and 2026" },
        { "OK-1", "19x8", nameof(ClientInput.YearOfBirth), "four digits between 1900 and 2026" },
        { "OK-1", "-1948", nameof(ClientInput.YearOfBirth), "four digits between 1900 and 2026" },
    };

    [Theory]
    [MemberData(nameof(Refused))]
    public void Refuses_bad_input_with_a_message_that_says_what_to_type(string code, string? year, string field, string message)
    {
        var result = Validator.Validate(new ClientInput { Code = code, YearOfBirth = year });

        var failure = Assert.Single(result.Errors);
        Assert.Equal(field, failure.PropertyName);
        Assert.Contains(message, failure.ErrorMessage, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("HB-0042", null)]
    [InlineData("HB 42/7", "")]
    [InlineData("Ärzte.3", "1900")]
    [InlineData("x", "2026")]
    public void Accepts_a_clinic_code_with_or_without_a_year_of_birth(string code, string? year) =>
        Assert.True(Validator.Validate(new ClientInput { Code = code, YearOfBirth = year }).IsValid);
}
