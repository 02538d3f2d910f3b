using System.Collections.Immutable;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;

namespace LowVisionAid.Optics.Kit;

/// <summary>Computes each kit device's figures from its own specification and keeps those that meet the plan.</summary>
public static class KitMatcher
{
    /// <summary>
    /// The figures of one device for a plan, or null when the device's description is incomplete (see
    /// <see cref="KitDevice.Check"/>) or the device is not for this kind of task (near devices for distance viewing,
    /// distance telescopes for near tasks, or distance viewing without the acuities).
    /// </summary>
    public static MagnifierOption? FiguresFor(KitDevice device, OptionContext context)
    {
        ArgumentNullException.ThrowIfNull(device);
        ArgumentNullException.ThrowIfNull(context);
        var distanceTask = Ranking.IsDistanceTask(context.Request.Task);
        if (distanceTask != (device.Kind == DeviceKind.DistanceTelescope))
        {
            return null;
        }

        switch (device.Kind)
        {
            case DeviceKind.SpectacleAdd when device.EffectivePower is { } add && add.Dioptres > 0:
                return SpectacleAddOption.Create(context, add, device.Id);
            case DeviceKind.HandMagnifier when device.EffectivePower is { } lens && lens.Dioptres > 0 && device.Aperture is { } aperture && aperture.Metres > 0:
                return HandMagnifierOption.Create(context, lens, aperture, device.Illuminated, device.Id);
            case DeviceKind.StandMagnifier when device.ToStandMagnifier() is { } stand && device.Aperture is { } standAperture && standAperture.Metres > 0:
                return StandMagnifierOption.ForStand(context, stand, standAperture, device.Illuminated, device.Id);
            case DeviceKind.NearTelescope when device.Magnification is { } m && m > 1 && device.ReadingCap is { } cap && cap.Dioptres > 0:
                return NearTelescopeOption.ForTelescope(context, m, cap, device.Field, device.Id);
            case DeviceKind.VideoMagnifier when device.Magnification is { } max && max > 1:
                return VideoMagnifierOption.Create(context, max, device.Id);
            case DeviceKind.DistanceTelescope when device.Magnification is { } tm && tm > 1
                && context.Request.DistanceAcuity is { } current && context.Request.GoalDistanceAcuity is { } goal
                && (device.FocusNearest is not { } nearest || nearest.Metres <= context.Preferred):
                return DistanceTelescopeOption.Create(context, current, goal, tm, device.Field, device.Id);
            default:
                return null;
        }
    }

    /// <summary>The devices of the request's kit that meet the plan, ranked by the plan's rules.</summary>
    public static ImmutableArray<RankedOption> Match(OptionContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var kit = context.Request.Kit;
        if (kit.IsDefaultOrEmpty)
        {
            return [];
        }

        var meeting = new List<MagnifierOption>(kit.Length);
        foreach (var device in kit)
        {
            if (FiguresFor(device, context) is { IsApplicable: true, MeetsRequiredPower: true } option)
            {
                meeting.Add(option);
            }
        }

        return Ranking.Rank(meeting, context.Request);
    }
}
