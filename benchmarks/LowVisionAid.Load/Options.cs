using System.Globalization;

namespace LowVisionAid.Load;

/// <summary>The harness's settings, from its command line.</summary>
/// <param name="App">The LowVisionAid.Web.dll to run; null for the Release build in the project's bin folder.</param>
public sealed record Options(string Out, int Requests, SyntheticSize Size, bool Reuse = false, string? App = null)
{
    public static Options Parse(string[] args)
    {
        var values = new Dictionary<string, string>(StringComparer.Ordinal);
        for (var i = 0; i < args.Length; i++)
        {
            if (args[i].StartsWith("--", StringComparison.Ordinal) && i + 1 < args.Length)
            {
                values[args[i][2..]] = args[++i];
            }
        }

        int Number(string name, int fallback) => values.TryGetValue(name, out var v) ? int.Parse(v, NumberStyles.Integer, CultureInfo.InvariantCulture) : fallback;
        var size = SyntheticSize.ClinicGroup;
        return new Options(
            values.GetValueOrDefault("out", "test-artifacts/load"),
            Number("requests", 200),
            new SyntheticSize(Number("clients", size.Clients), Number("visits", size.Visits), Number("plans", size.Plans), Number("trials", size.Trials)),
            values.TryGetValue("reuse", out var reuse) && bool.Parse(reuse),
            values.GetValueOrDefault("app"));
    }

    /// <summary>The folder that holds LowVisionAid.sln, found from the working folder upwards.</summary>
    public static string RepositoryRoot()
    {
        for (var folder = new DirectoryInfo(Environment.CurrentDirectory); folder is not null; folder = folder.Parent)
        {
            if (File.Exists(Path.Combine(folder.FullName, "LowVisionAid.sln")))
            {
                return folder.FullName;
            }
        }

        throw new InvalidOperationException("Run the harness from inside the repository (LowVisionAid.sln not found above the working folder).");
    }
}
