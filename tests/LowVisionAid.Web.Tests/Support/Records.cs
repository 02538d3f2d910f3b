using LowVisionAid.Data.Entities;
using DeviceKind = LowVisionAid.Optics.Kit.DeviceKind;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Web.Tests.Support;

/// <summary>Makes the records a test needs, directly in its own database.</summary>
public static class Records
{
    public static Task<int> ClientAsync(this ClinicApp app, string code) =>
        app.WithDbAsync(async db =>
        {
            var client = new Client { Code = code };
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            return client.Id;
        });

    /// <summary>A client with one visit and a saved plan row (its figures are not read by these tests).</summary>
    public static Task<(int ClientId, int PlanId)> PlanAsync(this ClinicApp app, string code) =>
        app.WithDbAsync(async db =>
        {
            var client = new Client { Code = code };
            var visit = new Visit { VisitDate = new DateOnly(2026, 11, 20) };
            visit.Plans.Add(new Plan { MethodVersion = "test", InputsJson = "{}", OutputsJson = "{}" });
            client.Visits.Add(visit);
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            return (client.Id, visit.Plans[0].Id);
        });

    public static Task<int> KitDeviceAsync(this ClinicApp app, string code, string name, double dioptres = 12) =>
        app.WithDbAsync(async db =>
        {
            var device = new KitDevice { Code = code, Name = name, Kind = DeviceKind.HandMagnifier, Power = Power.FromDioptres(dioptres), Aperture = Distance.FromMillimetres(50) };
            db.KitDevices.Add(device);
            await db.SaveChangesAsync();
            return device.Id;
        });

    /// <summary>The fields of a complete visit form: a client reading 4M at 40 cm who wants newspaper print.</summary>
    public static Dictionary<string, string> VisitForm(string date = "2026-11-20") => new()
    {
        ["Input.VisitDate"] = date,
        ["Input.Practitioner"] = "Test practitioner",
        ["Input.DistanceRight"] = "6/60",
        ["Input.DistanceLeft"] = "20/400",
        ["Input.DistanceBoth"] = "0.1 decimal",
        ["Input.NearThreshold"] = "4M",
        ["Input.NearTestDistance"] = "40 cm",
        ["Input.AddWorn"] = "+2.50",
        ["Input.WorkingDistance"] = "25 cm",
        ["Input.Goals[0].Task"] = "Newspaper",
        ["Input.Goals[0].TargetPrint"] = "1M",
        ["Input.ReadingSpeeds[0].PrintSize"] = "8M",
        ["Input.ReadingSpeeds[0].WordsPerMinute"] = "90",
        ["Input.UsefulEyes"] = "Both",
        ["Input.HomeLighting"] = "Dim",
    };
}
