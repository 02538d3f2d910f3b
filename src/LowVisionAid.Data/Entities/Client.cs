namespace LowVisionAid.Data.Entities;

/// <summary>A person seen by the clinic, known by the clinic's own pseudonymous code; the name is optional.</summary>
public sealed class Client : IVersioned
{
    public int Id { get; set; }

    public required string Code { get; set; }

    public string? Name { get; set; }

    public int? YearOfBirth { get; set; }

    public string? Notes { get; set; }

    /// <summary>
    /// The date of the client's latest visit, kept by the database context whenever a visit is added, changed or
    /// removed (so the client list can be ordered by an index instead of by a maximum computed per client).
    /// </summary>
    public DateOnly? LastVisitDate { get; set; }

    /// <summary>Code and name folded for searching (<see cref="ClientSearch.Fold"/>), kept by the database context.</summary>
    public string SearchText { get; set; } = "";

    /// <summary>True for the invented demo clinic's records, which Settings can remove.</summary>
    public bool IsDemo { get; set; }

    public Guid Version { get; set; }

    public DateTime CreatedUtc { get; set; }

    public DateTime UpdatedUtc { get; set; }

    public List<Visit> Visits { get; } = [];
}
