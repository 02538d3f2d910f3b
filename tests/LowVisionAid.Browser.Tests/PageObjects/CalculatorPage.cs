namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>The quick calculator: measurements in, a starting plan out, nothing saved.</summary>
public sealed class CalculatorPage(IPage page)
{
    private const string Path = "Calculator";
    private const string DistanceAcuityLabel = "Distance acuity, both eyes or the better eye";
    private const string NearAcuityLabel = "Near acuity: smallest print read and its distance";
    private const string TargetPrintLabel = "Print to be read";
    private const string WorkingDistanceLabel = "Working distance the client prefers";
    private const string GoalAcuityLabel = "Acuity wanted for the distance task";
    private const string AgeLabel = "Age in years";
    private const string SubmitButton = "Work out the plan";
    private const string PlanHeading = "Starting plan";
    private const string FlagText = "Flag: the methods disagree.";

    public Task GotoAsync() => page.GotoAsync(Path);

    public ILocator DistanceAcuity => page.GetByRole(AriaRole.Textbox, new() { Name = DistanceAcuityLabel });

    public ILocator NearAcuity => page.GetByRole(AriaRole.Textbox, new() { Name = NearAcuityLabel });

    public ILocator TargetPrint => page.GetByRole(AriaRole.Textbox, new() { Name = TargetPrintLabel, Exact = true });

    public ILocator WorkingDistance => page.GetByRole(AriaRole.Textbox, new() { Name = WorkingDistanceLabel });

    public ILocator GoalAcuity => page.GetByRole(AriaRole.Textbox, new() { Name = GoalAcuityLabel });

    public ILocator Age => page.GetByRole(AriaRole.Textbox, new() { Name = AgeLabel });

    public ILocator Task(string label) => page.GetByRole(AriaRole.Radio, new() { Name = label });

    public ILocator Reserve(string startsWith) => page.GetByRole(AriaRole.Radio, new() { Name = startsWith });

    public ILocator Submit => page.GetByRole(AriaRole.Button, new() { Name = SubmitButton });

    public ILocator Plan => page.GetByRole(AriaRole.Region, new() { Name = PlanHeading });

    public ILocator Flag => Plan.GetByText(FlagText);

    public ILocator ErrorSummary => page.GetByRole(AriaRole.Alert);

    /// <summary>The card of one method's estimate, found by its heading.</summary>
    public ILocator Estimate(string headingStartsWith) =>
        Plan.Locator(".card").Filter(new() { Has = page.GetByRole(AriaRole.Heading, new() { Name = headingStartsWith, Level = 4 }) });

    /// <summary>The headings of the options, in their ranked order.</summary>
    public Task<IReadOnlyList<string>> OptionHeadingsAsync() => Plan.Locator("ol.options h4").AllInnerTextsAsync();

    public async Task FillAsync(string? distanceAcuity = null, string? nearAcuity = null, string? targetPrint = null, string? workingDistance = null)
    {
        if (distanceAcuity is not null)
        {
            await DistanceAcuity.FillAsync(distanceAcuity);
        }

        if (nearAcuity is not null)
        {
            await NearAcuity.FillAsync(nearAcuity);
        }

        if (targetPrint is not null)
        {
            await TargetPrint.FillAsync(targetPrint);
        }

        if (workingDistance is not null)
        {
            await WorkingDistance.FillAsync(workingDistance);
        }
    }
}
