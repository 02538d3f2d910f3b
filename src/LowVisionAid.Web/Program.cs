using LowVisionAid.Web.Errors;

var builder = WebApplication.CreateBuilder(args);

// Listen on loopback only unless configured otherwise: the app holds health information.
if (string.IsNullOrEmpty(builder.Configuration["urls"]) && string.IsNullOrEmpty(builder.Configuration["ASPNETCORE_URLS"]))
{
    builder.WebHost.UseUrls("http://127.0.0.1:5080");
}

builder.Services.AddRazorPages();
builder.Services.AddFriendlyErrors();

var app = builder.Build();

app.UseFriendlyErrors();
app.UseStaticFiles();
app.UseRouting();
app.MapRazorPages();

await app.RunAsync().ConfigureAwait(false);
