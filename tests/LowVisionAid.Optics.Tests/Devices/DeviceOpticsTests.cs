using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Devices;

public class GullstrandTests
{
    [Theory]
    // Schwartz, Geometrical and Visual Optics (magnifier–add example, methods §3.1): +10 D magnifier, +2.50 add,
    // 10 cm apart gives +10.00 D; 5 cm apart gives +11.25 D. Tolerance ±1 % (optics, methods §6).
    [InlineData(10.0, 10.0)]
    [InlineData(5.0, 11.25)]
    public void A_10_D_magnifier_with_a_2_50_add_gives_Schwartz_equivalent_power(double separationCm, double expected) =>
        Tolerance.WithinRelative(expected, Gullstrand.EquivalentPower(Power.FromDioptres(10), Power.FromDioptres(2.5), Distance.FromCentimetres(separationCm)).Dioptres, 0.01);

    [Fact]
    public void In_contact_the_powers_add()
    {
        // Derived special case z = 0 (methods §3.1): Fe = F_M + A. Tolerance ±1 %.
        Tolerance.WithinRelative(16, Gullstrand.EquivalentPower(Power.FromDioptres(12), Power.FromDioptres(4), Distance.Zero).Dioptres, 0.01);
    }
}

public class MagnifierLabelTests
{
    [Fact]
    public void A_12_D_lens_reads_3x_nominal_4x_trade_and_4_8x_against_40_cm()
    {
        // CV-14 (Brown and Siemsen 2008; derived): F = +12 D → 3× (F/4), 4× (F/4 + 1), 4.8× re 40 cm. Exact (±1e-9).
        var f = Power.FromDioptres(12);
        Tolerance.Within(3.0, MagnifierLabel.Magnification(f, LabelConvention.Nominal), 1e-9);
        Tolerance.Within(4.0, MagnifierLabel.Magnification(f, LabelConvention.Trade), 1e-9);
        Tolerance.Within(4.8, MagnifierLabel.Magnification(f, LabelConvention.Nominal40Centimetres), 1e-9);
        Assert.Equal(MagnifierLabel.Readings(f), new LabelReadings(3.0, 4.0));
    }

    [Theory]
    // Methods §5: if only "×" is known, F = 4M (nominal) or F = 4(M − 1) (trade). 3× → 12 D or 8 D. Exact.
    [InlineData(LabelConvention.Nominal, 3.0, 12.0)]
    [InlineData(LabelConvention.Trade, 3.0, 8.0)]
    [InlineData(LabelConvention.Nominal40Centimetres, 4.8, 12.0)]
    public void A_label_with_its_convention_gives_a_power(LabelConvention convention, double times, double dioptres) =>
        Tolerance.Within(dioptres, MagnifierLabel.PowerFromLabel(times, convention).Dioptres, 1e-9);

    [Fact]
    public void A_trade_label_of_one_times_is_refused_with_advice_to_enter_dioptres()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => MagnifierLabel.PowerFromLabel(1.0, LabelConvention.Trade));
        Assert.Contains("dioptres", error.Message, StringComparison.Ordinal);
    }
}

public class HandMagnifierTests
{
    [Fact]
    public void With_the_distance_correction_the_page_is_at_the_focal_point_and_power_does_not_depend_on_eye_distance()
    {
        // Methods §3.1 (Entokey Fig 7.1): image at infinity, Feq = F_M for any z; page at 1/F. Tolerance ±1 %.
        var near = HandMagnifier.WithDistanceCorrection(Power.FromDioptres(20), Distance.FromCentimetres(5));
        var far = HandMagnifier.WithDistanceCorrection(Power.FromDioptres(20), Distance.FromCentimetres(25));
        Tolerance.WithinRelative(20, near.EquivalentPower.Dioptres, 0.01);
        Tolerance.WithinRelative(20, far.EquivalentPower.Dioptres, 0.01);
        Tolerance.WithinRelative(5.0, far.LensToPage.Centimetres, 0.01);
    }

