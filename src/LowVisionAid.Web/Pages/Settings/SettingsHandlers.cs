using System.Collections.Immutable;
using System.Globalization;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Web.Demo;
using LowVisionAid.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.Settings;

public sealed class SettingsHandler(ClinicDbContext db, DemoClinic demo)
{
    /// <summary>The settings row, made with the defaults if the database has none (demo loading turned off).</summary>
    public async Task<ClinicSettings> CurrentAsync(CancellationToken ct)
    {
        var settings = await db.Settings.AsNoTracking().OrderBy(s => s.Id).FirstOrDefaultAsync(ct).ConfigureAwait(false);
        if (settings is not null)
        {
            return settings;
        }

        var created = DemoClinic.DefaultSettings("My clinic", hasDemoData: false);
        db.Settings.Add(created);
        await db.SaveChangesAsync(ct).ConfigureAwait(false);
        return created;
    }

    public static SettingsInput ToInput(ClinicSettings s)
    {
        ArgumentNullException.ThrowIfNull(s);
        return new()
        {
            ClinicName = s.ClinicName,
            ClinicContact = s.ClinicContact,
            Units = s.Units,
            SnellenIn = s.SnellenIn,
            SpotReserve = s.SpotReserve.ToString(null, CultureInfo.InvariantCulture),
            FluentReserve = s.FluentReserve.ToString(null, CultureInfo.InvariantCulture),
            SustainedReserve = s.SustainedReserve.ToString(null, CultureInfo.InvariantCulture),
            CharacterPitch = s.CharacterPitch.ToString("0.0#", CultureInfo.InvariantCulture),
            HandoutPrintSize = s.HandoutPrintSize.ToString(null, CultureInfo.InvariantCulture),
            Costs = [.. DeviceRanges.Default.Costs.Keys.Order().Select(kind => new CostClassInput
            {
                Kind = kind,
                Cost = s.CostClasses.TryGetValue(kind, out var own) ? own : DeviceRanges.Default.CostOf(kind),
            })],
            Version = s.Version,
        };
    }

    /// <summary>Saves; false when someone else saved the settings since the form was opened.</summary>
    public async Task<bool> SaveAsync(SettingsInput input, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(input);
        await CurrentAsync(ct).ConfigureAwait(false);
        var s = await db.Settings.SingleAsync(ct).ConfigureAwait(false);
        if (s.Version != input.Version)
        {
            return false;
        }

        db.Entry(s).Property(x => x.Version).OriginalValue = input.Version;
        s.ClinicName = input.ClinicName.Trim();
        s.ClinicContact = string.IsNullOrWhiteSpace(input.ClinicContact) ? null : input.ClinicContact.Trim();
        s.Units = input.Units;
        s.SnellenIn = input.SnellenIn;
        s.SpotReserve = SettingsInput.Reserve(input.SpotReserve)!.Value;
        s.FluentReserve = SettingsInput.Reserve(input.FluentReserve)!.Value;
        s.SustainedReserve = SettingsInput.Reserve(input.SustainedReserve)!.Value;
        s.CharacterPitch = SettingsInput.Number(input.CharacterPitch)!.Value;
        s.HandoutPrintSize = FormFieldParsers.PrintSize(input.HandoutPrintSize).Value;
        // Only the classes that differ from the core's defaults are kept, so the defaults stay the core's; a kind the
        // form did not send keeps what it had.
        var costs = s.CostClasses.ToImmutableDictionary();
        foreach (var (kind, cost) in input.Costs.Where(c => c.Cost is not null).Select(c => (c.Kind, c.Cost!.Value)))
        {
            costs = cost == DeviceRanges.Default.CostOf(kind) ? costs.Remove(kind) : costs.SetItem(kind, cost);
        }

        s.CostClasses = costs;
        db.Entry(s).State = EntityState.Modified;
        try
        {
            await db.SaveChangesAsync(ct).ConfigureAwait(false);
            return true;
        }
        catch (DbUpdateConcurrencyException)
        {
            return false;
        }
    }

    public Task RemoveDemoAsync(CancellationToken ct) => demo.RemoveAsync(ct);
}
