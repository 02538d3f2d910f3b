using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

/// <summary>The same entries read the same under a comma-decimal culture, passed explicitly.</summary>
public class CommaCultureTests
{
    private static readonly CultureInfo German = CultureInfo.GetCultureInfo("de-DE");

    [Theory]
    // Same derived values as the invariant tables (logMAR = −log₁₀ decimal; log₁₀(M/d)). Tolerance ±0.0005.
    [InlineData("6/7,5", 0.0969100)]
    [InlineData("6/7.5", 0.0969100)]
    [InlineData("dec 0,5", 0.3010300)]
    [InlineData("logMAR 0,30", 0.30)]
    [InlineData("top 1,0, 12 letters", 0.86)]
    public void Distance_acuity_reads_with_either_mark(string text, double logMar) =>
        Tolerance.Within(logMar, DistanceAcuityNotation.Parse(text, German).Value.LogMar, 0.0005);

    [Theory]
    [InlineData("1,6M @ 25cm", 1.6, 0.25)]
    [InlineData("4M at 0,4 m", 4.0, 0.40)]
    [InlineData("0,40/1,0M", 1.0, 0.40)]
    public void Near_acuity_reads_with_either_mark(string text, double m, double metres)
    {
        var near = NearAcuityNotation.Parse(text, German).Value;
        Tolerance.Within(m, near.Threshold.M, 1e-9);
        Tolerance.Within(metres, near.TestDistance.Metres, 1e-9);
    }

    [Theory]
    // Same derived values as the invariant tables (M exact; N and pt through r_x 0.50, methods §1.3). Tolerance ±0.0005.
    [InlineData("1,6M", 1.6)]
    [InlineData("1.6M", 1.6)]
    [InlineData("1,4544 mm", 1.0)]
    [InlineData("8,25 pt", 1.0005)]
    [InlineData("N 12", 1.4551)]
    public void Print_sizes_read_with_either_mark(string text, double m) =>
        Tolerance.Within(m, PrintSizeNotation.Parse(text, German).Value.M, 0.0005, text);

    [Theory]
    [InlineData("0,4 m", 0.40)]
    [InlineData("33,3 cm", 0.333)]
    [InlineData("15,75 in", 0.40005)]
    public void Distances_read_with_either_mark(string text, double metres) =>
        Tolerance.Within(metres, DistanceNotation.Parse(text, German).Value.Metres, 1e-9, text);

    [Fact]
    public void A_bare_comma_number_is_still_refused_with_both_readings()
    {
        Assert.Equal(ParseMessages.BareNumberIsAmbiguous("0,5", "6/12, 20/40", "6/19, 20/63"), DistanceAcuityNotation.Parse("0,5", German).Error);
    }

    [Fact]
    public void A_Snellen_fraction_typed_with_a_comma_is_refused_with_the_slash_example()
    {
        Assert.Equal(ParseMessages.BareNumberNotAnAcuity("6,60"), DistanceAcuityNotation.Parse("6,60", German).Error);
    }

    [Fact]
    public void Display_forms_use_the_comma()
    {
        var acuity = DistanceAcuityNotation.Parse("6/9,5", German).Value;
        Assert.Equal("6/9,5", DistanceAcuityNotation.Format(acuity, AcuityNotation.SnellenMetres, German));
        Assert.Equal("0,63 decimal", DistanceAcuityNotation.Format(acuity, AcuityNotation.DecimalAcuity, German));
    }
}

[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class CurrentCultureGroup
{
    public const string Name = "Tests that set CurrentCulture";
}

/// <summary>A null provider means the current culture; these tests set it, so they run alone.</summary>
[Collection(CurrentCultureGroup.Name)]
public class CurrentCultureTests
{
    [Fact]
    public void A_null_provider_uses_the_current_cultures_marks()
    {
        using (new CultureScope("de-DE"))
        {
            var acuity = DistanceAcuityNotation.Parse("6/7,500", null).Value;
            Assert.Equal("0,10 logMAR", DistanceAcuityNotation.Format(acuity, AcuityNotation.LogMar, null));
            Assert.Equal(ParseMessages.AmbiguousThousands("7.500"), DistanceAcuityNotation.Parse("6/7.500", null).Error);
        }

        using (new CultureScope("en-US"))
        {
            Assert.Equal(ParseMessages.AmbiguousThousands("7,500"), DistanceAcuityNotation.Parse("6/7,500", null).Error);
            Assert.Equal("0.10 logMAR", DistanceAcuityNotation.Format(DistanceAcuityNotation.Parse("6/7.5", null).Value, AcuityNotation.LogMar, null));
        }
    }

    [Fact]
    public void A_null_provider_reads_print_sizes_distances_and_near_acuity_under_a_comma_culture()
    {
        using (new CultureScope("de-DE"))
        {
            Tolerance.Within(1.6, PrintSizeNotation.Parse("1,6M", null).Value.M, 1e-12);
            Tolerance.Within(0.25, DistanceNotation.Parse("0,25 m", null).Value.Metres, 1e-12);
            Tolerance.Within(2.5, NearAcuityNotation.Parse("2,5M at 0,4 m", null).Value.Threshold.M, 1e-12);
            Assert.Equal(ParseMessages.AmbiguousThousands("1.000"), DistanceNotation.Parse("1.000 m", null).Error);
            Assert.Equal("1,6M at 25 cm", NearAcuityNotation.Format(NearAcuityNotation.Parse("1,6M @ 25cm", null).Value, null));
        }
    }

    [Fact]
    public void The_canonical_form_does_not_depend_on_the_current_culture()
    {
        var near = NearAcuityNotation.Parse("1,6M @ 25cm", CultureInfo.InvariantCulture).Value;
        string german;
        using (new CultureScope("de-DE"))
        {
            german = NearAcuityNotation.FormatCanonical(near);
        }

        Assert.Equal("1.6M at 0.25 m", german);
    }
}
