using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Main;

/// <summary>A full-size read-only text screen (help, candidate detail); Esc or Enter closes it.</summary>
internal sealed class TextScreen : FullScreenDialog
{
    public TextScreen(string title, string text)
    {
        Title = title + " (Esc closes)";
        Body = new WrappedText { Width = Dim.Fill(), Height = Dim.Fill(), Lines = [text] };
        Add(Body);
    }

    public WrappedText Body { get; }

    public static void Show(IApplication app, string title, string text)
    {
        using var screen = new TextScreen(title, text);
        app.Run(screen);
    }
}