    [Fact]
    public void With_an_add_the_page_position_follows_the_vergence_rule()
    {
        // Derived (methods §3.3): +10 D lens, +2.50 add at z = 5 cm. L′ = −2.5/(1 − 0.125) = −2.857 D;
        // L = −2.857 − 10 = −12.857 D → page 7.78 cm; Feq = 11.25 D (Schwartz). Tolerance ±1 %.
        var view = HandMagnifier.WithAdd(Power.FromDioptres(10), Power.FromDioptres(2.5), Distance.FromCentimetres(5));
        Tolerance.WithinRelative(11.25, view.EquivalentPower.Dioptres, 0.01);
        Tolerance.WithinRelative(100.0 / 12.857142857, view.LensToPage.Centimetres, 0.01);
    }

    [Fact]
    public void With_an_add_at_one_focal_length_the_page_checks_reduce_to_the_special_cases()
    {
        // Derived checks (methods §3.3): z = 0 gives L = −(A + F_M): +10 D with +2.50 → page at 1/12.5 m = 8 cm. ±1 %.
        var view = HandMagnifier.WithAdd(Power.FromDioptres(10), Power.FromDioptres(2.5), Distance.Zero);
        Tolerance.WithinRelative(8.0, view.LensToPage.Centimetres, 0.01);
    }
}

public class StandMagnifierTests
{
    private static readonly StandMagnifier Cv15 = StandMagnifier.FromLensAndHeight(Power.FromDioptres(20), Distance.FromMetres(0.1 / 3.0));

    [Fact]
    public void A_20_D_stand_with_its_image_10_cm_below_has_ratio_3_and_page_3_33_cm_below()
    {
        // CV-15 (derived; Bailey EVP = A × ER): ER 3.0, page 3.33 cm below the lens, image 10 cm. Tolerance ±1 %.
        var fromImage = StandMagnifier.FromImagePosition(Distance.FromCentimetres(10), 3.0);
        Tolerance.WithinRelative(20, fromImage.LensPower.Dioptres, 0.01);
        Tolerance.WithinRelative(3.333, fromImage.StandHeight.Centimetres, 0.01);
        Tolerance.WithinRelative(3.0, Cv15.EnlargementRatio, 0.01);
        Tolerance.WithinRelative(10.0, Cv15.ImageBelowLens.Centimetres, 0.01);
    }

    [Theory]
    // CV-15 (derived; Bailey; Gullstrand agrees): eye 15 cm → add +4.00, EVD 8.33 cm, Feq 12 D;
    // eye 5 cm → add +6.67, EVD 5.0 cm, Feq 20 D; eye at lens → Feq 30 D (add +10, EVD 3.33 cm). Tolerance ±1 %.
    [InlineData(15.0, 4.00, 8.333, 12.0)]
    [InlineData(5.0, 6.667, 5.0, 20.0)]
    [InlineData(0.0, 10.0, 3.333, 30.0)]
    public void Viewing_the_CV15_stand_from_an_eye_distance_gives_the_published_figures(double eyeCm, double add, double evdCm, double feq)
    {
        var view = Cv15.ViewFrom(Distance.FromCentimetres(eyeCm));
        Tolerance.WithinRelative(add, view.AddNeeded.Dioptres, 0.01);
        Tolerance.WithinRelative(evdCm, view.EquivalentViewingDistance.Centimetres, 0.01);
        Tolerance.WithinRelative(feq, view.EquivalentPower.Dioptres, 0.01);
    }

    [Fact]
    public void A_stand_at_or_beyond_the_focal_point_is_refused()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => StandMagnifier.FromLensAndHeight(Power.FromDioptres(20), Distance.FromCentimetres(5)));
        Assert.Contains("focal length", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_eye_distance_that_suits_an_add_places_the_image_at_its_focus()
    {
        // Derived: with +4.00 add, z = 1/4 − 0.10 = 15 cm (CV-15 geometry). Tolerance ±1 %.
        Tolerance.WithinRelative(15.0, Cv15.EyeDistanceForAdd(Power.FromDioptres(4))!.Value.Centimetres, 0.01);
        Assert.Null(Cv15.EyeDistanceForAdd(Power.FromDioptres(12)));
    }
}

public class SpectacleAddTests
{
    [Theory]
    // CV-28 (derived, Δ = cm/m): PD 64 mm, lenses centred on the distance PD, page at focus: 16, 25.6, 64 Δ. Exact (±1e-9).
    [InlineData(40.0, 16.0)]
    [InlineData(25.0, 25.6)]
    [InlineData(10.0, 64.0)]
    public void Convergence_demand_at_the_spectacle_plane_matches_CV28(double workingCm, double prism) =>
        Tolerance.Within(prism, Convergence.AtSpectaclePlane(Distance.FromMillimetres(64), Distance.FromCentimetres(workingCm)), 1e-9);

