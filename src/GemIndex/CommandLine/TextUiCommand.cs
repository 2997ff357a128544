using System.CommandLine;
using GemIndex.Cli.TextUi.Main;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// The root action: <c>gemindex [--workbook PATH] [--new]</c> opens the text UI; <c>--demo</c> fills the workbook with
/// invented stones. A path with no workbook is created only when the user says so: <c>--new</c>, or "y" to the
/// question asked on a terminal, so a mistyped path creates nothing (no folders either).
/// </summary>
internal static class TextUiCommand
{
    public static int Run(ParseResult pr, string workbookPath, bool demo, bool createNew)
    {
        TextWriter output = pr.InvocationConfiguration.Output, error = pr.InvocationConfiguration.Error;
        bool interactive = !Console.IsInputRedirected && !Console.IsOutputRedirected;
        if (!demo) return TextUiLauncher.Run(workbookPath, createNew, error);
        StoneWorkbook? workbook = Open(workbookPath, createNew, interactive, Console.In, output, error, out int failure);
        if (workbook is null) return failure;
        using (workbook)
        {
            try
            {
                output.WriteLine(DemoStones.Describe(DemoStones.AddTo(workbook), workbook.Path));
                return ExitCodes.Ok;
            }
            catch (WorkbookException e)
            {
                error.WriteLine("gemindex: " + e.Message);
                return ExitCodes.BadFile;
            }
        }
    }

    /// <summary>
    /// Opens the workbook for editing; when there is none at the path, creates it only with <paramref name="createNew"/>
    /// or the user's "y" on a terminal. On failure writes one plain line to <paramref name="error"/>, sets
    /// <paramref name="exitCode"/> and returns null.
    /// </summary>
    public static StoneWorkbook? Open(string path, bool createNew, bool interactive, TextReader input, TextWriter output, TextWriter error, out int exitCode)
    {
        exitCode = ExitCodes.Ok;
        try
        {
            try { return StoneWorkbook.Open(path, TimeProvider.System, createNew ? WorkbookOpening.CreateIfMissing : WorkbookOpening.Existing); }
            catch (WorkbookMissingException missing)
            {
                if (!interactive)
                {
                    error.WriteLine($"gemindex: {missing.Message}; add --new to create a new workbook there");
                    exitCode = ExitCodes.BadFile;
                    return null;
                }
                output.Write($"No workbook at {missing.Path}.{output.NewLine}Create a new one there? [y/N] ");   // the question on a line of its own: a long path wrapped "[y/N" and "]" apart
                output.Flush();
                string answer = (input.ReadLine() ?? "").Trim();
                if (!answer.Equals("y", StringComparison.OrdinalIgnoreCase) && !answer.Equals("yes", StringComparison.OrdinalIgnoreCase))
                {
                    error.WriteLine("gemindex: nothing created; check the path, or answer y (or add --new) to create a workbook there");
                    exitCode = ExitCodes.BadFile;
                    return null;
                }
                return StoneWorkbook.Open(path, TimeProvider.System, WorkbookOpening.CreateIfMissing);
            }
        }
        catch (WorkbookException e)
        {
            error.WriteLine("gemindex: " + e.Message);
            exitCode = ExitCodes.BadFile;
            return null;
        }
    }
}
