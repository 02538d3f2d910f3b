using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Encodings.Web;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using DeviceKind = LowVisionAid.Optics.Kit.DeviceKind;

namespace LowVisionAid.Web.Tests.Pages.Kit;

public class KitPagesTests
{
    [Fact]
    public async Task A_device_is_added_with_its_optics_read_into_value_types()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.SubmitAsync("/Kit/New", new Dictionary<string, string>
        {
            ["Input.Code"] = "SM-T1",
            ["Input.Name"] = "Test stand magnifier",
            ["Input.Kind"] = "StandMagnifier",
            ["Input.Power"] = "+20",
            ["Input.Aperture"] = "50 mm",
            ["Input.StandHeight"] = "3.3 cm",
            ["Input.Illuminated"] = "true",
        });

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var device = await app.WithDbAsync(db => db.KitDevices.SingleAsync());
        Assert.Equal(DeviceKind.StandMagnifier, device.Kind);
        Assert.Equal(20.0, device.Power!.Value.Dioptres, 9);
        Assert.Equal(0.05, device.Aperture!.Value.Metres, 9);
        Assert.Equal(0.033, device.StandHeight!.Value.Metres, 9);
        Assert.True(device.Illuminated);
    }

    [Fact]
    public async Task A_device_missing_what_its_kind_needs_gets_the_core_message_beside_the_field()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.SubmitAsync("/Kit/New", new Dictionary<string, string>
        {
            ["Input.Code"] = "HM-T2",
            ["Input.Name"] = "Hand magnifier without an aperture",
            ["Input.Kind"] = "HandMagnifier",
            ["Input.Power"] = "+12",
        });

        var html = await response.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains("<a href=\"#Input_Aperture\">", html, StringComparison.Ordinal);
        Assert.Contains(HtmlEncoder.Default.Encode("Enter the clear lens aperture in millimetres, e.g. 50."), html, StringComparison.Ordinal);
        Assert.Equal(0, await app.WithDbAsync(db => db.KitDevices.CountAsync()));
    }

    [Fact]
    public async Task The_kit_exports_to_csv_and_a_good_file_imports_back_adding_and_updating()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        await app.KitDeviceAsync("HM-T3", "Before import", dioptres: 10);

        var exported = await browser.GetStringAsync(new Uri("/Kit?handler=Export", UriKind.Relative));
        Assert.StartsWith("id,name,kind,power_d", exported, StringComparison.Ordinal);
        Assert.Contains("HM-T3,Before import", exported, StringComparison.Ordinal);

        var csv = exported.Replace("Before import", "After import", StringComparison.Ordinal)
            + "SP-T4,Test reading spectacles,spectacle-add,8,,,,,,,,,,,false,\n";
        var response = await ImportAsync(browser, csv);

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var names = await app.WithDbAsync(db => db.KitDevices.OrderBy(k => k.Code).Select(k => k.Name).ToListAsync());
        Assert.Equal(["After import", "Test reading spectacles"], names);
    }

    [Fact]
    public async Task A_file_with_a_bad_row_imports_nothing_and_lists_the_row()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var csv = "id,name,kind,power_d\nHM-T5,Good row,hand,12\nHM-T6,Bad row,hand,twelve\n";

        var response = await ImportAsync(browser, csv);

        var html = await response.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains("Nothing was imported", html, StringComparison.Ordinal);
        Assert.Contains("<th scope=\"row\">3</th>", html, StringComparison.Ordinal);
        Assert.Equal(0, await app.WithDbAsync(db => db.KitDevices.CountAsync()));
    }

    private static async Task<HttpResponseMessage> ImportAsync(HttpClient browser, string csv)
    {
        var page = await browser.GetStringAsync(new Uri("/Kit", UriKind.Relative));
        using var form = new MultipartFormDataContent();
        foreach (var (name, value) in Forms.HiddenFields(page))
        {
            form.Add(new StringContent(value), name);
        }

        var file = new ByteArrayContent(Encoding.UTF8.GetBytes(csv));
        file.Headers.ContentType = new MediaTypeHeaderValue("text/csv");
        form.Add(file, "file", "kit.csv");
        return await browser.PostAsync(new Uri("/Kit?handler=Import", UriKind.Relative), form);
    }
}
