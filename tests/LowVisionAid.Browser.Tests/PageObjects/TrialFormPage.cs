namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>The trial form (Trials/New?planId=).</summary>
public sealed class TrialFormPage(IPage page)
{
    private const string DateLabel = "Date of the trial";
    private const string KitLabel = "From the clinic's kit";
    private const string DeviceLabel = "Or type the device";
    private const string TaskLabel = "For the task";
    private const string ResultLabel = "Print size or acuity reached";
    private const string CommentLabel = "The client's comment";
    private const string OutcomeLabel = "Outcome";
    private const string FollowUpLabel = "Follow-up date (optional)";
    private const string SaveButton = "Save trial";

    public ILocator Heading => page.GetByRole(AriaRole.Heading, new() { Level = 1 });

    public ILocator Date => page.GetByLabel(DateLabel, new() { Exact = true });

    public ILocator Kit => page.GetByRole(AriaRole.Combobox, new() { Name = KitLabel });

    public ILocator Device => page.GetByRole(AriaRole.Textbox, new() { Name = DeviceLabel });

    public ILocator Task => page.GetByRole(AriaRole.Combobox, new() { Name = TaskLabel });

    public ILocator Result => page.GetByRole(AriaRole.Textbox, new() { Name = ResultLabel });

    public ILocator Comment => page.GetByRole(AriaRole.Textbox, new() { Name = CommentLabel });

    public ILocator Outcome => page.GetByRole(AriaRole.Combobox, new() { Name = OutcomeLabel, Exact = true });

    public ILocator FollowUp => page.GetByLabel(FollowUpLabel, new() { Exact = true });

    public ILocator Save => page.GetByRole(AriaRole.Button, new() { Name = SaveButton });
}
