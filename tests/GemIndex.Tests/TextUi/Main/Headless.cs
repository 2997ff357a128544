using System.Runtime.CompilerServices;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;

namespace GemIndex.Tests.TextUi.Main;

/// <summary>Terminal.Gui without a terminal: the ANSI driver with real I/O switched off (STACK.md §2).</summary>
internal static class Headless
{
    /// <summary>The test collection of every class that starts Terminal.Gui: its classes run one after another, never in parallel.</summary>
    public const string Collection = "Terminal.Gui, one at a time";

    [ModuleInitializer]   // before any Init: the driver must never touch a real terminal
    internal static void Setup() => Environment.SetEnvironmentVariable("DisableRealDriverIO", "1");

    public static IApplication Start(int columns = 80, int rows = 24)
    {
        IApplication app = Application.Create().Init(DriverRegistry.Names.ANSI);
        app.Driver!.SetScreenSize(columns, rows);
        return app;
    }
}
