using System.Collections.Immutable;
using LowVisionAid.Kit;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Kit.Tests;

public class KitCsvTests
{
    private const string Header = "id,name,kind,power_d,label_times,label_convention,aperture_mm,stand_height_cm,image_below_lens_cm,enlargement_ratio,magnification,reading_cap_d,field_deg,focus_nearest_m,illuminated,notes";

    // Invented catalogue rows (fictional clinic); the tests check reading and rejection, not optics.
    private static readonly ImmutableArray<KitDevice> Catalogue =
    [
        new() { Id = "H-12", Name = "Hand lens 12 D, 50 mm", Kind = DeviceKind.HandMagnifier, Power = Power.FromDioptres(12), Aperture = Distance.FromMillimetres(50), Notes = "Cupboard 2, top shelf" },
        new() { Id = "H-8", Name = "Hand lens, labelled \"3×\" (trade)", Kind = DeviceKind.HandMagnifier, Label = new KitLabel(3, LabelConvention.Trade), Aperture = Distance.FromMillimetres(70), Illuminated = true },
        new() { Id = "S-20", Name = "Stand, image 10 cm", Kind = DeviceKind.StandMagnifier, ImageBelowLens = Distance.FromCentimetres(10), EnlargementRatio = 3, Aperture = Distance.FromMillimetres(45) },
        new() { Id = "S-12", Name = "Stand 12 D", Kind = DeviceKind.StandMagnifier, Power = Power.FromDioptres(12), StandHeight = Distance.FromCentimetres(6.25), Aperture = Distance.FromMillimetres(50) },
        new() { Id = "T-4", Name = "Near telescope 4×", Kind = DeviceKind.NearTelescope, Magnification = 4, ReadingCap = Power.FromDioptres(2.5), Field = VisualAngle.FromDegrees(9.5) },
        new() { Id = "D-4", Name = "Distance telescope 4×", Kind = DeviceKind.DistanceTelescope, Magnification = 4, FocusNearest = Distance.FromMetres(1.2) },
        new() { Id = "V-1", Name = "Video magnifier", Kind = DeviceKind.VideoMagnifier, Magnification = 40 },
        new() { Id = "SA-10", Name = "Reading spectacles +10 D", Kind = DeviceKind.SpectacleAdd, Power = Power.FromDioptres(10) },
    ];

    private static KitCsvImport Read(string text) => KitCsv.Import(new StringReader(text));

