using GemIndex.Cli.CommandLine;
using GemIndex.Cli.TextUi.Bench;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Identification;
using GemIndex.Data.Catalogue;
using GemIndex.Data.Workbook;
using Terminal.Gui.App;

namespace GemIndex.Cli.TextUi.Main;

/// <summary>Opens the workbook, draws the bench and reads the catalogue in the background, then runs until Ctrl+Q; everything is saved as it is typed.</summary>
internal static class TextUiLauncher
{
    /// <summary>Shown in the identification panel until the catalogue is read.</summary>
    public const string LoadingCatalogue = "loading catalogue…";

    public static int Run(string workbookPath, TextWriter error)
    {
        if (Console.IsInputRedirected || Console.IsOutputRedirected)
        {
            error.WriteLine("gemindex: the text UI needs a terminal; try 'gemindex --help'");
            return ExitCodes.NoTerminal;
        }
        StoneWorkbook workbook;
        try { workbook = StoneWorkbook.Open(workbookPath, TimeProvider.System); }
        catch (WorkbookException e)
        {
            error.WriteLine("gemindex: " + e.Message);
            return ExitCodes.BadFile;
        }
        string? catalogueProblem = null;
        using (workbook)
        {
            using IApplication app = Application.Create().Init();
            var session = new BenchSession(workbook, new BenchAssessor(null), action => app.Invoke(action));
            using var window = new MainWindow(session, []);
            window.ShowCatalogueState(LoadingCatalogue);
            session.Start();
            window.FillFromModel();
            // The window is drawn first; the catalogue (the slow part of a start) arrives when it is read.
            _ = Task.Run(() =>
            {
                try
                {
                    IReadOnlyList<Material> catalogue = MergedCatalogue.Load(CatalogueLocations.FromEnvironment());
                    var assessor = new BenchAssessor(new Identifier(catalogue));
                    app.Invoke(() => window.UseCatalogue(catalogue, assessor));
                }
                catch (Exception e) when (e is CatalogueStoreException or CatalogueSchemaVersionException or CatalogueFormatException)
                {
                    catalogueProblem = $"cannot load the catalogue: {e.Message}";
                    app.Invoke(() => window.ShowCatalogueState("!! " + catalogueProblem + " (readings are still saved)"));
                }
            });
            app.Run(window);
            session.Flush();
        }
        if (catalogueProblem is not null)
        {
            error.WriteLine("gemindex: " + catalogueProblem);
            return ExitCodes.BadFile;
        }
        return ExitCodes.Ok;
    }
}
