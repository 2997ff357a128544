using System.Text;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Main;

/// <summary>
/// A label that shows its text as given. Terminal.Gui's label takes the first '_' as a hot-key marker and hides it,
/// so a reference such as "lot_7" or a field name such as "sg.air_ct" would lose a character; no label here has a hot key.
/// </summary>
internal sealed class PlainLabel : Label
{
    /// <summary>The value Terminal.Gui documents as "no hot-key specifier".</summary>
    public static readonly Rune NoHotKey = new('\uffff');

    public PlainLabel() => HotKeySpecifier = NoHotKey;
}
