using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Web.Security;

// `create-admin --user <name>` creates an administrator and exits without starting the server (docs/security.md).
var adminCommand = AdminCommandLine.Parse(args);
var builder = WebApplication.CreateBuilder(adminCommand?.HostArgs ?? args);
if (adminCommand is not null)
{
    builder.Logging.SetMinimumLevel(LogLevel.Warning);
}

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

builder.AddClinicData();                    // SQLite file in the data folder, migrations from LowVisionAid.Migrations
builder.AddClinicPages();                   // the clinic-flow pages, their validators and handlers
builder.Services.AddRazorPages();
builder.AddClinicSecurity();                // loopback unless Access:AllowLan, sign-in and roles, audit trail, backups

builder.Services.AddFriendlyErrors();       // ProblemDetails for the API's errors
builder.Services.AddCalculationApi();       // JSON API for plans and conversions, OpenAPI at /openapi/v1.json
builder.AddPlanHandouts();                  // handout and summary PDFs, trade-off figures and the print view of a plan

var app = builder.Build();
if (adminCommand is not null)
{
    return await CreateAdminCommand.RunAsync(app.Services, adminCommand, CreateAdminCommand.ReadFromConsole, askTwice: !Console.IsInputRedirected, Console.Out, Console.Error, CancellationToken.None).ConfigureAwait(false);
}

await using (await StartUpLock.TakeAsync(app).ConfigureAwait(false))   // one start at a time; frees a migration lock a killed start left
{
    await app.PrepareAccessDatabaseAsync().ConfigureAwait(false);    // backup before any migration, then users and audit schema
    await app.PrepareClinicDatabaseAsync().ConfigureAwait(false);   // migrate, then the demo clinic on an empty database
}

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
