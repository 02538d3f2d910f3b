namespace LowVisionAid.Data.Access;

/// <summary>The three roles. A teacher sees and records, but cannot delete or export client records.</summary>
public static class ClinicRoles
{
    public const string Clinician = "Clinician";
    public const string Teacher = "Teacher";
    public const string Administrator = "Administrator";

    public static IReadOnlyList<string> All { get; } = [Clinician, Teacher, Administrator];
}
