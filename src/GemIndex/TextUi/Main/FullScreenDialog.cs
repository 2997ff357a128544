using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Main;

/// <summary>
/// A screen over the whole bench (help, detail, plot, scales, catalogue, stones). Without the dialog's shadow it covers
/// the bench's key line too, so no key shown belongs to the screen underneath; each screen's title names its own keys.
/// </summary>
internal abstract class FullScreenDialog : Dialog
{
    protected FullScreenDialog()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        ShadowStyle = null;
    }
}
