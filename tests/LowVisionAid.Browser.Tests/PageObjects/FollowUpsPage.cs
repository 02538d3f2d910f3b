namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>The follow-ups due (FollowUps): every booked follow-up not yet done, earliest first.</summary>
public sealed class FollowUpsPage(IPage page)
{
    public Task GotoAsync() => page.GotoAsync("FollowUps");

    public ILocator Table => page.GetByRole(AriaRole.Table, new() { Name = "Follow-ups not yet done, earliest first" });

    /// <summary>The row whose client link is <paramref name="clientCode"/>.</summary>
    public ILocator Row(string clientCode) =>
        Table.GetByRole(AriaRole.Row).Filter(new() { Has = page.GetByRole(AriaRole.Link, new() { Name = clientCode, Exact = true }) });
}
