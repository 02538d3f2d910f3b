using System.Text.Json;
using LowVisionAid.Data.Entities;

namespace LowVisionAid.Web.Plans;

/// <summary>
/// Opens a saved plan's outputs whatever schema they were written in. Schema 2 (<see cref="TypedPlan"/>) is read as
/// it is. Schema 1, written by earlier releases, held the outputs as display text (every figure already formatted):
/// its figures are never parsed back; the plan is rebuilt from its stored inputs (plain numbers) with the planner,
/// which gives the same figures when the stored method version is the current one, and says so on the page when it
/// is not.
/// </summary>
public static class LegacyPlanReader
{
    /// <summary>The typed outputs of a saved plan.</summary>
    /// <exception cref="InvalidOperationException">The plan's stored outputs or inputs cannot be read.</exception>
    public static TypedPlan Read(Plan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        return Read(plan.OutputsJson, plan.InputsJson, plan.MethodVersion);
    }

    public static TypedPlan Read(string outputsJson, string inputsJson, string storedMethodVersion)
    {
        if (SchemaOf(outputsJson) >= TypedPlan.CurrentSchema)
        {
            return PlanJson.Read<TypedPlan>(outputsJson);
        }

        var rebuilt = PlanBuilder.Build(PlanJson.Read<PlanInputs>(inputsJson));
        return string.Equals(rebuilt.MethodVersion, storedMethodVersion, StringComparison.Ordinal)
            ? rebuilt
            : rebuilt with { RebuiltFromMethodVersion = storedMethodVersion };
    }

    /// <summary>The schema version of stored outputs: 1 for the display-text form, which carried none.</summary>
    public static int SchemaOf(string outputsJson)
    {
        try
        {
            using var document = JsonDocument.Parse(string.IsNullOrWhiteSpace(outputsJson) ? "{}" : outputsJson);
            return document.RootElement.ValueKind == JsonValueKind.Object
                && document.RootElement.TryGetProperty(nameof(TypedPlan.SchemaVersion), out var version)
                && version.TryGetInt32(out var number)
                ? number
                : 1;
        }
        catch (JsonException e)
        {
            throw new InvalidOperationException("A saved plan could not be read.", e);
        }
    }
}
