namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>The client form: Clients/New to add a client, Clients/{id}/Edit to change one.</summary>
public sealed class ClientFormPage(IPage page)
{
    private const string CodeLabel = "Client code";
    private const string NameLabel = "Name (optional)";
    private const string YearOfBirthLabel = "Year of birth (optional)";
    private const string NotesLabel = "Notes (optional)";
    private const string SaveButton = "Save client";

    public Task GotoNewAsync() => page.GotoAsync("Clients/New");

    public ILocator Code => page.GetByRole(AriaRole.Textbox, new() { Name = CodeLabel });

    public ILocator Name => page.GetByRole(AriaRole.Textbox, new() { Name = NameLabel, Exact = true });

    public ILocator YearOfBirth => page.GetByRole(AriaRole.Textbox, new() { Name = YearOfBirthLabel });

    public ILocator Notes => page.GetByRole(AriaRole.Textbox, new() { Name = NotesLabel });

    public ILocator Save => page.GetByRole(AriaRole.Button, new() { Name = SaveButton });

    public ILocator ErrorSummary => page.Locator(".error-summary");
}
