using System.Diagnostics;
using GemIndex.Data.Workbook;
using Microsoft.Data.Sqlite;
using Xunit.Abstractions;

namespace GemIndex.Tests.Reliability;

/// <summary>
/// A child process edits the workbook and acknowledges each saved edit; it is killed with SIGKILL at a random point
/// mid-edit, a bounded number of times. After each kill the workbook opens (verified: quick_check), passes
/// integrity_check, and holds every acknowledged edit.
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public sealed class KillDuringWriteTests(ITestOutputHelper log) : IDisposable
{
    /// <summary>Kills per run: enough to land in every phase of a save many times over, bounded for CI (about a second each).</summary>
    public const int Kills = 12;

    private readonly ReliabilityFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void No_acknowledged_edit_is_lost_when_the_writer_is_killed_mid_edit()
    {
        string path = _folder.Workbook("wb.db", stones: 1);
        var random = new Random(20261202);
        long acknowledgedTotal = 0, lost = 0, damaged = 0;
        for (int kill = 0; kill < Kills; kill++)
        {
            int killAfter = random.Next(5, 120);
            long lastAck = RunAndKill(path, killAfter);
            acknowledgedTotal += lastAck;
            using (var wb = StoneWorkbook.Open(path, TimeProvider.System))   // refuses a damaged file
            {
                StoneSheet stone = wb.Get(wb.List().Single().Id)!;
                long stored = long.Parse(stone.Notes["edit ".Length..], System.Globalization.CultureInfo.InvariantCulture);
                if (stored < lastAck) lost += lastAck - stored;
                if (stone.Dimensions != $"{stored} x 6.0 x 4.2 mm") damaged++;
            }
            if (IntegrityCheck(path) != "ok") damaged++;
            // The next child starts from the stored value again: "edit 1" onward overwrite it, so reset to compare.
            using (var wb = StoneWorkbook.Open(path, TimeProvider.System))
            {
                StoneSheet s = wb.Get(wb.List().Single().Id)!;
                wb.Save(s, s with { Notes = "edit 0", Dimensions = "0 x 6.0 x 4.2 mm" });
            }
        }
        log.WriteLine($"kills {Kills}, acknowledged edits {acknowledgedTotal}, lost {lost}, torn or damaged {damaged}");
        Assert.Equal(0, lost);
        Assert.Equal(0, damaged);
        Assert.True(acknowledgedTotal >= Kills * 5);
    }

    private static long RunAndKill(string path, int killAfter)
    {
        string assembly = typeof(FaultChild).Assembly.Location;
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in new[] { assembly, FaultChild.WorkbookWriter, path }) start.ArgumentList.Add(a);
        using Process child = Process.Start(start)!;
        long lastAck = 0;
        try
        {
            while (child.StandardOutput.ReadLine() is { } line)
            {
                lastAck = long.Parse(line["ack ".Length..], System.Globalization.CultureInfo.InvariantCulture);
                if (lastAck >= killAfter) break;
            }
        }
        finally
        {
            child.Kill(entireProcessTree: true);   // SIGKILL on Unix: no finaliser, no checkpoint, mid-edit
            child.WaitForExit(30_000);
        }
        Assert.True(lastAck >= killAfter, $"the writer stopped early: {child.StandardError.ReadToEnd()}");
        return lastAck;
    }

    private static string IntegrityCheck(string path)
    {
        using var c = new SqliteConnection($"Data Source={path};Mode=ReadOnly;Pooling=False");
        c.Open();
        using var cmd = c.CreateCommand();
        cmd.CommandText = "PRAGMA integrity_check";
        return (string)cmd.ExecuteScalar()!;
    }
}
