using System.Globalization;
using System.Text;
using LowVisionAid.Load;

// The load and scale harness: `bash scripts/load.sh` publishes the app as a clinic installs it (Release, ReadyToRun)
// and runs `all` (docs/performance.md).
//   all [--app DLL] [--out DIR] [--requests N] [--clients N] [--visits N] [--plans N] [--trials N] [--reuse true]
// --app names the LowVisionAid.Web.dll to run (the published one from scripts/load.sh; else the Release build).
// --reuse true keeps DIR/demo and DIR/scale from an earlier run (no empty-folder start, no generation): the same
// databases measured again, e.g. on a quieter machine.
// Makes DIR/demo (the demo clinic, from an empty folder) and DIR/scale (the demo clinic plus a synthetic clinic),
// measures start-up and every target at 1, 5 and 20 concurrent clients on each, and writes DIR/results.md.
var options = Options.Parse(args);
var culture = CultureInfo.InvariantCulture;
void Say(string line) => Console.WriteLine(string.Create(culture, $"{DateTime.UtcNow:HH:mm:ss} {line}"));

var root = Options.RepositoryRoot();
var webDll = options.App is { } app ? Path.GetFullPath(app, root) : Path.Combine(root, "src", "LowVisionAid.Web", "bin", "Release", "net10.0", "LowVisionAid.Web.dll");
if (!File.Exists(webDll))
{
    Console.Error.WriteLine($"Publish the app first (bash scripts/load.sh does) or build it in Release (dotnet build src/LowVisionAid.Web -c Release): {webDll} is missing.");
    return 2;
}

var output = Path.GetFullPath(options.Out, root);
var demoFolder = Path.Combine(output, "demo");
var scaleFolder = Path.Combine(output, "scale");
var reusing = options.Reuse && File.Exists(Path.Combine(demoFolder, "lowvisionaid.db")) && File.Exists(Path.Combine(scaleFolder, "lowvisionaid.db"));
foreach (var folder in reusing ? [] : new[] { demoFolder, scaleFolder })
{
    if (Directory.Exists(folder))
    {
        Directory.Delete(folder, recursive: true);
    }
}

var loadBefore = File.ReadAllText("/proc/loadavg").Trim();
Say($"machine load {loadBefore}");

// The demo clinic: a start on an empty folder (database made, demo loaded), then starts on the existing database.
var emptyStart = TimeSpan.Zero;
if (!reusing)
{
    await using var first = await AppProcess.StartAsync(webDll, demoFolder, loadDemo: true);
    emptyStart = first.StartUp;
}

Say("load on the demo clinic");
var (demoStarts, demo, demoPeak) = await StartsThenLoadAsync(demoFolder);

// The synthetic clinic on top of a copy of the demo clinic's database.
var generated = TimeSpan.Zero;
if (!reusing)
{
    Directory.CreateDirectory(scaleFolder);
    foreach (var file in Directory.GetFiles(demoFolder, "lowvisionaid.db*"))
    {
        File.Copy(file, Path.Combine(scaleFolder, Path.GetFileName(file)));
    }

    Say($"adding {options.Size.Clients:N0} clients, {options.Size.Visits:N0} visits, {options.Size.Plans:N0} plans, {options.Size.Trials:N0} trials");
    generated = await SyntheticClinic.AddAsync(scaleFolder, options.Size, Say);
}
var dbBytes = new FileInfo(Path.Combine(scaleFolder, "lowvisionaid.db")).Length;
Say($"generated in {generated.TotalSeconds:0} s; database {dbBytes / 1048576.0:0} MB");

Say("load on the synthetic clinic");
var (scaleStarts, scale, scalePeak) = await StartsThenLoadAsync(scaleFolder);

var loadAfter = File.ReadAllText("/proc/loadavg").Trim();
var report = Report.Write(options, webDll, loadBefore, loadAfter, emptyStart, demoStarts, scaleStarts, generated, dbBytes, demo, scale, demoPeak, scalePeak);
var resultsFile = Path.Combine(output, "results.md");
File.WriteAllText(resultsFile, report, Encoding.UTF8);
Console.WriteLine(report);
Say($"written to {resultsFile}");
return demo.Concat(scale).Any(r => r.Errors > 0) ? 1 : 0;

// Three starts on an existing database (each timed to the first page), then the load on the third.
async Task<(List<TimeSpan> Starts, List<CellResult> Results, long Peak)> StartsThenLoadAsync(string folder)
{
    var starts = new List<TimeSpan>();
    for (var i = 0; ; i++)
    {
        await using var app = await AppProcess.StartAsync(webDll, folder, loadDemo: true);
        starts.Add(app.StartUp);
        if (i == 2)
        {
            var results = await LoadRunner.RunAsync(app, Targets.All, [1, 5, 20], options.Requests, Say);
            return (starts, results, app.PeakWorkingSet);
        }
    }
}
