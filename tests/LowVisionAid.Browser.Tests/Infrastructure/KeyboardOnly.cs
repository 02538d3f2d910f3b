namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// Drives a page with the keyboard alone (Tab, Shift+Tab, Enter, Space, arrows and typing) and checks that the
/// element that has focus shows it: the site's 3 px solid outline (4 px on the error summary).
/// </summary>
public sealed class KeyboardOnly(IPage page)
{
    private const string IsFocusedScript = "el => el === document.activeElement";

    private const string FocusIndicatorScript = """
        el => {
            const style = getComputedStyle(el);
            return el === document.activeElement && style.outlineStyle === 'solid' && parseFloat(style.outlineWidth) >= 3;
        }
        """;

    public static Task<bool> IsFocusedAsync(ILocator target)
    {
        ArgumentNullException.ThrowIfNull(target);
        return target.EvaluateAsync<bool>(IsFocusedScript);
    }

    /// <summary>Presses Tab (or Shift+Tab) until <paramref name="target"/> has focus, then checks the focus shows.</summary>
    public async Task TabToAsync(ILocator target, int limit = 80, bool backwards = false)
    {
        ArgumentNullException.ThrowIfNull(target);
        for (var i = 0; i < limit; i++)
        {
            await page.Keyboard.PressAsync(backwards ? "Shift+Tab" : "Tab");
            if (await IsFocusedAsync(target))
            {
                await AssertFocusVisibleAsync(target);
                return;
            }
        }

        Assert.Fail($"{(backwards ? "Shift+Tab" : "Tab")} never reached {target} within {limit} presses.");
    }

    /// <summary>One Tab, which must land on <paramref name="target"/>, with its focus showing.</summary>
    public async Task TabOnceToAsync(ILocator target)
    {
        ArgumentNullException.ThrowIfNull(target);
        await page.Keyboard.PressAsync("Tab");
        Assert.True(await IsFocusedAsync(target), $"Tab did not move to {target}; focus is on {await FocusedAsync()}.");
        await AssertFocusVisibleAsync(target);
    }

    public static async Task AssertFocusVisibleAsync(ILocator target)
    {
        ArgumentNullException.ThrowIfNull(target);
        Assert.True(await target.EvaluateAsync<bool>(FocusIndicatorScript), $"{target} has focus but shows no visible focus outline.");
    }

    /// <summary>
    /// On a page just opened: nothing has focus yet, the first Tab reaches the skip link, and Enter on it moves focus
    /// to the main region, so the next Tab goes into the page's own content.
    /// </summary>
    public async Task SkipToMainAsync()
    {
        Assert.Equal("BODY", await page.EvaluateAsync<string>("() => document.activeElement ? document.activeElement.tagName : ''"));
        var skip = page.GetByRole(AriaRole.Link, new() { Name = "Skip to main content" });
        await TabOnceToAsync(skip);
        await page.Keyboard.PressAsync("Enter");
        Assert.Equal("main", await page.EvaluateAsync<string>("() => document.activeElement.id"));
    }

    /// <summary>Types into the focused field, replacing what it held (Control+A selects it first).</summary>
    public async Task ReplaceAsync(string text)
    {
        await page.Keyboard.PressAsync("Control+A");
        await page.Keyboard.TypeAsync(text);
    }

    /// <summary>A short description of the focused element, for failure messages.</summary>
    public Task<string> FocusedAsync() => page.EvaluateAsync<string>(
        "() => { const el = document.activeElement; return el ? `${el.tagName}#${el.id} ${(el.textContent || '').trim().slice(0, 40)}` : 'nothing'; }");
}
