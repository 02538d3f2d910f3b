using LowVisionAid.Optics.Options;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Tests.Support;

namespace LowVisionAid.Reports.Tests;

/// <summary>
/// The handout text of the two classes issue 10 added, each alone in a handout and read back through PdfPig: what
/// each must say (common practice for spectacle-mounted telescopes and screen magnification; methods.md §7) and none
/// of what belongs to another class.
/// </summary>
public class NewDeviceClassHandoutTests
{
    private static readonly ClientHandoutRenderer Renderer = new(CultureInfo.InvariantCulture);

    private static PdfText Alone(OptionKind kind, double? criticalM = null)
    {
        var fflur = SampleClients.Named("Fflur").Handout;
        var handout = fflur with { Devices = [fflur.Devices.Single(d => d.Kind == kind)] };
        if (criticalM is { } m)
            handout = handout with { Reader = handout.Reader! with { CriticalPrint = Optics.Quantities.PrintSize.FromM(m) } };
        var result = Renderer.Render(handout);
        Assert.True(result.Success, result.Error);
        Preview.Write("handout-" + kind + (criticalM is null ? "" : "-short"), result.Content);
        return PdfText.Read(result.Content);
    }

    [Fact]
    public void Telescope_glasses_are_hands_free_for_distance_learnt_seated_and_never_used_walking_or_driving()
    {
        var text = Alone(OptionKind.SpectacleTelescope);

        Assert.True(text.Contains("Your hands stay free."), text.Words);
        Assert.True(text.Contains("for seeing things far away"), text.Words);
        Assert.True(text.Contains("Learn to use it sitting down first"), text.Words);
        Assert.True(text.Contains("Look under the telescope, or take the glasses off, before you move about."), text.Words);
        Assert.True(text.Contains(HandoutWording.TelescopeGlassesMoving), text.Words);
        Assert.True(text.Contains(HandoutWording.DrivingRules), text.Words);
        Assert.True(text.Contains(HandoutWording.SunlightFire), text.Words);
        Assert.True(text.Contains("Eye to what you look at: 3 m (9.8 feet)"), text.Words); // 3 m / 0.3048 m = 9.84 ft
        // Not a hand-held telescope, a magnifier on the page or a screen.
        Assert.DoesNotContain("hold the telescope to your eye", text.Words, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("elbow", text.Words, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("Lens to page", text.Words, StringComparison.Ordinal);
        Assert.DoesNotContain("screen", text.Words, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("reading glasses of", text.Words, StringComparison.Ordinal);
    }

    [Fact]
    public void Screen_magnification_names_the_setting_the_per_cent_and_reversed_polarity_and_nothing_of_a_lens()
    {
        var text = Alone(OptionKind.ScreenMagnification);

        Assert.True(text.Contains("phone, tablet or computer"), text.Words);
        Assert.True(text.Contains("Turn the text size or zoom up to about 250 %."), text.Words);
        Assert.True(text.Contains(DeviceWording.ReversedPolarity), text.Words);
        // A screen at 40 cm needs 1/0.40 m = +2.50 D without accommodation (methods.md §1.2).
        Assert.True(text.Contains("Wear reading glasses of +2.50 D to see the screen clearly"), text.Words);
        Assert.True(text.Contains("Eye to screen: 40 cm (15.7 inches)"), text.Words); // 40 / 2.54 = 15.75
        Assert.DoesNotContain("lens", text.Words, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("sunlight", text.Words, StringComparison.OrdinalIgnoreCase);
        Assert.False(text.Contains(HandoutWording.NoSunViewing));
        Assert.False(text.Contains(HandoutWording.DoNotMove));
        Assert.False(text.Contains(HandoutWording.TelescopeGlassesMoving));
        Assert.DoesNotContain("Looking after it", text.Words, StringComparison.Ordinal);
        Assert.DoesNotContain("under the camera", text.Words, StringComparison.Ordinal);
    }

    [Fact]
    public void Reversed_polarity_is_advised_only_when_the_plan_advises_it()
    {
        var steps = DeviceWording.HowToUse(OptionKind.ScreenMagnification, new HandoutScreen(250, ReversedPolarity: false));

        Assert.DoesNotContain(DeviceWording.ReversedPolarity, steps);
        Assert.Contains("Turn the text size or zoom up to about 250 %.", steps);
        Assert.Contains(DeviceWording.ReversedPolarity, DeviceWording.HowToUse(OptionKind.ScreenMagnification, SampleClients.Screen));
    }

    [Fact]
    public void In_the_short_version_telescope_glasses_keep_their_own_line_on_walking_and_driving()
    {
        // A critical print size of 5M at 40 cm is 5 × 8.312 = 41.6 pt (methods.md §1.3, derived): the short version.
        var text = Alone(OptionKind.SpectacleTelescope, criticalM: 5);

        Assert.True(text.Contains(HandoutWording.ShortTelescopeGlasses), text.Words);
        Assert.True(text.Contains(HandoutWording.ShortSun), text.Words);
        Assert.False(text.Contains(HandoutWording.ShortDoNotMove));
        Assert.True(text.Contains("Glasses: the telescope glasses, only sitting down."), text.Words);
    }

    [Fact]
    public void In_the_short_version_screen_magnification_keeps_its_per_cent_and_no_lens_line()
    {
        var text = Alone(OptionKind.ScreenMagnification, criticalM: 5);

        Assert.True(text.Contains("Text size or zoom: about 250 %."), text.Words);
        Assert.True(text.Contains(HandoutWording.ShortSuddenChange), text.Words);
        Assert.False(text.Contains(HandoutWording.ShortSun));
        Assert.DoesNotContain("lens", text.Words, StringComparison.OrdinalIgnoreCase);
    }
}
