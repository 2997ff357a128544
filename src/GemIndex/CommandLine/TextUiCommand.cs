using System.CommandLine;
using GemIndex.Cli.TextUi.Main;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.CommandLine;

/// <summary>The root action: <c>gemindex [--workbook PATH]</c> opens the text UI; <c>--demo</c> fills the workbook with invented stones.</summary>
internal static class TextUiCommand
{
    public static int Run(ParseResult pr, string workbookPath, bool demo)
    {
        TextWriter output = pr.InvocationConfiguration.Output, error = pr.InvocationConfiguration.Error;
        if (!demo) return TextUiLauncher.Run(workbookPath, error);
        try
        {
            using StoneWorkbook workbook = StoneWorkbook.Open(workbookPath, TimeProvider.System);
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
