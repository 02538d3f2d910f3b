using System.Diagnostics;
using LowVisionAid.Reliability.Tests.Support;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// scripts/count-results.sh, which closes scripts/test.sh (and so CI) with "N passed, N failed": a run that did not
/// finish cleanly is a failure, never "0 failed". The TRX files here are cut down to the two elements the script
/// reads, with counters as VSTest wrote them on this machine for a passing, a failing, a skipped and a crashed run
/// (a test host stopped by Environment.FailFast writes all-zero counters, outcome "Failed", and dotnet test exits 1).
/// </summary>
public sealed class TestScriptCountTests
{
    [Fact]
    public async Task A_crashed_test_host_with_empty_results_counts_as_failed()
    {
        var run = await CountAsync(("Crashed.Tests", 1, Trx("Failed", total: 0, executed: 0, passed: 0)));

        Assert.Equal("0 passed, 1 failed", run.LastLine);
        Assert.NotEqual(0, run.ExitCode);
    }

    [Fact]
    public async Task A_project_whose_dotnet_test_failed_without_results_counts_as_failed()
    {
        var run = await CountAsync(("Passing.Tests", 0, Trx("Completed", total: 5, executed: 5, passed: 5)), ("NoResults.Tests", 1, null));

        Assert.Equal("5 passed, 1 failed", run.LastLine);
        Assert.NotEqual(0, run.ExitCode);
    }

    [Fact]
    public async Task Tests_that_passed_before_the_host_crashed_do_not_hide_the_crash()
    {
        var run = await CountAsync(("HalfRun.Tests", 1, Trx("Failed", total: 7, executed: 7, passed: 7)));

        Assert.Equal("7 passed, 1 failed", run.LastLine);
        Assert.NotEqual(0, run.ExitCode);
    }

    [Theory]
    [InlineData("error")]
    [InlineData("timeout")]
    [InlineData("aborted")]
    [InlineData("notExecuted")]
    public async Task Errored_timed_out_aborted_or_unexecuted_tests_count_as_failed(string counter)
    {
        // An errored, timed-out or aborted test was executed; a not-executed one was not.
        var executed = counter == "notExecuted" ? 3 : 4;
        var run = await CountAsync(("Odd.Tests", 1, Trx("Failed", total: 4, executed: executed, passed: 3, extra: (counter, 1))));

        Assert.Equal("3 passed, 1 failed", run.LastLine);
        Assert.NotEqual(0, run.ExitCode);
    }

    [Fact]
    public async Task A_clean_run_passes_and_reports_skipped_tests()
    {
        // xunit's [Fact(Skip = ...)] counts in total, not in executed, and not as notExecuted.
        var run = await CountAsync(("Clean.Tests", 0, Trx("Completed", total: 4, executed: 3, passed: 3)));

        Assert.Equal("3 passed, 0 failed, 1 skipped", run.LastLine);
        Assert.Equal(0, run.ExitCode);
    }

    [Fact]
    public async Task A_failing_test_is_counted_once()
    {
        var run = await CountAsync(("Failing.Tests", 1, Trx("Failed", total: 4, executed: 4, passed: 2, failed: 2)));

        Assert.Equal("2 passed, 2 failed", run.LastLine);
        Assert.NotEqual(0, run.ExitCode);
    }

    private sealed record Run(int ExitCode, string LastLine, string Output);

    private static string Trx(string outcome, int total, int executed, int passed, int failed = 0, (string Name, int Value)? extra = null)
    {
        int Extra(string name) => extra is { } e && e.Name == name ? e.Value : 0;
        return $"""
            <?xml version="1.0" encoding="utf-8"?>
            <TestRun xmlns="http://microsoft.com/schemas/VisualStudio/TeamTest/2010">
              <ResultSummary outcome="{outcome}">
                <Counters total="{total}" executed="{executed}" passed="{passed}" failed="{failed}" error="{Extra("error")}" timeout="{Extra("timeout")}" aborted="{Extra("aborted")}" inconclusive="0" passedButRunAborted="0" notRunnable="0" notExecuted="{Extra("notExecuted")}" disconnected="0" warning="0" completed="0" inProgress="0" pending="0" />
              </ResultSummary>
            </TestRun>
            """;
    }

    private static async Task<Run> CountAsync(params (string Project, int ExitCode, string? Trx)[] projects)
    {
        using var results = new TempFolder("count-results");
        foreach (var (project, exitCode, trx) in projects)
        {
            await File.WriteAllTextAsync(Path.Combine(results.Path, project + ".exit"), exitCode.ToString(System.Globalization.CultureInfo.InvariantCulture) + "\n");
            if (trx is not null)
            {
                await File.WriteAllTextAsync(Path.Combine(results.Path, project + ".trx"), trx);
            }
        }

        var start = new ProcessStartInfo("bash") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        start.ArgumentList.Add(Path.Combine(RepositoryRoot(), "scripts", "count-results.sh"));
        start.ArgumentList.Add(results.Path);
        using var process = Process.Start(start)!;
        var output = await process.StandardOutput.ReadToEndAsync();
        var errors = await process.StandardError.ReadToEndAsync();
        using var bound = new CancellationTokenSource(TimeSpan.FromSeconds(30));
        await process.WaitForExitAsync(bound.Token);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.True(lines.Length > 0, "The script printed nothing. " + errors);
        return new Run(process.ExitCode, lines[^1], output + errors);
    }

    private static string RepositoryRoot()
    {
        var folder = new DirectoryInfo(AppContext.BaseDirectory);
        while (folder is not null && !File.Exists(Path.Combine(folder.FullName, "LowVisionAid.sln")))
        {
            folder = folder.Parent;
        }

        return folder?.FullName ?? throw new DirectoryNotFoundException("LowVisionAid.sln not found above " + AppContext.BaseDirectory);
    }
}
