namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>The visit form (Visits/New?clientId= and Visits/{id}/Edit).</summary>
public sealed class VisitFormPage(IPage page)
{
    private const string DateLabel = "Date seen";
    private const string PractitionerLabel = "Practitioner";
    private const string RightLabel = "Right eye";
    private const string LeftLabel = "Left eye";
    private const string BothLabel = "Both eyes";
    private const string NearThresholdLabel = "Smallest print read";
    private const string NearDistanceLabel = "Test distance";
    private const string WorkingDistanceLabel = "Preferred working distance";
    private const string SaveButton = "Save visit";
    private const string CheckButton = "Check readings";

    public ILocator Date => page.GetByLabel(DateLabel, new() { Exact = true });

    public ILocator Practitioner => page.GetByRole(AriaRole.Textbox, new() { Name = PractitionerLabel, Exact = true });

    public ILocator DistanceRight => page.GetByRole(AriaRole.Textbox, new() { Name = RightLabel, Exact = true });

    public ILocator DistanceLeft => page.GetByRole(AriaRole.Textbox, new() { Name = LeftLabel, Exact = true });

    public ILocator DistanceBoth => page.GetByRole(AriaRole.Textbox, new() { Name = BothLabel, Exact = true });

    public ILocator NearThreshold => page.GetByRole(AriaRole.Textbox, new() { Name = NearThresholdLabel });

    public ILocator NearTestDistance => page.GetByRole(AriaRole.Textbox, new() { Name = NearDistanceLabel });

    public ILocator WorkingDistance => page.GetByRole(AriaRole.Textbox, new() { Name = WorkingDistanceLabel });

    /// <summary>The task list of goal line <paramref name="line"/> (from 1).</summary>
    public ILocator GoalTask(int line) => page.GetByRole(AriaRole.Combobox, new() { Name = $"Goal {line}: task", Exact = true });

    public ILocator GoalTargetPrint(int line) => page.GetByRole(AriaRole.Combobox, new() { Name = $"Goal {line}: target print size", Exact = true })
        .Or(page.GetByRole(AriaRole.Textbox, new() { Name = $"Goal {line}: target print size", Exact = true }));

    public ILocator Save => page.GetByRole(AriaRole.Button, new() { Name = SaveButton, Exact = true });

    public ILocator Check => page.GetByRole(AriaRole.Button, new() { Name = CheckButton, Exact = true });

    public ILocator ErrorSummary => page.Locator(".error-summary");

    /// <summary>The message shown beside a field, found by the field's id (e.g. Input_DistanceRight).</summary>
    public ILocator FieldError(string fieldId) => page.Locator($"#{fieldId}-error");
}
