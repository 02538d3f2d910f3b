using System.Diagnostics;

namespace LowVisionAid.Reports.Tests.Support;

/// <summary>Writes test artefacts under the repository's git-ignored <c>test-artifacts/reports/</c>.</summary>
internal static class Artifacts
{
    public static string Directory { get; } = Create();

    public static string Write(string fileName, ReadOnlyMemory<byte> content)
    {
        var path = Path.Combine(Directory, fileName);
        File.WriteAllBytes(path, content.ToArray());
        return path;
    }

    /// <summary>Renders the first page of a PDF to <c>name-1.png</c> with pdftoppm; returns the PNG path.</summary>
    public static string RenderFirstPage(string pdfPath, int dpi = 72)
    {
        var prefix = Path.Combine(Directory, Path.GetFileNameWithoutExtension(pdfPath));
        var start = new ProcessStartInfo(Pdftoppm.Path!)
        {
            ArgumentList = { "-png", "-r", dpi.ToString(CultureInfo.InvariantCulture), "-f", "1", "-l", "1", "-singlefile", pdfPath, prefix },
            RedirectStandardError = true,
        };
        using var process = Process.Start(start) ?? throw new InvalidOperationException("pdftoppm did not start.");
        var errors = process.StandardError.ReadToEnd();
        process.WaitForExit();
        if (process.ExitCode != 0)
            throw new InvalidOperationException($"pdftoppm failed ({process.ExitCode}): {errors}");
        return prefix + ".png";
    }

    private static string Create()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "LowVisionAid.sln")))
            dir = dir.Parent;
        var root = dir?.FullName ?? Path.GetTempPath();
        var path = Path.Combine(root, "test-artifacts", "reports");
        System.IO.Directory.CreateDirectory(path);
        return path;
    }
}

/// <summary>Where pdftoppm (Debian poppler-utils) is, if installed.</summary>
internal static class Pdftoppm
{
    public const string MissingMessage =
        "pdftoppm is not installed, so the PNG render step is skipped. Install Debian's poppler-utils (scripts/test.sh does) to render it.";

    public static string? Path { get; } = Find();

    private static string? Find() => (Environment.GetEnvironmentVariable("PATH") ?? string.Empty)
        .Split(System.IO.Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries)
        .Select(dir => System.IO.Path.Combine(dir, "pdftoppm"))
        .FirstOrDefault(File.Exists);
}

/// <summary>A fact that is skipped, with <see cref="Pdftoppm.MissingMessage"/>, when pdftoppm is missing.</summary>
[AttributeUsage(AttributeTargets.Method)]
internal sealed class NeedsPdftoppmFactAttribute : FactAttribute
{
    public NeedsPdftoppmFactAttribute()
    {
        if (Pdftoppm.Path is null)
            Skip = Pdftoppm.MissingMessage;
    }
}
