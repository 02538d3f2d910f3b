using Microsoft.Data.Sqlite;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>A fresh folder under the system temp folder, deleted (with its SQLite files) on dispose.</summary>
public sealed class TempFolder : IDisposable
{
    public TempFolder(string purpose)
    {
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "lva-" + purpose + "-" + Guid.NewGuid().ToString("N")[..8]);
        Directory.CreateDirectory(Path);
    }

    public string Path { get; }

    public string DatabasePath => System.IO.Path.Combine(Path, LowVisionAid.Data.ClinicDatabase.FileName);

    public void Dispose()
    {
        SqliteConnection.ClearAllPools();
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
            // A process killed by a crash test may still be releasing the file; the OS temp cleaner takes it later.
        }
    }
}
