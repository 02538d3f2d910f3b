using LowVisionAid.Data;
using LowVisionAid.Data.Backup;
using LowVisionAid.Web.Infrastructure;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.Filters;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Admin;

[RequestSizeLimit(MaxUploadBytes)]
[RequestFormLimits(MultipartBodyLengthLimit = MaxUploadBytes)]
public sealed class BackupModel(DatabaseBackups backups, ClinicDbContext clinic, ClinicDatabaseTarget target, ClinicCalendar calendar) : PageModel
{
    public const long MaxUploadBytes = 1L << 30;

    /// <summary>How to back up the clinic's PostgreSQL server (pg_dump, pg_restore); null when the clinic is on its SQLite file.</summary>
    public ServerBackupAdvice? Server { get; } = target.IsServer ? new ServerBackupAdvice(target.ConnectionString, calendar.Today) : null;

    public IReadOnlyList<BackupFile> Files { get; private set; } = [];

    public string BackupFolder => backups.BackupFolder;

    public string? Done { get; private set; }

    public string? Problem { get; private set; }

    [BindProperty]
    public string? Name { get; set; }

    [BindProperty]
    public bool Confirm { get; set; }

    public void OnGet() => Files = Server is null ? backups.List() : [];

    /// <summary>
    /// On a server database no handler runs: taking, restoring and uploading backups are about the SQLite file, so a
    /// post (a stale form, a typed request) gets the page with the refusal and a 409, and nothing is changed.
    /// </summary>
    public override void OnPageHandlerExecuting(PageHandlerExecutingContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (Server is not null && HttpMethods.IsPost(context.HttpContext.Request.Method))
        {
            Problem = ServerBackupAdvice.Refusal;
            var page = Page();
            page.StatusCode = StatusCodes.Status409Conflict;
            context.Result = page;
        }
    }

    public async Task<IActionResult> OnPostTakeAsync([FromServices] TakeBackupHandler handler, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(handler);
        var file = await handler.HandleAsync(ct).ConfigureAwait(false);
        Done = $"Backup {file.Name} taken.";
        Files = backups.List();
        return Page();
    }

    public async Task<IActionResult> OnPostRestoreAsync([FromServices] RestoreBackupHandler handler, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(handler);
        var file = Name is null ? null : backups.Find(Name);
        if (file is null)
        {
            Problem = "Choose a backup from the list.";
        }
        else if (!Confirm)
        {
            Problem = "Tick the box to confirm that the current data is to be replaced by the backup.";
        }
        else
        {
            var result = await handler.HandleAsync(file.Path, file.Name, ct).ConfigureAwait(false);
            Report(result, $"Restored {file.Name}. {result.Message} A backup of the data as it was is in the list.");
        }

        Files = backups.List();
        return Page();
    }

    public async Task<IActionResult> OnPostUploadAsync(IFormFile? upload, [FromServices] RestoreBackupHandler handler, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(handler);
        if (upload is null || upload.Length == 0)
        {
            Problem = "Choose a backup file (.db) to upload.";
        }
        else if (!Confirm)
        {
            Problem = "Tick the box to confirm that the current data is to be replaced by the backup.";
        }
        else
        {
            Directory.CreateDirectory(backups.BackupFolder);
            var temp = Path.Combine(backups.BackupFolder, "upload-" + Guid.NewGuid().ToString("N") + ".tmp");
            try
            {
                await using (var stream = System.IO.File.Create(temp))
                {
                    await upload.CopyToAsync(stream, ct).ConfigureAwait(false);
                }

                var result = await handler.HandleAsync(temp, "uploaded file", ct).ConfigureAwait(false);
                Report(result, $"Restored the uploaded backup. {result.Message} A backup of the data as it was is in the list.");
            }
            finally
            {
                // Reading a file SQLite left in WAL mode makes its -wal and -shm beside it: they go too.
                Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
                foreach (var leftover in new[] { temp, temp + "-wal", temp + "-shm", temp + "-journal" })
                {
                    System.IO.File.Delete(leftover);
                }
            }
        }

        Files = backups.List();
        return Page();
    }

    public IReadOnlySet<string> Known => clinic.KnownMigrations();

    private void Report(RestoreCheck result, string success)
    {
        if (result.CanRestore)
        {
            Done = success;
        }
        else
        {
            Problem = result.Message;
        }
    }
}
