using System.Globalization;

namespace LowVisionAid.Data.Entities;

/// <summary>Which list of a stored plan's goal an option is in.</summary>
public enum PlanOptionList
{
    /// <summary>The planner's options for the goal (by kind of device).</summary>
    Options,

    /// <summary>The clinic's kit devices that match the goal.</summary>
    KitDevices,
}

/// <summary>
/// One option of a stored plan, named by where it sits in the plan's outputs: the goal, the list and its place in
/// that list (all from 0). The outputs never change after the plan is made, so the place always names the same option.
/// </summary>
public readonly record struct PlanOptionRef(int Goal, PlanOptionList List, int Index)
{
    /// <summary>The option as text, such as <c>0:KitDevices:1</c>: its stored form, and the value of its choice button.</summary>
    public string Key => string.Create(CultureInfo.InvariantCulture, $"{Goal}:{List}:{Index}");

    /// <summary>
    /// Reads <see cref="Key"/>'s form; false for anything else (a missing or negative number, a list that is not
    /// named exactly, extra parts).
    /// </summary>
    public static bool TryParse(string? text, out PlanOptionRef option)
    {
        option = default;
        var bits = (text ?? "").Trim().Split(':');
        if (bits.Length == 3
            && int.TryParse(bits[0], NumberStyles.None, CultureInfo.InvariantCulture, out var goal)
            && Enum.TryParse<PlanOptionList>(bits[1], ignoreCase: false, out var list) && Enum.IsDefined(list)
            && string.Equals(list.ToString(), bits[1], StringComparison.Ordinal)
            && int.TryParse(bits[2], NumberStyles.None, CultureInfo.InvariantCulture, out var index))
        {
            option = new PlanOptionRef(goal, list, index);
            return true;
        }

        return false;
    }
}

/// <summary>
/// The options the clinician chose for the handout, at most one for each goal. Immutable. Kept apart from the
/// plan's outputs, which stay exactly as they were made; stored as text such as <c>0:KitDevices:1;1:Options:0</c>.
/// </summary>
public sealed class PlanChoices : IEquatable<PlanChoices>
{
    private readonly PlanOptionRef[] _options;

    private PlanChoices(IEnumerable<PlanOptionRef> options)
    {
        _options = [.. options.OrderBy(o => o.Goal)];
        Stored = string.Join(';', _options.Select(o => o.Key));
    }

    /// <summary>Nothing chosen.</summary>
    public static PlanChoices None { get; } = new([]);

    /// <summary>The chosen options, in goal order.</summary>
    public IReadOnlyList<PlanOptionRef> Options => _options;

    public bool IsEmpty => _options.Length == 0;

    /// <summary>The stored form (empty when nothing is chosen).</summary>
    public string Stored { get; }

    /// <summary>The option chosen for a goal, or null.</summary>
    public PlanOptionRef? ForGoal(int goal) => _options.Any(o => o.Goal == goal) ? _options.First(o => o.Goal == goal) : null;

    /// <summary>True when exactly this option is chosen.</summary>
    public bool Contains(PlanOptionRef option) => _options.Contains(option);

    /// <summary>These choices with <paramref name="option"/> chosen for its goal, in place of any earlier choice for it.</summary>
    public PlanChoices With(PlanOptionRef option)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(option.Goal);
        ArgumentOutOfRangeException.ThrowIfNegative(option.Index);
        return new([.. _options.Where(o => o.Goal != option.Goal), option]);
    }

    /// <summary>These choices with nothing chosen for <paramref name="goal"/>.</summary>
    public PlanChoices Without(int goal) => new(_options.Where(o => o.Goal != goal));

    /// <summary>Reads the stored form; a part that cannot be read (or a second choice for a goal) is skipped.</summary>
    public static PlanChoices FromStored(string? stored)
    {
        var options = new List<PlanOptionRef>();
        foreach (var part in (stored ?? "").Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            if (PlanOptionRef.TryParse(part, out var option) && !options.Exists(o => o.Goal == option.Goal))
            {
                options.Add(option);
            }
        }

        return options.Count == 0 ? None : new(options);
    }

    public bool Equals(PlanChoices? other) => other is not null && string.Equals(Stored, other.Stored, StringComparison.Ordinal);

    public override bool Equals(object? obj) => Equals(obj as PlanChoices);

    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Stored);

    public override string ToString() => Stored;
}
