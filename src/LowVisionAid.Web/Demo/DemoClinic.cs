using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Planning;
using DeviceKind = LowVisionAid.Optics.Kit.DeviceKind;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Web.Plans;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Demo;

/// <summary>
/// An invented clinic, so that a newcomer lands in a working app. Every person and figure here is made up;
/// the records are marked as demo and Settings removes them.
/// </summary>
public sealed class DemoClinic(ClinicDbContext db, Infrastructure.ClinicCalendar calendar, MakePlanHandler makePlan, ChoosePlanOptionHandler choose)
{
    public const string ClinicName = "Harbour Lane Low Vision Clinic (demo)";

    /// <summary>Loads the demo clinic when the database has never been set up (no settings row yet).</summary>
    public async Task<bool> LoadIntoEmptyDatabaseAsync(CancellationToken ct)
    {
        if (await db.Settings.AnyAsync(ct).ConfigureAwait(false))
        {
            return false;
        }

        var today = calendar.Today;
        db.Settings.Add(DefaultSettings(ClinicName, hasDemoData: true));
        db.KitDevices.AddRange(Kit());
        db.Clients.AddRange(Clients(today));
        await db.SaveChangesAsync(ct).ConfigureAwait(false);

        // Plans are made by the real planner from the demo visits, as a clinician would make them.
        var visits = await db.Visits.Where(v => v.Client!.IsDemo).OrderBy(v => v.Id).Select(v => new { v.Id, v.VisitDate }).ToListAsync(ct).ConfigureAwait(false);
        var planIds = new List<int>();
        foreach (var visit in visits)
        {
            if (await makePlan.HandleAsync(visit.Id, ct).ConfigureAwait(false) is { PlanId: { } planId })
            {
                planIds.Add(planId);
            }
        }

        if (planIds.Count > 0)
        {
            var lens = await db.KitDevices.FirstAsync(k => k.Code == "HM-12L", ct).ConfigureAwait(false);
            db.Trials.Add(new Trial
            {
                PlanId = planIds[0],
                TrialDate = visits[0].VisitDate,
                KitDeviceId = lens.Id,
                DeviceDescription = $"{lens.Name} ({lens.Code})",
                Task = GoalTask.Newspaper,
                ResultText = "1M",
                ResultWordsPerMinute = 68,
                ClientComment = "Invented demo comment: the light helps.",
                Outcome = TrialOutcome.Loaned,
                FollowUpDue = today.AddDays(7),
            });
            await db.SaveChangesAsync(ct).ConfigureAwait(false);
            await ChooseForHandoutsAsync(planIds, ct).ConfigureAwait(false);
        }

        return true;
    }

    /// <summary>
    /// The demo clinician's choices for the handouts: for the first client, the lit +12 D magnifier she has on loan
    /// wherever her plan lists it (her medication labels); otherwise the first suitable kit device (or planner
    /// option) of each goal. The third plan is left without a
    /// choice, so the demo also shows what the handout says when nothing is chosen yet.
    /// </summary>
    private async Task ChooseForHandoutsAsync(List<int> planIds, CancellationToken ct)
    {
        for (var p = 0; p < planIds.Count; p++)
        {
            if (p == 2)
            {
                continue;
            }

            var outputs = await db.Plans.Where(x => x.Id == planIds[p]).Select(x => x.OutputsJson).SingleAsync(ct).ConfigureAwait(false);
            var snapshot = PlanJson.Read<TypedPlan>(outputs);
            for (var g = 0; g < snapshot.Goals.Length; g++)
            {
                if (DemoChoice(snapshot.Goals[g], g, preferKit: p == 0 ? "HM-12L" : null) is { } choice)
                {
                    await choose.ChooseAsync(planIds[p], choice, ct).ConfigureAwait(false);
                }
            }
        }
    }

    private static PlanOptionRef? DemoChoice(PlannedGoal goal, int g, string? preferKit)
    {
        var kit = goal.KitDevices.Select((o, i) => (o, i)).ToList();
        if (preferKit is not null && kit.FindIndex(x => x.o.Option.KitDeviceId == preferKit) is var k and >= 0)
        {
            return new PlanOptionRef(g, PlanOptionList.KitDevices, k);
        }

        if (kit.FindIndex(x => OptionUse.IsUsable(x.o.Option)) is var usableKit and >= 0)
        {
            return new PlanOptionRef(g, PlanOptionList.KitDevices, usableKit);
        }

        var options = goal.Options.Select((o, i) => (o, i)).ToList();
        return options.FindIndex(x => OptionUse.IsUsable(x.o.Option)) is var usable and >= 0 ? new PlanOptionRef(g, PlanOptionList.Options, usable) : null;
    }

