namespace LowVisionAid.Data.Entities;

/// <summary>
/// A record edited by people who may work at the same time. SQLite has no rowversion, so the context gives
/// <see cref="Version"/> a new value on every save and EF Core checks it as a concurrency token.
/// </summary>
public interface IVersioned
{
    Guid Version { get; set; }

    DateTime CreatedUtc { get; set; }

    DateTime UpdatedUtc { get; set; }
}
