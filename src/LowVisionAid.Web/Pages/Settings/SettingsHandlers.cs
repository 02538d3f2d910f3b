using System.Globalization;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
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
        s.SpotReserve = AcuityReserve.FromRatio(SettingsInput.Ratio(input.SpotReserve)!.Value);
        s.FluentReserve = AcuityReserve.FromRatio(SettingsInput.Ratio(input.FluentReserve)!.Value);
        s.SustainedReserve = AcuityReserve.FromRatio(SettingsInput.Ratio(input.SustainedReserve)!.Value);
        s.CharacterPitch = SettingsInput.Number(input.CharacterPitch)!.Value;
        s.HandoutPrintSize = Readings.PrintSize(input.HandoutPrintSize).Value;
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
