using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Web.Moving;
using LowVisionAid.Web.Security;

// `create-admin --user <name>` creates an administrator and exits without starting the server (docs/security.md);
// `move-to-server --to <connection string>` copies the clinic's SQLite file to a PostgreSQL server (docs/moving-to-server.md).
var adminCommand = AdminCommandLine.Parse(args);
var moveCommand = MoveCommandLine.Parse(args);
var builder = WebApplication.CreateBuilder(adminCommand?.HostArgs ?? moveCommand?.HostArgs ?? args);

// Listen on loopback only unless configured otherwise: the app holds health information.
if (string.IsNullOrEmpty(builder.Configuration["urls"]) && string.IsNullOrEmpty(builder.Configuration["ASPNETCORE_URLS"]))
{
    builder.WebHost.UseUrls("http://127.0.0.1:5080");
}

// A network address without Access:AllowLan: one message on standard error and a non-zero exit, no stack trace.
if (StartRefusal.Check(builder.Configuration, Console.Error) is { } refused)
{
    return refused;
}

// Settings: appsettings.json lists every one with its default; each concern binds its own section and is checked at start.
builder.AddClinicLogging(quietConsole: adminCommand is not null || moveCommand is not null);   // Logging:LogLevel, one line per request, rolling file in the data folder
builder.AddClinicData();                    // DataFolder, BackupFolder, LoadDemoClinic; SQLite, backups, database start-up
builder.AddClinicPages();                   // the clinic-flow pages, their validators and handlers (one list, by feature)
builder.AddClinicSecurity();                // loopback unless Access:AllowLan, sign-in and roles, cookie keys, audit trail

builder.Services.AddFriendlyErrors();       // ProblemDetails for the API's errors
builder.Services.AddCalculationApi();       // JSON API for plans and conversions, OpenAPI at /openapi/v1.json
builder.AddPlanHandouts();                  // handout and summary PDFs, trade-off figures and the print view of a plan

var app = builder.Build();
if (adminCommand is not null)
{
    return await CreateAdminCommand.RunAsync(app.Services, adminCommand, CreateAdminCommand.ReadFromConsole, askTwice: !Console.IsInputRedirected, Console.Out, Console.Error, CancellationToken.None).ConfigureAwait(false);
}

if (moveCommand is not null)
{
    return await MoveToServerCommand.RunAsync(app.Services, moveCommand, Console.Out, Console.Error, CancellationToken.None).ConfigureAwait(false);
}

app.LogStarting();
await app.PrepareClinicDatabaseAsync().ConfigureAwait(false);   // once, under the start-up lock: settings checked, backup, migrate, roles, demo clinic

app.UseRequestLog();                        // outermost: one line per request (method, path without query, status, duration)
if (!app.Environment.IsDevelopment())
{
    app.UseExceptionHandler("/Error");
}

app.UseClinicSecurityHeaders();   // other computers refused unless allowed; CSP and the other headers
app.UseFriendlyErrors();                    // not-found page for people, ProblemDetails under /api
app.UseStaticFiles();
app.UseRouting();
app.UseClinicSignIn();             // authentication and authorization
app.MapRazorPages();
app.MapCalculationApi();
app.MapHandoutFonts();             // the handout face for the print view, from the Reports assembly (one copy in the repo)

await app.RunAsync().ConfigureAwait(false);
return 0;
