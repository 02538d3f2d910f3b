using FluentValidation.Results;
using Microsoft.AspNetCore.Mvc.ModelBinding;

namespace LowVisionAid.Web.Infrastructure;

internal static class ModelStateExtensions
{
    /// <summary>Copies validation failures into model state under the bound property's prefix (e.g. "Input").</summary>
    public static void AddErrors(this ModelStateDictionary modelState, ValidationResult result, string prefix)
    {
        foreach (var failure in result.Errors)
        {
            var key = string.IsNullOrEmpty(failure.PropertyName) ? prefix : $"{prefix}.{failure.PropertyName}";
            modelState.AddModelError(key, failure.ErrorMessage);
        }
    }
}
