namespace LowVisionAid.Reports;

/// <summary>How a client or colleague reaches the clinic; printed on every report.</summary>
/// <param name="Name">The clinic's name.</param>
/// <param name="Phone">A telephone number, as it should be printed.</param>
/// <param name="Email">An e-mail address, or null.</param>
/// <param name="Address">A postal address on one line, or null.</param>
public sealed record ClinicContact(string Name, string Phone, string? Email = null, string? Address = null);