    [Fact]
    public void Naked_eye_convergence_at_10_cm_from_the_centres_of_rotation_is_about_50_prism_dioptres()
    {
        // Methods §3.2 (derived): PD/(w + 0.027) = 6.4/0.127 = 50.4 Δ ("50 Δ instead of 64 Δ"). Tolerance ±1 %.
        Tolerance.WithinRelative(50.39, Convergence.FromCentresOfRotation(Distance.FromMillimetres(64), Distance.FromCentimetres(10)), 0.01);
    }

    [Fact]
    public void A_5_D_add_gets_7_prism_dioptres_base_in_by_the_rule_of_thumb()
    {
        // Siemsen 2012 (Primary Care Optometry News): base-in ≈ add + 2 Δ; +5.00 → 7 Δ, in each eye (methods §3.2, §11). ±0.1.
        Tolerance.Within(7.0, SpectacleAdd.BaseInPrismEachEye(Power.FromDioptres(5)), 0.1);
    }

    [Fact]
    public void A_10_D_add_works_at_10_cm_and_12_D_is_the_binocular_limit()
    {
        // Methods §3.2: w = 1/F_add; binocular use usually fails above about +10 to +12 D (common practice). Ready-made
        // prism half-eyes, binocular by design, go to about +12 D (common practice), so +12 D is still binocular. ±0.1 cm.
        Tolerance.Within(10.0, SpectacleAdd.WorkingDistance(Power.FromDioptres(10), Power.Zero).Centimetres, 0.1);
        Assert.True(SpectacleAdd.BinocularUsuallyPossible(Power.FromDioptres(10)));
        Assert.True(SpectacleAdd.BinocularUsuallyPossible(Power.FromDioptres(12)));
        Assert.False(SpectacleAdd.BinocularUsuallyPossible(Power.FromDioptres(12.25)));
    }
}

public class TelescopeTests
{
    [Fact]
    public void A_Galilean_of_plus_10_and_minus_30_is_3x_erect_and_6_67_cm_long()
    {
        // CV-21 (M = −Fe/Fo, telescope notes): 3.0× erect, length 6.67 cm. Exact (±0.005 cm for the rounding).
        var t = Telescope.FromLensPowers(Power.FromDioptres(10), Power.FromDioptres(-30));
        Tolerance.Within(3.0, t.Magnification, 1e-9);
        Assert.Equal(TelescopeDesign.Galilean, t.Design);
        Tolerance.Within(6.67, t.Length.Centimetres, 0.005);
    }

    [Fact]
    public void A_Keplerian_of_plus_10_and_plus_40_is_4x_inverted_and_12_5_cm_long()
    {
        // CV-21: 4.0× inverted (M = −4), length 12.5 cm. Exact.
        var t = Telescope.FromLensPowers(Power.FromDioptres(10), Power.FromDioptres(40));
        Tolerance.Within(-4.0, t.Magnification, 1e-9);
        Assert.Equal(TelescopeDesign.Keplerian, t.Design);
        Tolerance.Within(12.5, t.Length.Centimetres, 1e-9);
    }

    [Fact]
    public void A_4x_Galilean_aimed_at_4_m_needs_3_7_D()
    {
        // Methods §3.5 (derived, exact paraxial): 7.5 cm Galilean 4× (Fo +10, Fe −40), object at 4 m: 3.7 D (≈ 4 D). ±1 %.
        var t = Telescope.ForMagnification(4, TelescopeDesign.Galilean, Power.FromDioptres(10));
        Tolerance.Within(7.5, t.Length.Centimetres, 1e-9);
        Tolerance.WithinRelative(-4.0 / 1.075, t.ExitVergence(Distance.FromMetres(4)).Dioptres, 0.01);
    }

    [Fact]
    public void A_3x_Galilean_at_1_m_needs_7_5_D_not_the_9_D_of_the_approximation()
    {
        // Methods §3.5 (derived): 3× Galilean d = 6.67 cm at 1 m → 7.5 D (M²L gives 9 D). ±1 %.
        var t = Telescope.FromLensPowers(Power.FromDioptres(10), Power.FromDioptres(-30));
        Tolerance.WithinRelative(-7.5, t.ExitVergence(Distance.FromMetres(1)).Dioptres, 0.01);
        Tolerance.WithinRelative(7.5, t.FocusDemandAtEye(Distance.FromMetres(1), Distance.Zero).Dioptres, 0.01);
    }

