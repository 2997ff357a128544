using GemIndex.Cli.TextUi.Main;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Plot;

/// <summary>The scales screen (Ctrl+R): each reading against the top candidates' ranges, laid out for the screen's size.</summary>
internal sealed class ScaleView : FullScreenDialog
{
    public ScaleView(ScaleModel model)
    {
        Title = "Readings against the candidates' ranges (Esc closes)";
        Body = new WrappedText { Width = Dim.Fill(), Height = Dim.Fill() };
        Body.ViewportChanged += (_, _) =>
        {
            if (Body.Viewport.Width > 0 && Body.Viewport.Width != _laidOutAt) Lay(model);
        };
        Add(Body);
    }

    private int _laidOutAt = -1;

    public WrappedText Body { get; }

    private void Lay(ScaleModel model)
    {
        _laidOutAt = Body.Viewport.Width;
        Body.Lines = model.Lines(Body.Viewport.Width, Body.Viewport.Height);
    }

    public static void Show(IApplication app, ScaleModel model)
    {
        using var view = new ScaleView(model);
        app.Run(view);
    }
}
