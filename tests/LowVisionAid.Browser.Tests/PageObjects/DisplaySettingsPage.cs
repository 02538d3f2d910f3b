namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>The display settings page: colours and text size, saved by a plain form post.</summary>
public sealed class DisplaySettingsPage(IPage page)
{
    private const string Path = "Display";
    private const string HighContrastLabel = "High contrast: white and yellow text on black";
    private const string StandardColoursLabel = "Standard: dark text on white";
    private const string LargeTextLabel = "Large text";
    private const string StandardTextLabel = "Standard text";
    private const string SaveButton = "Save display settings";
    private const string SavedMessage = "Your display settings are saved";

    public Task GotoAsync() => page.GotoAsync(Path);

    public ILocator HighContrast => page.GetByRole(AriaRole.Radio, new() { Name = HighContrastLabel });

    public ILocator StandardColours => page.GetByRole(AriaRole.Radio, new() { Name = StandardColoursLabel });

    public ILocator LargeText => page.GetByRole(AriaRole.Radio, new() { Name = LargeTextLabel, Exact = true });

    public ILocator StandardText => page.GetByRole(AriaRole.Radio, new() { Name = StandardTextLabel, Exact = true });

    public ILocator Save => page.GetByRole(AriaRole.Button, new() { Name = SaveButton });

    public ILocator Saved => page.GetByRole(AriaRole.Status).Filter(new() { HasText = SavedMessage });

    public async Task ChooseAsync(bool highContrast, bool largeText)
    {
        await (highContrast ? HighContrast : StandardColours).CheckAsync();
        await (largeText ? LargeText : StandardText).CheckAsync();
        await Save.ClickAsync();
    }
}