    [Fact]
    public void A_4x_Keplerian_at_1_m_needs_32_D_with_the_signed_magnification()
    {
        // Methods §3.5 (derived): Keplerian 4× at 1 m with M signed → −32 D (|M| would wrongly give −10.7 D). ±1 %.
        var t = Telescope.FromLensPowers(Power.FromDioptres(10), Power.FromDioptres(40));
        Tolerance.WithinRelative(-32.0, t.ExitVergence(Distance.FromMetres(1)).Dioptres, 0.01);
    }

    [Fact]
    public void Magnification_for_a_goal_acuity_is_the_ratio_of_MARs()
    {
        // Derived (methods §2.7, angular magnification): 6/60 to 6/12 needs 10/2 = 5×. Exact (±1e-9).
        Tolerance.Within(5.0, Telescope.MagnificationFor(Acuity.FromSnellen(6, 60), Acuity.FromSnellen(6, 12)), 1e-9);
    }

    [Theory]
    // CV-22 (Feq = M × Fcap; standard, derived): 2× + 4 D: WD 25 cm, 8 D; 3× + 4 D: 25 cm, 12 D; 4× + 2.5 D: 40 cm, 10 D. Exact.
    [InlineData(2.0, 4.0, 25.0, 8.0)]
    [InlineData(3.0, 4.0, 25.0, 12.0)]
    [InlineData(4.0, 2.5, 40.0, 10.0)]
    public void Telemicroscope_working_distance_and_power_match_CV22(double m, double cap, double wdCm, double feq)
    {
        Tolerance.Within(wdCm, Telemicroscope.WorkingDistance(Power.FromDioptres(cap)).Centimetres, 1e-9);
        Tolerance.Within(feq, Telemicroscope.EquivalentPower(m, Power.FromDioptres(cap)).Dioptres, 1e-9);
    }

    [Theory]
    // Methods §3.5 (derived): a 3× focusable telescope with f_o = 10 cm gives 20 D at 25 cm and 10 D at 40 cm. ±1 %.
    [InlineData(25.0, 20.0)]
    [InlineData(40.0, 10.0)]
    public void A_focusable_3x_telescope_gives_M_over_w_minus_fo(double focusCm, double feq) =>
        Tolerance.WithinRelative(feq, Telemicroscope.FocusableEquivalentPower(3, Distance.FromCentimetres(10), Distance.FromCentimetres(focusCm)).Dioptres, 0.01);
}

public class VideoMagnifierTests
{
    [Theory]
    // CV-17 (Bailey 2004 notes): 10× at 100 cm → EVD 10 cm (10 D); 10× at 25 cm → 2.5 cm (40 D); 5× at 25 cm → 5 cm (20 D). Exact.
    [InlineData(10.0, 100.0, 10.0, 10.0)]
    [InlineData(10.0, 25.0, 2.5, 40.0)]
    [InlineData(5.0, 25.0, 5.0, 20.0)]
    public void Screen_enlargement_and_viewing_distance_give_Bailey_EVD(double er, double viewCm, double evdCm, double feq)
    {
        Tolerance.Within(evdCm, VideoMagnifier.EquivalentViewingDistance(er, Distance.FromCentimetres(viewCm)).Centimetres, 1e-9);
        Tolerance.Within(feq, VideoMagnifier.EquivalentPower(er, Distance.FromCentimetres(viewCm)).Dioptres, 1e-9);
        Tolerance.Within(er, VideoMagnifier.EnlargementNeeded(Power.FromDioptres(feq), Distance.FromCentimetres(viewCm)), 1e-9);
    }

    [Theory]
    // CV-24 (Ryan and Margrain 2006): 40 → 10 cm gives 4×; TV at 3 m instead of 6 m gives 2×. Exact.
    [InlineData(0.40, 0.10, 4.0)]
    [InlineData(6.0, 3.0, 2.0)]
    public void Relative_distance_magnification_is_old_over_new(double from, double to, double m) =>
        Tolerance.Within(m, RelativeDistance.Magnification(Distance.FromMetres(from), Distance.FromMetres(to)), 1e-9);
}

