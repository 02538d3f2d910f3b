using System.Net;
using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Demo;
using LowVisionAid.Web.Pages.Settings;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Tests.Pages.Settings;

public class SettingsPagesTests
{
    [Fact]
    public async Task An_empty_database_opens_on_the_demo_clinic_marked_as_demo()
    {
        using var app = new ClinicApp(loadDemo: true);
        using var browser = app.Browser();

        var clients = await browser.GetStringAsync(new Uri("/Clients", UriKind.Relative));

        Assert.Contains("DEMO-01", clients, StringComparison.Ordinal);
        Assert.Contains("(demo)", clients, StringComparison.Ordinal);
        var (settings, allDemo) = await app.WithDbAsync(async db => (await db.Settings.SingleAsync(), await db.Clients.AllAsync(c => c.IsDemo)));
        Assert.Equal(DemoClinic.ClinicName, settings.ClinicName);
        Assert.True(settings.HasDemoData);
        Assert.True(allDemo);
    }

    [Fact]
    public async Task Removing_the_demo_clinic_needs_confirmation_and_keeps_the_clinics_own_records()
    {
        using var app = new ClinicApp(loadDemo: true);
        using var browser = app.Browser();
        var ownClient = await app.ClientAsync("OWN-1");

        var unconfirmed = await browser.SubmitAsync("/Settings", new Dictionary<string, string> { ["ConfirmRemoval"] = "false" }, "/Settings?handler=RemoveDemo");
        Assert.Equal(HttpStatusCode.OK, unconfirmed.StatusCode);
        Assert.Contains(IndexModel.ConfirmDemoRemoval, await unconfirmed.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        Assert.True(await app.WithDbAsync(db => db.Clients.AnyAsync(c => c.IsDemo)));

        var confirmed = await browser.SubmitAsync("/Settings", new Dictionary<string, string> { ["ConfirmRemoval"] = "true" }, "/Settings?handler=RemoveDemo");

        Assert.Equal(HttpStatusCode.Redirect, confirmed.StatusCode);
        var (demoLeft, kitLeft, own, settings) = await app.WithDbAsync(async db => (
            await db.Clients.CountAsync(c => c.IsDemo), await db.KitDevices.CountAsync(k => k.IsDemo),
            await db.Clients.AnyAsync(c => c.Id == ownClient), await db.Settings.SingleAsync()));
        Assert.Equal(0, demoLeft);
        Assert.Equal(0, kitLeft);
        Assert.True(own);
        Assert.False(settings.HasDemoData);
        Assert.Equal(0, await app.WithDbAsync(db => db.Visits.CountAsync()));
    }

    [Fact]
    public async Task Saved_settings_are_read_back_into_their_stored_units()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.SubmitAsync("/Settings", new Dictionary<string, string>
        {
            ["Input.ClinicName"] = "Test clinic",
            ["Input.ClinicContact"] = "",
            ["Input.Units"] = "Imperial",
            ["Input.SnellenIn"] = "Feet",
            ["Input.SpotReserve"] = "1.5:1",
            ["Input.FluentReserve"] = "2",
            ["Input.SustainedReserve"] = "3 : 1",
            ["Input.CharacterPitch"] = "1.2",
            ["Input.HandoutPrintSize"] = "2.5M",
        });

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var s = await app.WithDbAsync(db => db.Settings.SingleAsync());
        Assert.Equal(UnitSystem.Imperial, s.Units);
        Assert.Equal(SnellenUnit.Feet, s.SnellenIn);
        Assert.Equal(1.5, s.SpotReserve.Ratio, 9);
        Assert.Equal(3.0, s.SustainedReserve.Ratio, 9);
        Assert.Equal(2.5, s.HandoutPrintSize.M, 9);
    }

    [Fact]
    public async Task Bad_settings_are_refused_field_by_field_and_nothing_changes()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.SubmitAsync("/Settings", new Dictionary<string, string>
        {
            ["Input.ClinicName"] = "",
            ["Input.SpotReserve"] = "0.5:1",
            ["Input.FluentReserve"] = "two",
            ["Input.SustainedReserve"] = "11",
            ["Input.CharacterPitch"] = "9",
            ["Input.HandoutPrintSize"] = "0.5M",
        });

        var html = await response.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        foreach (var field in new[] { "ClinicName", "SpotReserve", "FluentReserve", "SustainedReserve", "CharacterPitch", "HandoutPrintSize" })
        {
            Assert.Contains($"<a href=\"#Input_{field}\">", html, StringComparison.Ordinal);
        }

        Assert.Equal("My clinic", await app.WithDbAsync(db => db.Settings.Select(s => s.ClinicName).SingleAsync()));
    }
}
