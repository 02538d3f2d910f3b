using System.Globalization;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Kit;
using LowVisionAid.Web.Plans;
using Microsoft.EntityFrameworkCore;
using CoreKitDevice = LowVisionAid.Optics.Kit.KitDevice;

namespace LowVisionAid.Web.Pages.Kit;

public sealed record KitRow(int Id, string Code, string Name, string Kind, string? Power, string? Aperture, bool Illuminated, int InStock, bool IsDemo);

public sealed class KitHandler(ClinicDbContext db)
{
    public const string CodeTaken = "Another device in the kit already has this code; type a different code.";

    public async Task<IReadOnlyList<KitRow>> ListAsync(CancellationToken ct)
    {
        var devices = await db.KitDevices.AsNoTracking().OrderBy(k => k.Kind).ThenBy(k => k.Code).ToListAsync(ct).ConfigureAwait(false);
        return [.. devices.Select(k => new KitRow(k.Id, k.Code, k.Name, Web.Plans.PlanText.Device(k.Kind), k.Power?.ToString(null, CultureInfo.InvariantCulture),
            k.Aperture is { } a ? Optics.Notation.DistanceNotation.Format(a, CultureInfo.InvariantCulture, "mm") : null, k.Illuminated, k.InStock, k.IsDemo))];
    }

    /// <summary>Adds a device; returns an error for the code field when the code is taken.</summary>
    public async Task<string?> AddAsync(KitInput input, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(input);
        var core = input.ToCore();
        if (await db.KitDevices.AnyAsync(k => k.Code == core.Id, ct).ConfigureAwait(false))
        {
            return CodeTaken;
        }

        var device = new KitDevice { Code = core.Id, Name = core.Name };
        Copy(core, device);
        device.InStock = int.TryParse(input.InStock?.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var n) ? n : 1;
        db.KitDevices.Add(device);
        await db.SaveChangesAsync(ct).ConfigureAwait(false);
        return null;
    }

    /// <summary>The kit as CSV in the kit library's columns.</summary>
    public async Task<string> ExportAsync(CancellationToken ct)
    {
        var devices = await db.KitDevices.AsNoTracking().OrderBy(k => k.Code).ToListAsync(ct).ConfigureAwait(false);
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        KitCsv.Export(devices.Select(d => KitPoint.From(d).ToCore() with { Notes = d.Notes }), writer);
        return writer.ToString();
    }

    /// <summary>
    /// Imports a CSV file whole or not at all: new codes are added, known codes are updated. The file's bytes are
    /// read in the encoding they are in (<see cref="KitCsvText"/>), which is returned.
    /// </summary>
    public async Task<(int Added, int Updated, string Encoding, IReadOnlyList<KitCsvError> Errors)> ImportAsync(byte[] file, CancellationToken ct)
    {
        var import = KitCsv.Import(file);
        if (!import.Success)
        {
            return (0, 0, import.Encoding, import.Errors);
        }

        var existing = await db.KitDevices.ToDictionaryAsync(k => k.Code, StringComparer.OrdinalIgnoreCase, ct).ConfigureAwait(false);
        int added = 0, updated = 0;
        foreach (var core in import.Devices)
        {
            if (!existing.TryGetValue(core.Id, out var device))
            {
                device = new KitDevice { Code = core.Id, Name = core.Name, InStock = 1 };
                db.KitDevices.Add(device);
                added++;
            }
            else
            {
                device.IsDemo = false;
                updated++;
            }

            Copy(core, device);
        }

        await db.SaveChangesAsync(ct).ConfigureAwait(false);
        return (added, updated, import.Encoding, []);
    }

    private static void Copy(CoreKitDevice core, KitDevice device)
    {
        device.Name = core.Name;
        device.Kind = core.Kind;
        device.Power = core.Power;
        device.LabelTimes = core.Label?.Times;
        device.LabelConvention = core.Label?.Convention;
        device.Aperture = core.Aperture;
        device.StandHeight = core.StandHeight;
        device.ImageBelowLens = core.ImageBelowLens;
        device.EnlargementRatio = core.EnlargementRatio;
        device.Magnification = core.Magnification;
        device.ReadingCap = core.ReadingCap;
        device.Field = core.Field;
        device.FocusNearest = core.FocusNearest;
        device.Illuminated = core.Illuminated;
        device.Notes = core.Notes;
    }
}
