using LowVisionAid.Reports.Fonts;

namespace LowVisionAid.Reports.Tests;

public class GlyphCoverageTests
{
    [Theory]
    [InlineData("Reads 4.0M at 40 cm", "Reads 4.0M at 40 cm")]
    [InlineData("Łódź ± 0.5 D × 2 ≥ 1", "Łódź ± 0.5 D × 2 ≥ 1")]
    [InlineData("12.5′ = 0.208°", "12.5' = 0.208°")]
    [InlineData("6/60 → 20/200", "6/60 -> 20/200")]
    [InlineData("Ŵynne", "Wynne")]
    [InlineData("log₁₀", "log10")]
    [InlineData("鏡 🔍", "? ?")]
    public void Keeps_what_the_faces_draw_and_replaces_the_rest_visibly(string text, string printed)
    {
        Assert.Equal(printed, GlyphCoverage.Fit(text));
    }

    [Fact]
    public void The_shipped_faces_cover_the_letters_and_signs_the_reports_print()
    {
        // Every character of the fixed handout wording and the bullets, separators and units the layouts use.
        var used = string.Concat(Reports.Handouts.HandoutWording.Cautions) + "•·–×±°≥≤½" + "abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789.,:;()+-/'?!%";

        Assert.All(used.Where(c => c != ' '), c => Assert.True(GlyphCoverage.CanDraw(c), $"U+{(int)c:X4} '{c}'"));
    }
}
