using FluentValidation;
using LowVisionAid.Data;

namespace LowVisionAid.Web.Infrastructure;

internal static class ParsedFieldRules
{
    /// <summary>An optional measurement: empty is fine; anything typed must be read by <paramref name="parse"/>, whose message is shown.</summary>
    public static IRuleBuilderOptionsConditions<T, string?> Reads<T, TValue>(this IRuleBuilder<T, string?> rule, Func<string, Optics.Text.ParseResult<TValue>> parse) =>
        rule.Custom((text, context) =>
        {
            if (string.IsNullOrWhiteSpace(text))
            {
                return;
            }

            if (text.Length > FieldLimits.Measurement)
            {
                context.AddFailure($"Keep this to {FieldLimits.Measurement} characters or fewer.");
                return;
            }

            var result = parse(text);
            if (!result.Success)
            {
                context.AddFailure(result.Error);
            }
        });
}