    /// <summary>Removes every demo record and gives the clinic a neutral name until the user sets its own.</summary>
    public async Task RemoveAsync(CancellationToken ct)
    {
        await db.Clients.Where(c => c.IsDemo).ExecuteDeleteAsync(ct).ConfigureAwait(false);
        await db.KitDevices.Where(k => k.IsDemo).ExecuteDeleteAsync(ct).ConfigureAwait(false);
        var settings = await db.Settings.SingleAsync(ct).ConfigureAwait(false);
        if (settings.ClinicName == ClinicName)
        {
            settings.ClinicName = "My clinic";
        }

        settings.HasDemoData = false;
        await db.SaveChangesAsync(ct).ConfigureAwait(false);
    }

    public static ClinicSettings DefaultSettings(string name, bool hasDemoData) => new()
    {
        ClinicName = name,
        ClinicContact = hasDemoData ? "1 Harbour Lane, Port Example · 000 0000 0000 (invented)" : null,
        Units = UnitSystem.Metric,
        SnellenIn = SnellenUnit.Metres,
        SpotReserve = AcuityReserve.Spot,
        FluentReserve = AcuityReserve.Fluent,
        SustainedReserve = AcuityReserve.Sustained,
        CharacterPitch = 1.1,
        HandoutPrintSize = PrintSize.FromM(3.0),
        HasDemoData = hasDemoData,
    };

    private static IEnumerable<KitDevice> Kit() =>
    [
        Device("HM-08", "Hand magnifier +8 D, 75 mm", DeviceKind.HandMagnifier, 8, 75, false),
        Device("HM-12L", "Lit hand magnifier +12 D, 60 mm", DeviceKind.HandMagnifier, 12, 60, true),
        Device("HM-20L", "Lit hand magnifier +20 D, 45 mm", DeviceKind.HandMagnifier, 20, 45, true),
        Stand("SM-12L", "Lit stand magnifier +12 D, 70 mm", 12, 70, 6.5),
        Stand("SM-24L", "Lit stand magnifier +24 D, 50 mm", 24, 50, 3.5),
        Device("SP-08", "Reading spectacles +8.00 D add", DeviceKind.SpectacleAdd, 8, null, false),
        Device("SP-12", "Reading spectacles +12.00 D add, prism half-eyes", DeviceKind.SpectacleAdd, 12, null, false),
        new KitDevice
        {
            Code = "VM-DESK", Name = "Desktop video magnifier, 24 in screen", Kind = DeviceKind.VideoMagnifier,
            Magnification = 40, Illuminated = true, InStock = 1, IsDemo = true,
        },
    ];

    private static KitDevice Device(string code, string name, DeviceKind kind, double dioptres, double? apertureMm, bool lit) => new()
    {
        Code = code,
        Name = name,
        Kind = kind,
        Power = Power.FromDioptres(dioptres),
        Aperture = apertureMm is { } mm ? Distance.FromMillimetres(mm) : null,
        Illuminated = lit,
        InStock = 2,
        IsDemo = true,
    };

    private static KitDevice Stand(string code, string name, double dioptres, double apertureMm, double heightCm)
    {
        var device = Device(code, name, DeviceKind.StandMagnifier, dioptres, apertureMm, true);
        device.StandHeight = Distance.FromCentimetres(heightCm);
        return device;
    }

