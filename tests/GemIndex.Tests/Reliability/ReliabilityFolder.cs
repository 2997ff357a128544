using System.Security.Cryptography;
using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;
using Microsoft.Data.Sqlite;

namespace GemIndex.Tests.Reliability;

[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
/// <summary>A throw-away folder for the fault suite, with workbooks made in it and raw SQL to damage them.</summary>
public sealed class ReliabilityFolder : IDisposable
{
    public ReliabilityFolder() => Directory.CreateDirectory(Path);

    public string Path { get; } = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "gemindex-fault-" + Guid.NewGuid().ToString("N"));

    public string File(string name) => System.IO.Path.Combine(Path, name);

    /// <summary>A workbook of <paramref name="stones"/> invented stones, closed (so its WAL is folded into the file).</summary>
    public string Workbook(string name, int stones = 3)
    {
        string path = File(name);
        using var wb = StoneWorkbook.Open(path, TimeProvider.System, WorkbookOpening.CreateIfMissing);
        for (int i = 1; i <= stones; i++)
            wb.Create(new StoneSheet
            {
                Reference = $"lot 3 / {i}", WeightCarats = 1.0 + i / 100.0, Notes = new string('n', 200),
                Readings = new StoneReadings { Id = $"lot 3 / {i}", Sg = 2.65, Colour = "pale yellow" },
            });
        return path;
    }

    /// <summary>Runs SQL on the file directly, as another program (or a damaged disk) would.</summary>
    public static void Raw(string path, string sql)
    {
        using var raw = new SqliteConnection($"Data Source={path};Pooling=False");
        raw.Open();
        using var cmd = raw.CreateCommand();
        cmd.CommandText = sql;
        cmd.ExecuteNonQuery();
    }

    public static string Hash(string path) => Convert.ToHexString(SHA256.HashData(System.IO.File.ReadAllBytes(path)));

    public void Dispose()
    {
        foreach (string d in Directory.EnumerateDirectories(Path, "*", SearchOption.AllDirectories).Append(Path))
            System.IO.File.SetUnixFileMode(d, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        Directory.Delete(Path, recursive: true);
    }
}
