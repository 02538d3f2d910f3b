using System.Collections.Immutable;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Kit;

/// <summary>The kinds of device a clinic keeps.</summary>
public enum DeviceKind
{
    /// <summary>Spectacle-mounted high add (single lens per eye, or one eye).</summary>
    SpectacleAdd = 1,

    /// <summary>Hand-held plus lens.</summary>
    HandMagnifier = 2,

    /// <summary>Plus lens on a stand at a fixed height above the page.</summary>
    StandMagnifier = 3,

    /// <summary>Telescope with a reading cap for near (telemicroscope).</summary>
    NearTelescope = 4,

    /// <summary>Telescope for distance tasks.</summary>
    DistanceTelescope = 5,

    /// <summary>Electronic (video) magnifier or screen enlargement.</summary>
    VideoMagnifier = 6,
}

/// <summary>A magnifier "×" label together with the convention it follows. A "×" alone is never accepted.</summary>
/// <param name="Times">The labelled magnification, e.g. 3 for "3×".</param>
/// <param name="Convention">The convention the maker used.</param>
public readonly record struct KitLabel(double Times, LabelConvention Convention)
{
    /// <summary>The equivalent power the label implies under its convention.</summary>
    public Power ImpliedPower => MagnifierLabel.PowerFromLabel(Times, Convention);
}

/// <summary>One thing wrong with a device description: the field and a message saying what to enter instead.</summary>
/// <param name="Field">The property (and CSV column) at fault.</param>
/// <param name="Message">What is wrong and what to enter.</param>
public readonly record struct KitProblem(string Field, string Message);

/// <summary>
/// One device in the clinic's catalogue, as the clinic describes it. Immutable. Only the fields its kind needs
/// must be given; <see cref="Check"/> says what is missing.
/// </summary>
public sealed record KitDevice
{
    /// <summary>The clinic's own identifier (unique in the catalogue).</summary>
    public required string Id { get; init; }

    /// <summary>A plain description, e.g. "Hand lens, 12 D, 50 mm".</summary>
    public required string Name { get; init; }

    /// <summary>The kind of device.</summary>
    public required DeviceKind Kind { get; init; }

    /// <summary>Equivalent power (lens, add) in dioptres; for a stand magnifier the lens power.</summary>
    public Power? Power { get; init; }

    /// <summary>The "×" label with its convention, used only when <see cref="Power"/> is not given.</summary>
    public KitLabel? Label { get; init; }

    /// <summary>Clear lens aperture (diameter).</summary>
    public Distance? Aperture { get; init; }

    /// <summary>Stand height: page to lens (stand magnifiers).</summary>
    public Distance? StandHeight { get; init; }

    /// <summary>Image position below the lens as the maker states it (stand magnifiers).</summary>
    public Distance? ImageBelowLens { get; init; }

    /// <summary>Enlargement ratio as the maker states it (stand magnifiers).</summary>
    public double? EnlargementRatio { get; init; }

    /// <summary>Telescope magnification, or the largest screen enlargement of a video magnifier.</summary>
    public double? Magnification { get; init; }

    /// <summary>Reading cap power (near telescopes).</summary>
    public Power? ReadingCap { get; init; }

    /// <summary>Real angular field (telescopes), if the maker states it.</summary>
    public VisualAngle? Field { get; init; }

    /// <summary>Nearest focus distance (telescopes), or null if fixed at infinity.</summary>
    public Distance? FocusNearest { get; init; }

    /// <summary>Built-in illumination.</summary>
    public bool Illuminated { get; init; }

    /// <summary>Free notes.</summary>
    public string? Notes { get; init; }

    /// <summary>The device's equivalent power in dioptres: <see cref="Power"/>, else the label read by its convention.</summary>
    public Power? EffectivePower => Power ?? (Label is { } label && label.Times > (label.Convention == LabelConvention.Trade ? 1 : 0) ? label.ImpliedPower : null);

