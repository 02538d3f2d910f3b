namespace LowVisionAid.Reports.Pdf;

/// <summary>Download names that are safe on every file system.</summary>
internal static class FileNames
{
    public static string For(string kind, string clientCode)
    {
        var safe = new string([.. clientCode.Trim().Select(c => char.IsAsciiLetterOrDigit(c) || c is '-' or '_' ? c : '-')]);
        return kind + "-" + (safe.Length == 0 ? "client" : safe) + ".pdf";
    }
}
