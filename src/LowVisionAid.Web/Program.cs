using LowVisionAid.Web.Infrastructure;

var builder = WebApplication.CreateBuilder(args);

// Listen on loopback only unless configured otherwise: the app holds health information.
if (string.IsNullOrEmpty(builder.Configuration["urls"]) && string.IsNullOrEmpty(builder.Configuration["ASPNETCORE_URLS"]))
{
    builder.WebHost.UseUrls("http://127.0.0.1:5080");
}

builder.AddClinicData();                    // SQLite file in the data folder, migrations from LowVisionAid.Migrations
builder.AddClinicPages();                   // the clinic-flow pages, their validators and handlers
builder.Services.AddRazorPages();
builder.AddPlanHandouts();                  // handout and summary PDFs, trade-off figures and the print view of a plan

var app = builder.Build();
await app.PrepareClinicDatabaseAsync().ConfigureAwait(false);   // migrate, then the demo clinic on an empty database

if (!app.Environment.IsDevelopment())
{
    app.UseExceptionHandler("/Error");
}

app.UseStaticFiles();
app.UseRouting();
app.MapRazorPages();

await app.RunAsync().ConfigureAwait(false);