    /// <summary>
    /// What is missing or wrong for this kind of device, each with the field and what to enter instead; empty when
    /// the description is complete.
    /// </summary>
    public ImmutableArray<KitProblem> Check()
    {
        var problems = ImmutableArray.CreateBuilder<KitProblem>();
        if (string.IsNullOrWhiteSpace(Id))
        {
            problems.Add(new(nameof(Id), "Enter an identifier for the device, e.g. H-12."));
        }

        if (string.IsNullOrWhiteSpace(Name))
        {
            problems.Add(new(nameof(Name), "Enter a short description, e.g. \"Hand lens 12 D\"."));
        }

        if (Power is { } p && !(p.Dioptres > 0) && Kind != DeviceKind.VideoMagnifier && Kind != DeviceKind.DistanceTelescope)
        {
            problems.Add(new(nameof(Power), "The power must be a plus value in dioptres, e.g. 12."));
        }

        if (Label is { } l && !(double.IsFinite(l.Times) && l.Times > (l.Convention == LabelConvention.Trade ? 1 : 0)))
        {
            problems.Add(new(nameof(Label), "A label must be a number above 0 (above 1 for the trade convention), e.g. 3 for \"3×\"."));
        }

        switch (Kind)
        {
            case DeviceKind.SpectacleAdd:
                RequirePower(problems);
                break;
            case DeviceKind.HandMagnifier:
                RequirePower(problems);
                RequirePositive(problems, Aperture, nameof(Aperture), "Enter the clear lens aperture in millimetres, e.g. 50.");
                break;
            case DeviceKind.StandMagnifier:
                RequirePositive(problems, Aperture, nameof(Aperture), "Enter the clear lens aperture in millimetres, e.g. 50.");
                CheckStand(problems);
                break;
            case DeviceKind.NearTelescope:
                RequireMagnification(problems);
                if (ReadingCap is not { } cap || !(cap.Dioptres > 0))
                {
                    problems.Add(new(nameof(ReadingCap), "Enter the reading cap power in dioptres, e.g. 4."));
                }

                break;
            case DeviceKind.DistanceTelescope:
                RequireMagnification(problems);
                break;
            case DeviceKind.VideoMagnifier:
                RequireMagnification(problems);
                break;
            default:
                problems.Add(new(nameof(Kind), "Choose the kind of device."));
                break;
        }

        return problems.ToImmutable();
    }

    private void RequirePower(ImmutableArray<KitProblem>.Builder problems)
    {
        if (Power is null && Label is null)
        {
            problems.Add(new(nameof(Power), "Enter the power in dioptres (e.g. 12), or the \"×\" label with its convention; a \"×\" alone is not enough."));
        }
    }

    private void RequireMagnification(ImmutableArray<KitProblem>.Builder problems)
    {
        if (Magnification is not { } m || !(double.IsFinite(m) && m > 1))
        {
            problems.Add(new(nameof(Magnification), "Enter the magnification as a number above 1, e.g. 3 for 3×."));
        }
    }

    private void CheckStand(ImmutableArray<KitProblem>.Builder problems)
    {
        var byImage = ImageBelowLens is not null || EnlargementRatio is not null;
        if (byImage)
        {
            RequirePositive(problems, ImageBelowLens, nameof(ImageBelowLens), "Enter the image position below the lens in centimetres, e.g. 10, with the enlargement ratio.");
            if (EnlargementRatio is not { } er || !(double.IsFinite(er) && er > 1))
            {
                problems.Add(new(nameof(EnlargementRatio), "Enter the enlargement ratio as a number above 1, e.g. 3, with the image position."));
            }

            return;
        }

        if (Power is null)
        {
            problems.Add(new(nameof(Power), "A stand magnifier needs its lens power in dioptres and stand height, or the image position and enlargement ratio; a \"×\" label is not reliable for stand magnifiers."));
        }

        RequirePositive(problems, StandHeight, nameof(StandHeight), "Enter the stand height (page to lens) in centimetres, e.g. 3.3.");
        if (Power is { } f && StandHeight is { } h && f.Dioptres > 0 && h.Metres * f.Dioptres >= 1)
        {
            problems.Add(new(nameof(StandHeight), "The stand height must be less than the lens focal length (1/F); check the height and the power."));
        }
    }

    private static void RequirePositive(ImmutableArray<KitProblem>.Builder problems, Distance? value, string field, string message)
    {
        if (value is not { } d || !(d.Metres > 0))
        {
            problems.Add(new(field, message));
        }
    }

    /// <summary>The stand magnifier this device describes, or null when its description is incomplete or not a stand.</summary>
    public StandMagnifier? ToStandMagnifier()
    {
        if (Kind != DeviceKind.StandMagnifier)
        {
            return null;
        }

        if (ImageBelowLens is { } image && EnlargementRatio is { } er && image.Metres > 0 && er > 1)
        {
            return StandMagnifier.FromImagePosition(image, er);
        }

        return Power is { } f && StandHeight is { } h && f.Dioptres > 0 && h.Metres > 0 && h.Metres * f.Dioptres < 1
            ? StandMagnifier.FromLensAndHeight(f, h)
            : null;
    }
}
