using CsCheck;
using LowVisionAid.Kit;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Kit.Tests;

public class KitCsvPropertyTests
{
    private static readonly Gen<KitDevice> Devices =
        Gen.Select(Gen.Int[1, 9999], Gen.Double[1, 60], Gen.Double[10, 120], Gen.Bool, Gen.String[Gen.Char.AlphaNumeric, 0, 12])
            .Select((n, power, aperture, lit, note) => new KitDevice
            {
                Id = "H-" + n.ToString(CultureInfo.InvariantCulture),
                Name = "Hand lens, \"" + note + "\"",
                Kind = DeviceKind.HandMagnifier,
                Power = Power.FromDioptres(Math.Round(power, 2)),
                Aperture = Distance.FromMillimetres(Math.Round(aperture, 1)),
                Illuminated = lit,
                Notes = note.Length == 0 ? null : note,
            });

    [Fact]
    public void Any_catalogue_of_valid_devices_survives_export_and_import()
    {
        Devices.List[0, 20].Where(list => list.Select(d => d.Id).Distinct().Count() == list.Count).Sample(list =>
        {
            using var writer = new StringWriter(CultureInfo.InvariantCulture);
            KitCsv.Export(list, writer);
            var result = KitCsv.Import(new StringReader(writer.ToString()));
            return result.Success && result.Devices.SequenceEqual(list);
        });
    }
}