    [Fact]
    public void An_exported_catalogue_reads_back_unchanged()
    {
        using var writer = new StringWriter(CultureInfo.InvariantCulture);
        KitCsv.Export(Catalogue, writer);
        var result = Read(writer.ToString());
        Assert.True(result.Success, string.Join("; ", result.Errors));
        for (var i = 0; i < Catalogue.Length; i++)
        {
            Assert.Equal(Catalogue[i], result.Devices[i]);
        }

        Assert.StartsWith(Header, writer.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Export_writes_invariant_numbers_under_a_comma_decimal_culture()
    {
        var previous = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo("de-DE");
            using var writer = new StringWriter(CultureInfo.InvariantCulture);
            KitCsv.Export([Catalogue[3]], writer);
            Assert.Contains(",6.25,", writer.ToString(), StringComparison.Ordinal);
            Assert.Equal(Catalogue[3], Assert.Single(Read(writer.ToString()).Devices));
        }
        finally
        {
            CultureInfo.CurrentCulture = previous;
        }
    }

    [Fact]
    public void Only_the_needed_columns_may_be_given_in_any_order()
    {
        var result = Read("kind,id,name,power_d,aperture_mm\nhand,H-6,Hand lens 6 D,6,90\n");
        Assert.True(result.Success);
        var device = Assert.Single(result.Devices);
        Assert.Equal(6, device.Power!.Value.Dioptres);
        Assert.Equal(90, device.Aperture!.Value.Millimetres, 9);
    }

    [Fact]
    public void A_file_with_one_bad_row_imports_nothing_and_names_row_and_column()
    {
        var result = Read($"{Header}\nH-12,Hand lens,hand,12,,,50,,,,,,,,no,\nH-13,Hand lens,hand,twelve,,,50,,,,,,,,no,\n");
        Assert.False(result.Success);
        Assert.Empty(result.Devices);
        var error = Assert.Single(result.Errors);
        Assert.Equal(3, error.Row);
        Assert.Equal("power_d", error.Column);
        Assert.StartsWith("Row 3, column power_d: \"twelve\" is not a number", error.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Every_error_in_the_file_is_reported_at_once()
    {
        var result = Read($"{Header}\nH-1,Lens,lamp,12,,,50,,,,,,,,no,\nH-2,Lens,hand,12,,,,,,,,,,,maybe,\n");
        Assert.Equal([(2, "kind"), (3, "illuminated")], result.Errors.Select(e => (e.Row, e.Column)));
    }

    [Fact]
    public void A_times_label_without_its_convention_is_refused()
    {
        var result = Read("id,name,kind,label_times,aperture_mm\nH-3,Lens 3x,hand,3,50\n");
        var error = Assert.Single(result.Errors);
        Assert.Equal((2, "label_convention"), (error.Row, error.Column));
        Assert.Contains("alone is not accepted", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_stand_magnifier_described_only_by_its_label_is_refused()
    {
        var result = Read("id,name,kind,label_times,label_convention,aperture_mm\nS-3,Stand 3x,stand,3,nominal,50\n");
        Assert.Contains(result.Errors, e => e.Row == 2 && e.Column == "power_d" && e.Message.Contains("not reliable for stand magnifiers", StringComparison.Ordinal));
        Assert.Empty(result.Devices);
    }

    [Fact]
    public void A_stand_height_beyond_the_focal_length_is_refused_in_its_column()
    {
        // 1/F = 5 cm for +20 D: a 6 cm stand height would form a real, inverted image (methods §3.4).
        var result = Read("id,name,kind,power_d,stand_height_cm,aperture_mm\nS-9,Stand,stand,20,6,50\n");
        Assert.Contains(result.Errors, e => e.Row == 2 && e.Column == "stand_height_cm");
    }

    [Fact]
    public void Unknown_duplicate_and_missing_columns_are_reported_on_the_header_row()
    {
        var result = Read("id,name,name,colour\nH-1,a,b,red\n");
        Assert.Equal([(1, "name"), (1, "colour"), (1, "kind")], result.Errors.Select(e => (e.Row, e.Column)).OrderBy(x => x.Item2 == "kind").ThenBy(x => x.Item2 == "colour" ? 0 : -1));
    }

    [Fact]
    public void Duplicate_ids_are_refused()
    {
        var result = Read("id,name,kind,power_d\nSA-1,Spectacles,spectacle-add,8\nsa-1,Spectacles,spectacle-add,10\n");
        var error = Assert.Single(result.Errors);
        Assert.Equal((3, "id"), (error.Row, error.Column));
    }

    [Fact]
    public void A_row_with_too_many_fields_is_refused_with_advice_to_quote()
    {
        var result = Read("id,name,kind,power_d\nSA-1,Spectacles, strong,spectacle-add,8\n");
        var error = Assert.Single(result.Errors);
        Assert.Equal(2, error.Row);
        Assert.Contains("quote", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_quoted_name_with_a_comma_and_a_later_line_keeps_its_file_row()
    {
        var result = Read("id,name,kind,power_d\n\"SA-1\",\"Spectacles, strong\",spectacle-add,8\nSA-2,Spectacles,spectacle-add,x\n");
        Assert.Equal((3, "power_d"), (result.Errors.Single().Row, result.Errors.Single().Column));
    }

    [Fact]
    public void An_empty_file_is_refused_with_the_columns_to_use()
    {
        var result = Read(string.Empty);
        Assert.False(result.Success);
        Assert.Contains("id,name,kind", Assert.Single(result.Errors).Message, StringComparison.Ordinal);
    }
}

public class KitDeviceTests
{
    [Fact]
    public void A_trade_label_gives_the_power_by_its_convention()
    {
        // Methods §5: trade M = F/4 + 1, so 3× trade → F = 4 × (3 − 1) = 8 D. Exact.
        var device = new KitDevice { Id = "H-8", Name = "Hand lens", Kind = DeviceKind.HandMagnifier, Label = new KitLabel(3, LabelConvention.Trade), Aperture = Distance.FromMillimetres(50) };
        Assert.Equal(8.0, device.EffectivePower!.Value.Dioptres, 9);
        Assert.Empty(device.Check());
    }

    [Fact]
    public void A_hand_magnifier_without_power_or_aperture_says_what_to_enter()
    {
        var problems = new KitDevice { Id = "H", Name = "Lens", Kind = DeviceKind.HandMagnifier }.Check();
        Assert.Equal([nameof(KitDevice.Power), nameof(KitDevice.Aperture)], problems.Select(p => p.Field));
        Assert.All(problems, p => Assert.Contains("nter", p.Message, StringComparison.Ordinal));
    }

    [Fact]
    public void A_stand_from_its_image_position_matches_CV15()
    {
        // CV-15 (derived; methods §3.4): image 10 cm below, ER 3 → F 20 D, stand height 3.33 cm. Tolerance ±1 %.
        var stand = new KitDevice { Id = "S", Name = "Stand", Kind = DeviceKind.StandMagnifier, ImageBelowLens = Distance.FromCentimetres(10), EnlargementRatio = 3, Aperture = Distance.FromMillimetres(45) }.ToStandMagnifier()!;
        Assert.InRange(stand.LensPower.Dioptres, 19.8, 20.2);
        Assert.InRange(stand.StandHeight.Centimetres, 3.30, 3.37);
    }
}
