using System.CommandLine;
using GemIndex.Cli.CommandLine;

namespace GemIndex.Tests.CommandLine;

/// <summary>Runs the command line in-process with captured output (STACK.md §3), and a temp folder for the catalogue.</summary>
public sealed class CommandRun : IDisposable
{
    public CommandRun() => Directory.CreateDirectory(Folder);

    /// <summary>Passed as --catalogue-dir: the tests never touch the user's real folders.</summary>
    public string Folder { get; } = Path.Combine(Path.GetTempPath(), "gemindex-cli-tests-" + Guid.NewGuid().ToString("N"));

    public static string Fixture(string name) => Path.Combine(AppContext.BaseDirectory, "Fixtures", name);

    public static (int Exit, string Out, string Err) Plain(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int exit = CommandTree.Run(args, new InvocationConfiguration { Output = output, Error = error });
        return (exit, output.ToString(), error.ToString());
    }

    /// <summary>A catalogue command with --catalogue-dir pointing at this run's folder.</summary>
    public (int Exit, string Out, string Err) Catalogue(params string[] args) =>
        Plain(["catalogue", .. args, "--catalogue-dir", Folder]);

    public void Dispose()
    {
        if (Directory.Exists(Folder)) Directory.Delete(Folder, recursive: true);
    }
}
