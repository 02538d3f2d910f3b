namespace LowVisionAid.Reports.Tests.Support;

/// <summary>
/// Writes a rendered PDF to the folder named by the LVA_REPORT_PREVIEW environment variable, for a developer to
/// render with pdftoppm and look at; does nothing when it is unset (as in CI). Never inside the repository.
/// </summary>
internal static class Preview
{
    public static void Write(string name, ReadOnlyMemory<byte> pdf)
    {
        var folder = Environment.GetEnvironmentVariable("LVA_REPORT_PREVIEW");
        if (string.IsNullOrWhiteSpace(folder))
            return;
        Directory.CreateDirectory(folder);
        File.WriteAllBytes(Path.Combine(folder, name + ".pdf"), pdf.ToArray());
    }
}