    private static IEnumerable<Client> Clients(DateOnly today)
    {
        var first = new Client { Code = "DEMO-01", Name = "Ines Example", YearOfBirth = 1941, Notes = "Invented demo client. Dry macular degeneration, both eyes.", IsDemo = true };
        first.Visits.Add(Visit(today.AddDays(-21), "Demo practitioner A", ("6/60", Acuity.FromSnellen(6, 60)), ("6/48", Acuity.FromSnellen(6, 48)), ("6/48", Acuity.FromSnellen(6, 48)),
            ("4M", PrintSize.FromM(4)), ("40 cm", Distance.FromCentimetres(40)), "+2.50", 2.5, "1.20 logCS", 1.2, "25 cm", 25,
            (GoalTask.Newspaper, "Local weekly paper", "1M", 1.0), (GoalTask.MedicationLabels, null, "0.8M", 0.8), (GoalTask.Mail, "Bills", "1M", 1.0)));

        var second = new Client { Code = "DEMO-02", YearOfBirth = 1958, Notes = "Invented demo client. Recorded without a name, as the clinic allows.", IsDemo = true };
        second.Visits.Add(Visit(today.AddDays(-7), "Demo practitioner B", ("20/200", Acuity.FromSnellen(20, 200)), ("20/400", Acuity.FromSnellen(20, 400)), ("20/200", Acuity.FromSnellen(20, 200)),
            ("5M", PrintSize.FromM(5)), ("33 cm", Distance.FromCentimetres(33)), "+3.00", 3.0, "0.90 logCS", 0.9, "30 cm", 30,
            (GoalTask.Book, "Large-print novels", "1.6M", 1.6), (GoalTask.Phone, null, "1M", 1.0)));

        var third = new Client { Code = "DEMO-03", Name = "Tomas Sample", YearOfBirth = 2009, Notes = "Invented demo client. Young, so accommodation helps at near.", IsDemo = true };
        var visit = Visit(today.AddDays(-2), "Demo practitioner A", ("6/24", Acuity.FromSnellen(6, 24)), ("6/30", Acuity.FromSnellen(6, 30)), ("6/24", Acuity.FromSnellen(6, 24)),
            ("1.6M", PrintSize.FromM(1.6)), ("25 cm", Distance.FromCentimetres(25)), null, null, "1.50 logCS", 1.5, "20 cm", 20,
            (GoalTask.Book, "School textbooks", "1M", 1.0), (GoalTask.Writing, "Worksheets", "1M", 1.0));
        visit.AccommodationText = "8.00";
        visit.AccommodationMeasured = Power.FromDioptres(8);
        third.Visits.Add(visit);

        var fourth = new Client { Code = "DEMO-04", Name = "Ruth Placeholder", YearOfBirth = 1936, Notes = "Invented demo client. Tremor; needs a hands-free option.", IsDemo = true };
        var tremorVisit = Visit(today.AddDays(-40), "Demo practitioner B", ("6/38", Acuity.FromSnellen(6, 38)), ("6/60", Acuity.FromSnellen(6, 60)), ("6/38", Acuity.FromSnellen(6, 38)),
            ("3.2M", PrintSize.FromM(3.2)), ("40 cm", Distance.FromCentimetres(40)), "+3.00", 3.0, "1.05 logCS", 1.05, "25 cm", 25,
            (GoalTask.Mail, "Bank letters", "1M", 1.0));
        tremorVisit.HasTremor = true;
        tremorVisit.NeedsHandsFree = true;
        tremorVisit.HomeLighting = HomeLighting.Dim;
        fourth.Visits.Add(tremorVisit);

        return [first, second, third, fourth];
    }

    private static Visit Visit(
        DateOnly date, string practitioner,
        (string Text, Acuity Value) right, (string Text, Acuity Value) left, (string Text, Acuity Value) both,
        (string Text, PrintSize Value) near, (string Text, Distance Value) nearDistance,
        string? addText, double? add, string contrastText, double contrast, string workingText, double workingCm,
        params (GoalTask Task, string? Detail, string PrintText, double M)[] goals)
    {
        var visit = new Visit
        {
            VisitDate = date,
            Practitioner = practitioner,
            DistanceRightText = right.Text,
            DistanceRight = right.Value,
            DistanceLeftText = left.Text,
            DistanceLeft = left.Value,
            DistanceBothText = both.Text,
            DistanceBoth = both.Value,
            NearThresholdText = near.Text,
            NearThreshold = near.Value,
            NearTestDistanceText = nearDistance.Text,
            NearTestDistance = nearDistance.Value,
            AddWornText = addText,
            AddWorn = add is { } a ? Power.FromDioptres(a) : null,
            ContrastSensitivityText = contrastText,
            ContrastLogCs = contrast,
            WorkingDistanceText = workingText,
            WorkingDistance = Distance.FromCentimetres(workingCm),
            HomeLighting = HomeLighting.Good,
            Notes = "Invented demo visit.",
        };
        for (var i = 0; i < goals.Length; i++)
        {
            visit.Goals.Add(new VisitGoal { Position = i, Task = goals[i].Task, Detail = goals[i].Detail, TargetText = goals[i].PrintText, TargetPrint = PrintSize.FromM(goals[i].M) });
        }

        return visit;
    }
}
