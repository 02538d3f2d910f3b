using LowVisionAid.Optics.Planning;

namespace LowVisionAid.Data.Entities;

/// <summary>A device tried with the client, what it achieved, what was decided, and when to follow up.</summary>
public sealed class Trial : IVersioned
{
    public int Id { get; set; }

    public int PlanId { get; set; }

    public Plan? Plan { get; set; }

    public DateOnly TrialDate { get; set; }

    public int? KitDeviceId { get; set; }

    public KitDevice? KitDevice { get; set; }

    /// <summary>The device as typed, or the kit device's name at the time of the trial.</summary>
    public required string DeviceDescription { get; set; }

    public GoalTask? Task { get; set; }

    /// <summary>Acuity or print size reached with the device, as typed.</summary>
    public string? ResultText { get; set; }

    public int? ResultWordsPerMinute { get; set; }

    public string? ClientComment { get; set; }

    public TrialOutcome Outcome { get; set; }

    public DateOnly? FollowUpDue { get; set; }

    public DateOnly? FollowUpDone { get; set; }

    public Guid Version { get; set; }

    public DateTime CreatedUtc { get; set; }

    public DateTime UpdatedUtc { get; set; }
}

/// <summary>What was decided after the trial.</summary>
public enum TrialOutcome
{
    Dispensed,
    Loaned,
    Ordered,
    Declined,
}
