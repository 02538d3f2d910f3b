using System.Diagnostics;
using System.Globalization;
using System.Text.Json;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Quantities;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Playwright;

internal static class HandoutBenchmark
{
    public static async Task Main(string[] args)
    {
        // Bounded loop on loopback: the same stored plan, its handout PDF from the app (PDFsharp) against Chromium's
        // print-to-PDF of the plan's print view (Playwright page.PdfAsync). Usage: [iterations] (default 30).
        var iterations = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 30;
        const int Warmup = 3;

        var dataFolder = Path.Combine(Path.GetTempPath(), "lowvisionaid-bench", Guid.NewGuid().ToString("N"));
        // The app's content root (wwwroot for print.css and the font), found from the repository root.
        var root = new DirectoryInfo(AppContext.BaseDirectory);
        while (root is not null && !File.Exists(Path.Combine(root.FullName, "LowVisionAid.sln")))
        {
            root = root.Parent;
        }

        Environment.SetEnvironmentVariable("ASPNETCORE_TEST_CONTENTROOT_LOWVISIONAID_WEB", Path.Combine(root!.FullName, "src", "LowVisionAid.Web"));
        await using var app = new BenchApp(dataFolder);
        app.UseKestrel(0);
        app.StartServer();
        var address = app.Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!.Addresses.First();
        var planId = await SeedAsync(app);
        using var http = new HttpClient { BaseAddress = new Uri(address) };

        using var playwright = await Playwright.CreateAsync();
        await using var browser = await playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = "/usr/bin/chromium",
            Headless = true,
            Args = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
        });
        var page = await browser.NewPageAsync();

        async Task<int> Handout() => (await http.GetByteArrayAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative))).Length;

        async Task<int> Chromium()
        {
            await page.GotoAsync($"{address}/Plans/{planId}/Print?for=client", new PageGotoOptions { WaitUntil = WaitUntilState.Load });
            return (await page.PdfAsync(new PagePdfOptions { Format = "A4", PrintBackground = true })).Length;
        }

        var (handoutMs, handoutBytes) = await MeasureAsync(Handout);
        var (chromiumMs, chromiumBytes) = await MeasureAsync(Chromium);
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"iterations {iterations} (after {Warmup} warm-up), loopback {address}"));
        Console.WriteLine(Line("Handout PDF (GET /Plans/{id}/Handout, PDFsharp)", handoutMs, handoutBytes));
        Console.WriteLine(Line("Chromium print-to-PDF of /Plans/{id}/Print?for=client", chromiumMs, chromiumBytes));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"ratio Chromium / handout (median): {Median(chromiumMs) / Median(handoutMs):0.0}"));

        async Task<(List<double> Ms, int Bytes)> MeasureAsync(Func<Task<int>> work)
        {
            for (int i = 0; i < Warmup; i++)
            {
                await work();
            }

            var times = new List<double>(iterations);
            var bytes = 0;
            for (int i = 0; i < iterations; i++)
            {
                var watch = Stopwatch.StartNew();
                bytes = await work();
                times.Add(watch.Elapsed.TotalMilliseconds);
            }

            return (times, bytes);
        }

        static double Median(List<double> values)
        {
            var sorted = values.Order().ToList();
            return sorted.Count % 2 == 1 ? sorted[sorted.Count / 2] : (sorted[(sorted.Count / 2) - 1] + sorted[sorted.Count / 2]) / 2;
        }

        static string Line(string what, List<double> ms, int bytes) => string.Create(CultureInfo.InvariantCulture,
            $"{what}: median {Median(ms):0.0} ms, mean {ms.Average():0.0} ms, min {ms.Min():0.0} ms, max {ms.Max():0.0} ms, {bytes / 1024.0:0} KB");

        // One stored plan as the plan page stores it: a +8 D hand magnifier from the kit, dispensed (figures derived as in
        // tests/LowVisionAid.Web.Tests/Pages/Plans/PlanReportPagesTests.cs).
        static async Task<int> SeedAsync(BenchApp app)
        {
            await using var scope = app.Services.CreateAsyncScope();
            var db = scope.ServiceProvider.GetRequiredService<ClinicDbContext>();
            var settings = LowVisionAid.Web.Demo.DemoClinic.DefaultSettings("Harbour Bench Clinic (invented)", hasDemoData: false);
            settings.ClinicContact = "2 Quay Street, Port Example · 000 1111 2222 (invented)";
            db.Settings.Add(settings);
            var kit = new KitDevice { Code = "HM-08", Name = "Hand magnifier +8 D, 75 mm", Kind = LowVisionAid.Optics.Kit.DeviceKind.HandMagnifier, Power = Power.FromDioptres(8), Aperture = Distance.FromMillimetres(75) };
            db.KitDevices.Add(kit);
            var client = new Client { Code = "B-1" };
            var visit = new Visit { VisitDate = new DateOnly(2026, 11, 20) };
            var figures = new[]
            {
                new { Label = "Power given", Value = "+8.00 D (enough)" },
                new { Label = "Working distance", Value = "12.5 cm" },
                new { Label = "Eye to lens", Value = "25 cm" },
                new { Label = "Field on the page", Value = "3.5 cm" },
                new { Label = "Letters in view", Value = "22" },
            };
            var outputs = JsonSerializer.Serialize(new
            {
                MethodVersion = "2026.12.1",
                Goals = new[] { new { Title = "Letters and bills", Target = "1M", KitDevices = new[] { new { Kind = "Hand magnifier", KitCode = "HM-08", KitName = kit.Name, Figures = figures } } } },
            });
            var inputs = JsonSerializer.Serialize(new { NearThresholdM = 4.0, NearTestDistanceMetres = 0.4, FluentReserve = 2.0, Goals = new[] { new { Task = "Mail", TargetText = "1M", TargetM = 1.0 } } });
            var plan = new Plan { MethodVersion = "2026.12.1", InputsJson = inputs, OutputsJson = outputs };
            plan.Trials.Add(new Trial { TrialDate = new DateOnly(2026, 11, 20), KitDevice = kit, DeviceDescription = kit.Name, Outcome = TrialOutcome.Dispensed });
            visit.Plans.Add(plan);
            client.Visits.Add(visit);
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            return plan.Id;
        }
    }
}

internal sealed class BenchApp(string dataFolder) : WebApplicationFactory<Program>
{
    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseSetting("DataFolder", dataFolder);
        builder.UseSetting("LoadDemoClinic", "false");
        builder.UseEnvironment("Production");
        builder.UseSetting("Logging:LogLevel:Default", "Warning");
    }
}
