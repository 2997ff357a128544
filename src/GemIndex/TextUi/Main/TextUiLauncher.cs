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

    public static int Run(string workbookPath, bool createNew, TextWriter error)
    {
        if (Console.IsInputRedirected || Console.IsOutputRedirected)
        {
            error.WriteLine("gemindex: the text UI needs a terminal; try 'gemindex --help'");
            return ExitCodes.NoTerminal;
        }
        // Read the catalogue (the slow part of a start) while the workbook opens and the window is drawn.
        // Started once the main loop runs (after the first frame is drawn), so that on a two-core laptop the catalogue
        // does not compete with the window's own start-up for the first screen.
        var started = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        Task<IReadOnlyList<Material>> loading = started.Task.ContinueWith(_ => MergedCatalogue.Load(CatalogueLocations.FromEnvironment()), TaskScheduler.Default);
        StoneWorkbook? workbook = TextUiCommand.Open(workbookPath, createNew, interactive: true, Console.In, Console.Out, error, out int failure);
        if (workbook is null) return failure;
        // Said before the screen is drawn, and on the key line (every save reports it) while it runs.
        if (workbook.ReadOnlyReason is { } readOnly) error.WriteLine($"gemindex: {workbook.Path} opened read-only ({readOnly}): stones can be read and reported, nothing typed is saved");
        string? catalogueProblem = null;
        using (workbook)
        {
            using IApplication app = Application.Create().Init();
            var session = new BenchSession(workbook, new BenchAssessor(null), action => app.Invoke(action));
            using var window = new MainWindow(session, []);
            window.ShowCatalogueState(LoadingCatalogue);
            session.Start();
            window.FillFromModel();
            window.ShowLastPage();
            _ = loading.ContinueWith(done =>
            {
                if (done.IsCompletedSuccessfully)
                {
                    var assessor = new BenchAssessor(new Identifier(done.Result));
                    app.Invoke(() => window.UseCatalogue(done.Result, assessor));
                    return;
                }
                Exception e = done.Exception?.InnerException ?? new InvalidOperationException("the catalogue load was cancelled");
                catalogueProblem = e is CatalogueStoreException or CatalogueSchemaVersionException or CatalogueFormatException
                    ? $"cannot load the catalogue: {e.Message}"
                    : $"cannot load the catalogue ({e.GetType().Name}): {e.Message}";
                string reason = catalogueProblem;
                app.Invoke(() => window.ShowCatalogueState("!! no catalogue: nothing can be ranked (readings are still saved)", reason));
            }, TaskScheduler.Default);
            app.Invoke(() => started.TrySetResult());
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
