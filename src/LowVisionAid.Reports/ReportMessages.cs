namespace LowVisionAid.Reports;

/// <summary>The messages a failed <see cref="ReportResult"/> carries, written to be shown on screen as they are.</summary>
public static class ReportMessages
{
    /// <summary>The plan has no chosen device option.</summary>
    public const string NoChosenOption =
        "This plan has no chosen option yet, so there is nothing to print. Choose at least one device option on the plan page, then print again.";

    /// <summary>The client code is missing.</summary>
    public const string NoClientCode = "The client code is missing. Every report needs the client's code; save the client's record first.";

    /// <summary>The clinic's name or telephone number is missing.</summary>
    public const string NoClinicContact =
        "The clinic's name and telephone number are missing. Enter them in the clinic settings so the client knows whom to call.";

    /// <summary>A device has no name.</summary>
    public const string UnnamedDevice = "A chosen option has no name. Give every chosen option a name on the plan page.";

    /// <summary>The body size is outside what the handout accepts.</summary>
    public const string BodySizeOutOfRange =
        "The handout text size must be between 18 pt and 48 pt. Choose 18 pt (large print) or 24 pt (larger print).";

    /// <summary>The target print size is outside what the check line can show.</summary>
    public const string TargetOutOfRange =
        "The target print size must be between 0.4M and 10M to print the check line. Enter the target print size on the plan page.";

    /// <summary>The method version is missing from a clinician summary.</summary>
    public const string NoMethodVersion = "The method version is missing. The clinical record must say which version of the methods was used.";

    /// <summary>Every device the handout would describe was declined at its trial.</summary>
    public const string OnlyDeclinedDevices =
        "Every device chosen for this handout was declined at its trial, so there is nothing to give the client. Choose the device the client is taking home on the plan page, then print again.";

    /// <summary>
    /// What every report needs before it is drawn: at least one chosen device, each named, the client's code and the
    /// clinic's name and phone. Null when all are there, else the message for the first one missing.
    /// </summary>
    public static string? MissingCommon(IEnumerable<string?>? chosenNames, string? clientCode, ClinicContact? clinic)
    {
        var names = chosenNames?.ToList();
        if (names is null || names.Count == 0)
            return NoChosenOption;
        if (names.Exists(string.IsNullOrWhiteSpace))
            return UnnamedDevice;
        if (string.IsNullOrWhiteSpace(clientCode))
            return NoClientCode;
        if (clinic is null || string.IsNullOrWhiteSpace(clinic.Name) || string.IsNullOrWhiteSpace(clinic.Phone))
            return NoClinicContact;
        return null;
    }
}
