using LowVisionAid.Optics.Options;
using LowVisionAid.Reports;
using LowVisionAid.Reports.Figures;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Summaries;

namespace LowVisionAid.Web.Handouts;

/// <summary>
/// Turns a saved plan into the client handout, the clinician summary and the trade-off figures. The figures
/// come from the plan as stored; nothing is recomputed here.
/// </summary>
public sealed class PlanReports(
    StoredPlanReader reader,
    IReportRenderer<ClientHandout> handoutRenderer,
    IReportRenderer<ClinicianSummary> summaryRenderer,
    TradeOffFigures figures)
{
    /// <summary>What the plan page says when nothing is chosen yet.</summary>
    public const string NothingChosenHelp =
        "The handout and the trade-off figures need a chosen option: use \u201cChoose for the handout\u201d on one of the options above, or record a trial whose outcome is dispensed, loaned or ordered.";

    public Task<PlanReportData?> LoadAsync(int planId, CancellationToken ct) => reader.ReadAsync(planId, ct);

    public ReportResult RenderHandout(PlanReportData plan) => handoutRenderer.Render(Handout(plan));

    public ReportResult RenderSummary(PlanReportData plan) => summaryRenderer.Render(Summary(plan));

    public static ClientHandout Handout(PlanReportData plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var devices = plan.Chosen.Select(o => new HandoutDevice(
            o.Name,
            DeviceWording.WhatItIs(o.Family),
            o.TrialTask ?? o.Task,
            DeviceWording.HowToUse(o.Family, o.Screen),
            Distances(o),
            o.HasLightOrBattery,
            o.Field is { } field && o.LettersInView is > 0 ? new HandoutView(field, o.LettersInView.Value, o.Target) : null,
            o.Family,
            o.AddNeeded,
            o.Declined,
            o.Screen)).ToList();
        return new ClientHandout(
            plan.Clinic,
            plan.ClientCode,
            plan.ClientName,
            plan.IssuedOn,
            plan.FollowUpOn,
            devices,
            HandoutTexts.Light,
            HandoutTexts.Practice,
            [],
            HandoutTexts.IfItStopsHelping,
            plan.Chosen.Count > 0 ? plan.Chosen[0].Target : Optics.Quantities.PrintSize.FromM(1.0),
            plan.BodyPoints,
            plan.Paper,
            plan.Reader);
    }

    public ClinicianSummary Summary(PlanReportData plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var chosen = plan.Chosen.Select(o => new ChosenOption(
            o.Name,
            o.KindLabel,
            o.EquivalentPower,
            o.WorkingDistance,
            o.Field,
            o.LettersInView,
            o.Figures,
            o.Reasons,
            o.Notes,
            o.WeighedReasons,
            o.TrialTask ?? o.Task,
            o.Family)).ToList();
        return new ClinicianSummary(
            plan.Clinic,
            plan.ClientCode,
            plan.ClientName,
            plan.AssessedOn,
            plan.Clinician,
            plan.Inputs,
            plan.Estimates,
            chosen,
            plan.Trials,
            plan.MethodVersion,
            plan.Paper,
            plan.HasChosenOption ? [.. Figures(plan, "summary").Select(f => f.Table)] : null,
            plan.Eyes,
            plan.Near,
            plan.ReadingCurve,
            plan.Reader,
            plan.BodyPoints);
    }

    /// <summary>
    /// The three figures for the chosen options: (a) power against distance and field, (b) letters in view,
    /// (c) the print-size ladder (when the near threshold was measured). Options without a field are left out of
    /// (a) and (b), which need one. Empty when nothing was chosen.
    /// </summary>
    public IReadOnlyList<TradeOffFigure> Figures(PlanReportData plan, string idPrefix)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var result = new List<TradeOffFigure>(3);
        var drawable = plan.Chosen
            .Where(o => o.Field is { } f && f.Metres > 0 && o.LettersInView is not null && o.EquivalentPower.Dioptres > 0 && o.WorkingDistance.Metres > 0)
            .Select(o => new FigureOption(o.Name, o.EquivalentPower, o.WorkingDistance, o.Field!.Value, o.LettersInView!.Value))
            .ToList();
        if (drawable.Count > 0)
        {
            result.Add(figures.PowerAgainstDistanceAndField(drawable, idPrefix + "-power"));
            result.Add(figures.LettersInView(drawable, plan.Chosen[0].Target, idPrefix + "-window"));
        }

        if (plan.Chosen.FirstOrDefault(o => o.Threshold is not null) is { } first)
        {
            result.Add(figures.PrintSizeLadder(new PrintLadderData(first.Threshold!.Value, first.Target, first.Reserve, first.TestDistance), idPrefix + "-ladder"));
        }

        return result;
    }

    private static List<HandoutDistance> Distances(ReportOption o)
    {
        var distances = new List<HandoutDistance> { new(DeviceWording.DistanceWhat(o.Family), o.WorkingDistance) };
        if (o.EyeToLens is { } eye && o.Family is OptionKind.HandMagnifier or OptionKind.StandMagnifier)
        {
            distances.Add(new(DeviceWording.EyeToLens, eye));
        }

        return distances;
    }
}
