using GemIndex.Data.Workbook;

namespace GemIndex.Tests.Reliability;

/// <summary>
/// The test assembly's entry point (the test host does not use it): <c>dotnet GemIndex.Tests.dll workbook-writer PATH</c>
/// edits the first stone of the workbook at PATH for ever, printing "ack N" after edit N is saved, until it is killed.
/// The kill-during-write test runs it as a child process and kills it with SIGKILL mid-edit.
/// </summary>
public static class FaultChild
{
    public const string WorkbookWriter = "workbook-writer";

    public static int Main(string[] args)
    {
        if (args.Length != 2 || args[0] != WorkbookWriter) return 2;
        using var workbook = StoneWorkbook.Open(args[1], TimeProvider.System);
        StoneSheet lastRead = workbook.Get(workbook.List().Single().Id)!;
        for (long n = 1; ; n++)
        {
            // Two fields per edit, so a torn write would show as a mismatch between them.
            StoneSaveResult saved = workbook.Save(lastRead, lastRead with { Notes = $"edit {n}", Dimensions = $"{n} x 6.0 x 4.2 mm" });
            if (!saved.IsClean) return 3;
            lastRead = saved.NextLastRead;
            Console.Out.WriteLine($"ack {n}");
            Console.Out.Flush();
        }
    }
}
