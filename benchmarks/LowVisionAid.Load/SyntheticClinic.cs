using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Planning;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Load;

/// <summary>How many synthetic records to add.</summary>
public sealed record SyntheticSize(int Clients, int Visits, int Plans, int Trials)
{
    /// <summary>The clinic-group scale the performance goals are set for.</summary>
    public static SyntheticSize ClinicGroup { get; } = new(100_000, 500_000, 200_000, 50_000);
}

/// <summary>
/// Adds a synthetic clinic to a database that already holds the demo clinic: clients coded SYN-000001 onwards with
/// made-up names (syllables, some accented, never a real person's), visits spread over ten years, plans that copy the
/// stored inputs and outputs of the demo plans (so the plan page has real figures to show), and trials with
/// follow-ups. Deterministic (a fixed seed). Written through the app's own context, so the stored latest-visit date
/// and search text are kept as the app keeps them.
/// </summary>
public static class SyntheticClinic
{
    public const string CodePrefix = "SYN-";

    private static readonly string[] First = ["Ala", "Bren", "Cor", "Dav", "Eli", "Fen", "Gia", "Hol", "Ira", "Jö", "Kae", "Lio", "Mar", "Nè", "Oli", "Pía", "Quin", "Ros", "Sel", "Tam", "Ulf", "Vé", "Wyn", "Xan", "Yara", "Zoë"];
    private static readonly string[] Second = ["na", "dric", "wen", "ra", "mi", "lo", "sse", "tor", "ny", "beth", "vik", "lle"];
    private static readonly string[] Family = ["Abernach", "Brunnström", "Calloway", "Duvernay", "Eskeland", "Fairholm", "Gaudé", "Hollins", "Ibarrola", "Jessop", "Kowalczyk", "Lindqvist", "Marchetti", "Nørgaard", "Okonkwo", "Pettersen", "Quintal", "Rasmussen", "Szabó", "Thornbury", "Urquhart", "Valdés", "Whitlock", "Yilmazer", "Zarević"];

    /// <summary>Adds the records in batches; returns how long it took.</summary>
    public static async Task<TimeSpan> AddAsync(string dataFolder, SyntheticSize size, Action<string> progress, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(size);
        ArgumentNullException.ThrowIfNull(progress);
        var started = System.Diagnostics.Stopwatch.StartNew();
        var builder = new DbContextOptionsBuilder<ClinicDbContext>();
        builder.UseClinicSqlite(ClinicDatabase.ConnectionStringFor(dataFolder));
        var options = builder.Options;
        List<(string Version, string Inputs, string Outputs)> templates;
        await using (var db = new ClinicDbContext(options))
        {
            await db.UpgradeAsync(ct);
            if (await db.Clients.AnyAsync(c => c.Code.StartsWith(CodePrefix), ct))
            {
                throw new InvalidOperationException($"The database in {dataFolder} already holds synthetic clients; start from a copy of the demo clinic's database.");
            }

            templates = [.. (await db.Plans.AsNoTracking().OrderBy(p => p.Id).ToListAsync(ct)).Select(p => (p.MethodVersion, p.InputsJson, p.OutputsJson))];
            if (templates.Count == 0 && size.Plans > 0)
            {
                throw new InvalidOperationException("The database holds no plan to copy: start the app once on this folder with the demo clinic loaded.");
            }
        }

        var random = new Random(20261203);
        var firstDay = new DateOnly(2016, 12, 1);
        var visitsLeft = size.Visits;
        var plansLeft = size.Plans;
        var trialsLeft = size.Trials;
        var visitsToGo = size.Visits;
        const int batch = 2_000;
        for (var start = 0; start < size.Clients; start += batch)
        {
            await using var db = new ClinicDbContext(options);
            db.ChangeTracker.AutoDetectChangesEnabled = false;
            var count = Math.Min(batch, size.Clients - start);
            for (var i = 0; i < count; i++)
            {
                var n = start + i + 1;
                var clientsLeft = size.Clients - n + 1;
                var client = new Client
                {
                    Code = $"{CodePrefix}{n:000000}",
                    Name = random.Next(10) == 0 ? null : $"{Pick(random, First)}{Pick(random, Second)} {Pick(random, Family)}",
                    YearOfBirth = 1930 + random.Next(85),
                };
                var visits = Share(visitsLeft, clientsLeft, random);
                visitsLeft -= visits;
                var day = firstDay.AddDays(random.Next(3000));
                for (var v = 0; v < visits; v++)
                {
                    day = day.AddDays(30 + random.Next(200));
                    var visit = new Visit { VisitDate = day, Practitioner = "Synthetic", DistanceBothText = "6/60" };
                    // A plan on this visit with the chance that spreads the plans left over the visits left.
                    var planned = random.NextDouble() * visitsToGo < plansLeft;
                    visitsToGo--;
                    if (planned)
                    {
                        plansLeft--;
                        var t = templates[random.Next(templates.Count)];
                        var plan = new Plan { MethodVersion = t.Version, InputsJson = t.Inputs, OutputsJson = t.Outputs, CreatedUtc = day.ToDateTime(new TimeOnly(10, 0), DateTimeKind.Utc) };
                        if (random.NextDouble() * (plansLeft + 1) < trialsLeft)
                        {
                            trialsLeft--;
                            plan.Trials.Add(new Trial
                            {
                                TrialDate = day,
                                DeviceDescription = "Synthetic stand magnifier +12 D",
                                Task = GoalTask.Book,
                                Outcome = TrialOutcome.Loaned,
                                FollowUpDue = day.AddDays(28),
                                FollowUpDone = random.Next(10) == 0 ? null : day.AddDays(30),
                            });
                        }

                        visit.Plans.Add(plan);
                    }

                    client.Visits.Add(visit);
                }

                db.Clients.Add(client);
            }

            db.ChangeTracker.DetectChanges();
            await db.SaveChangesAsync(ct);
            if ((start / batch) % 10 == 0)
            {
                progress($"{start + count:N0} synthetic clients written ({started.Elapsed.TotalSeconds:0} s)");
            }
        }

        return started.Elapsed;
    }

    private static string Pick(Random random, string[] from) => from[random.Next(from.Length)];

    // An even share of what is left, give or take one, so the totals come out exact.
    private static int Share(int left, int among, Random random)
    {
        if (left <= 0 || among <= 0)
        {
            return 0;
        }

        var mean = (double)left / among;
        var whole = (int)Math.Floor(mean);
        var share = whole + (random.NextDouble() < mean - whole ? 1 : 0);
        return Math.Min(share, left);
    }
}
