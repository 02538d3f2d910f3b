namespace LowVisionAid.Optics.Notation;

/// <summary>
/// Approximate Jaeger equivalents as commonly printed on near cards used at 40 cm (methods §1.4; from memory,
/// card-dependent, ±1–2 lines). Jaeger numbers are catalogue numbers with no numerical value (Jose and Atcherson
/// 1977; Colenbrander and Runge 2007), so every use carries a warning. The M column follows from M = 0.4 × x / 20
/// for a 20/x equivalent at 40 cm (derived).
/// </summary>
internal static class JaegerTable
{
    private static readonly (string Label, double SnellenFeetDenominator, double M)[] Rows =
    [
        ("J1+", 20, 0.4),
        ("J1", 25, 0.5),
        ("J2", 30, 0.6),
        ("J3", 40, 0.8),
        ("J5", 50, 1.0),
        ("J7", 70, 1.4),
        ("J10", 100, 2.0),
        ("J16", 200, 4.0),
    ];

    /// <summary>The labels on the table, for messages.</summary>
    public static string Labels => string.Join(", ", Rows.Select(r => r.Label));

    /// <summary>Finds a label such as "J5" or "j1+" (case-insensitive).</summary>
    public static bool TryFind(string label, out string canonicalLabel, out double snellenFeetDenominator, out double m)
    {
        foreach (var row in Rows)
        {
            if (string.Equals(row.Label, label, StringComparison.OrdinalIgnoreCase))
            {
                (canonicalLabel, snellenFeetDenominator, m) = row;
                return true;
            }
        }

        (canonicalLabel, snellenFeetDenominator, m) = (label, 0, 0);
        return false;
    }
}
