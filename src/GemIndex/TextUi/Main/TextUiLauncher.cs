using GemIndex.Cli.CommandLine;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Data.Catalogue;
using GemIndex.Data.Workbook;
using Terminal.Gui.App;

namespace GemIndex.Cli.TextUi.Main;

/// <summary>Opens the workbook and the catalogue, then runs the bench until Ctrl+Q; everything is saved as it is typed.</summary>
internal static class TextUiLauncher
{
    public static int Run(string workbookPath, TextWriter error)
    {
        if (Console.IsInputRedirected || Console.IsOutputRedirected)
        {
            error.WriteLine("gemindex: the text UI needs a terminal; try 'gemindex --help'");
            return ExitCodes.NoTerminal;
        }
        IReadOnlyList<Material> catalogue;
        try { catalogue = MergedCatalogue.Load(CatalogueLocations.FromEnvironment()); }
        catch (Exception e) when (e is CatalogueStoreException or CatalogueSchemaVersionException or CatalogueFormatException)
        {
            error.WriteLine($"gemindex: cannot load the catalogue: {e.Message}");
            return ExitCodes.BadFile;
        }
        StoneWorkbook workbook;
        try { workbook = StoneWorkbook.Open(workbookPath, TimeProvider.System); }
        catch (WorkbookException e)
        {
            error.WriteLine("gemindex: " + e.Message);
            return ExitCodes.BadFile;
        }
        using (workbook)
        {
            using IApplication app = Application.Create().Init();
            var session = new BenchSession(workbook, new BenchAssessor(new Identifier(catalogue)), action => app.Invoke(action));
            using var window = new MainWindow(session, catalogue);
            session.Start();
            window.FillFromModel();
            app.Run(window);
            session.Flush();
        }
        return ExitCodes.Ok;
    }
}