public class FieldOfViewTests
{
    [Theory]
    // CV-18 (derived from y = D/(zF); same example in course notes): 90 mm, +6 D, page at focus, eye 25 cm → 60 mm; 6 cm → 250 mm. ±1 %.
    [InlineData(25.0, 60.0)]
    [InlineData(6.0, 250.0)]
    public void A_90_mm_6_D_hand_magnifier_field_matches_CV18(double eyeCm, double fieldMm) =>
        Tolerance.WithinRelative(fieldMm, FieldOfView.LinearField(Distance.FromMillimetres(90), Distance.FromCentimetres(eyeCm), Power.FromDioptres(6)).Millimetres, 0.01);

    [Theory]
    // Methods §4.2 (derived): +20 D, 50 mm lens, page at focus: 10 mm field at 25 cm (≈ 6 characters of 1M, k = 1.1)
    // and 50 mm at 5 cm (≈ 31 characters). Field ±1 %; characters ±0.5 (the text rounds to whole characters).
    [InlineData(25.0, 10.0, 6.0)]
    [InlineData(5.0, 50.0, 31.0)]
    public void A_50_mm_20_D_lens_shows_the_methods_field_and_characters(double eyeCm, double fieldMm, double characters)
    {
        var field = FieldOfView.LinearField(Distance.FromMillimetres(50), Distance.FromCentimetres(eyeCm), Power.FromDioptres(20));
        Tolerance.WithinRelative(fieldMm, field.Millimetres, 0.01);
        Tolerance.Within(characters, FieldOfView.CharactersInView(field, PrintSize.FromM(1), 1.1), 0.5);
    }

    [Fact]
    public void For_a_stand_magnifier_the_finite_image_field_formula_equals_D_over_z_Feq()
    {
        // Derived (methods §4.1): y = D(z + |l′|)/(z·ER). CV-15 stand, eye 15 cm, 50 mm: 50·25/(15·3) = 27.8 mm. ±1 %.
        var stand = StandMagnifier.FromImagePosition(Distance.FromCentimetres(10), 3.0);
        var view = stand.ViewFrom(Distance.FromCentimetres(15));
        Tolerance.WithinRelative(50.0 * 25.0 / (15.0 * 3.0), FieldOfView.LinearField(Distance.FromMillimetres(50), Distance.FromCentimetres(15), view.EquivalentPower).Millimetres, 0.01);
    }
}

public class DepthOfFieldTests
{
    [Theory]
    // CV-20 (derived; 1/Feq² law, OVS 1994): +5 D with ΔF 0.8 D → 32.2 mm; +20 D with 0.5 D → 1.25 mm. Tolerance ±2 %.
    [InlineData(5.0, 0.8, 32.2)]
    [InlineData(20.0, 0.5, 1.25)]
    public void Depth_of_field_matches_CV20(double feq, double blur, double mm) =>
        Tolerance.WithinRelative(mm, DepthOfField.Exact(Power.FromDioptres(feq), Power.FromDioptres(blur)).Millimetres, 0.02);

    [Fact]
    public void The_approximation_gives_32_mm_for_5_D_and_0_8_D()
    {
        // Methods §4.4: ΔF/F² = 0.8/25 = 32 mm ("the same value appears in course notes"). ±2 %.
        Tolerance.WithinRelative(32.0, DepthOfField.Approximate(Power.FromDioptres(5), Power.FromDioptres(0.8)).Millimetres, 0.02);
    }
}

public class PrenticeTests
{
    [Fact]
    public void A_20_D_lens_viewed_1_cm_off_centre_gives_20_prism_dioptres_and_these_fringes()
    {
        // Methods §10.2 (derived; Prentice's rule, Abbe numbers from memory): 20 Δ; crown V 58 → 0.34 Δ; polycarbonate V 30 → 0.67 Δ.
        // Tolerance ±0.01 Δ (the text rounds to two decimals).
        var p = Prentice.PrismaticEffect(Distance.FromCentimetres(1), Power.FromDioptres(20));
        Tolerance.Within(20.0, p, 1e-9);
        Tolerance.Within(0.34, Prentice.ColourFringe(p, Prentice.CrownGlassAbbe), 0.01);
        Tolerance.Within(0.67, Prentice.ColourFringe(p, Prentice.PolycarbonateAbbe), 0.01);
    }
}
