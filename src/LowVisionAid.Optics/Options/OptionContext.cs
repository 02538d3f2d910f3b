using LowVisionAid.Optics.Accommodation;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// The numbers every option builder needs, taken once from a <see cref="PlanRequest"/>. Immutable.
/// </summary>
public sealed class OptionContext
{
    /// <summary>Takes the numbers from a validated request.</summary>
    public OptionContext(PlanRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        Request = request;
        Settings = request.Settings;
        Constraints = request.Constraints;
        Required = request.RequiredPower?.Dioptres ?? throw new ArgumentException("The request has no required equivalent power; enter it in dioptres, e.g. 10.", nameof(request));
        Preferred = request.PreferredDistance.Abs().Metres;
        var constraints = request.Constraints;
        var myopia = Power.FromDioptres(Math.Min(0, constraints.DistanceRefraction.Dioptres));
        // Usable accommodation: as measured, else estimated from age by Hofstetter's minimum with half kept in reserve
        // (methods §10.1; the Accommodation module); a myope of −K D has a built-in add of +K (methods §3.2).
        if (constraints.UsableAccommodation is { } usable)
        {
            UsableAccommodation = Math.Max(0, usable.Dioptres);
            MyopicBuiltInAdd = -myopia.Dioptres;
        }
        else
        {
            var profile = constraints.AgeYears is { } age
                ? AccommodationProfile.FromAge(age, uncorrectedMyopia: myopia)
                : AccommodationProfile.None;
            UsableAccommodation = profile.UsableSustained.Dioptres;
            MyopicBuiltInAdd = constraints.AgeYears is null ? -myopia.Dioptres : profile.BuiltInAddFromMyopia.Dioptres;
            AccommodationEstimated = constraints.AgeYears is not null;
        }
        TwoEyes = request.Constraints.UsefulEyes >= 2;
        Add = request.Constraints.AddWorn is { } worn && worn.Dioptres > 0 ? worn.Dioptres : Settings.TypicalReadingAdd.Dioptres;
    }

    /// <summary>The request.</summary>
    public PlanRequest Request { get; }

    /// <summary>The settings.</summary>
    public PlanSettings Settings { get; }

    /// <summary>The constraints.</summary>
    public ClientConstraints Constraints { get; }

    /// <summary>Required equivalent power, D.</summary>
    public double Required { get; }

    /// <summary>Preferred working distance, m.</summary>
    public double Preferred { get; }

    /// <summary>Usable accommodation, D (0 when none).</summary>
    public double UsableAccommodation { get; }

    /// <summary>The built-in add of an uncorrected myope, +K for −K D (methods §2.7, §3.1).</summary>
    public double MyopicBuiltInAdd { get; }

    /// <summary>True when the usable accommodation was estimated from age rather than measured.</summary>
    public bool AccommodationEstimated { get; }

    /// <summary>True with two useful eyes.</summary>
    public bool TwoEyes { get; }

    /// <summary>The add used with magnifiers: the add worn, else the typical reading add, D.</summary>
    public double Add { get; }

    /// <summary>The device ranges and cost classes of the plan's settings.</summary>
    public DeviceRanges Ranges => Settings.Ranges;

    /// <summary>
    /// True when contrast sensitivity is reduced (below <see cref="Ranking.LowContrast"/>) or the home lighting is dim:
    /// magnifiers are then planned illuminated (Whittaker and Lovie-Kitchin 1994; methods §7.6).
    /// </summary>
    public bool WantsLight => Constraints.DimLighting || Constraints.LogContrastSensitivity is < Ranking.LowContrast;

    /// <summary>The wanted field for binocular use: 4 letters of the target print, the least for fluent reading (methods §4.3).</summary>
    internal Distance FewestLettersField => Distance.FromMillimetres(4 * Settings.CharacterPitch * Request.TargetPrint.XHeightMillimetres);

    /// <summary>
    /// Binocular use through one lens of aperture D with the pupils z from it and the image |l′| behind it (null at
    /// infinity): possible only with two useful eyes and when the lens is wider than the separation of the lines of
    /// sight plus the wanted field (Blommaert and Neve 1987; methods §11).
    /// </summary>
    internal bool BothEyesThroughOneLens(Distance aperture, Distance pupilToLens, Distance? imageBehindLens, Power equivalentPower) =>
        TwoEyes && BinocularLens.SharedField(aperture, Constraints.InterpupillaryDistance, pupilToLens, imageBehindLens, equivalentPower) >= FewestLettersField;

    /// <summary>Convergence for both eyes at an eye-to-target distance, by the one rule (spectacle plane).</summary>
    internal BinocularUse BothEyesAt(Distance eyeToTarget, double? prismEachEye = null) =>
        new(true, Convergence.AtSpectaclePlane(Constraints.InterpupillaryDistance, eyeToTarget), prismEachEye);

    internal bool Meets(double delivered) => delivered >= Required * Settings.PowerTolerance;

    internal bool Meets(double delivered, double required) => delivered >= required * Settings.PowerTolerance;

    internal double Characters(Distance field) => FieldOfView.CharactersInView(field, Request.TargetPrint, Settings.CharacterPitch);

    internal FluencyWarning Fluency(double? characters) => characters switch
    {
        null => FluencyWarning.None,
        < 4 => FluencyWarning.FewerThanFour,
        < 10 when Request.Task == ReadingTask.SustainedReading => FluencyWarning.FewerThanTenForSustainedReading,
        _ => FluencyWarning.None,
    };

    /// <summary>Exact depth of field at a focusing power, or null when it reaches to infinity.</summary>
    internal Distance? DepthOfField(double power) => DepthOfField(power, Settings.BlurTolerance.Dioptres);

    internal static Distance? DepthOfField(double power, double blur) => power > blur / 2
        ? Devices.DepthOfField.Exact(Power.FromDioptres(power), Power.FromDioptres(blur))
        : null;

    internal double AddNeededAt(double focusingPower) => RoundUpToQuarter(Math.Max(0, focusingPower - UsableAccommodation));

    internal static double RoundUpToQuarter(double dioptres) => Math.Ceiling((dioptres * 4.0) - 1e-9) / 4.0;

    internal static Distance Metres(double metres) => Distance.FromMetres(metres);

    internal static Power Dioptres(double dioptres) => Power.FromDioptres(dioptres);
}
