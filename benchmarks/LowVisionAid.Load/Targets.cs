namespace LowVisionAid.Load;

/// <summary>
/// What the harness measures. Each target names a record of the demo clinic, which is in both databases, so the
/// demo-versus-scale ratio compares the same page with more records around it.
/// </summary>
public static class Targets
{
    public static IReadOnlyList<Target> All { get; } =
    [
        new("Plan page", "Plans/1"),
        new("Client list", "Clients"),
        new("Search: exact code", "Clients?q=DEMO-01"),
        new("Search: code prefix", "Clients?q=DEMO"),
        new("Search: name fragment", "Clients?q=ines%20exa"),
        new("Client page", "Clients/1"),
        new("Follow-ups", "FollowUps"),
        new("Calculator page", "Calculator"),
        new("API plan", "api/plan", """{"distanceAcuity":"6/60","nearAcuity":"4M at 32 cm","targetPrint":"1M","workingDistance":"25 cm","age":"78"}"""),
        new("Handout PDF", "Plans/1/Handout"),
    ];
}
