using Terminal.Gui.Configuration;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Attribute = Terminal.Gui.Drawing.Attribute;
using Color = Terminal.Gui.Drawing.Color;

namespace GemIndex.Cli.TextUi.Main;

/// <summary>NO_COLOR: black and white only; focus shown inverted, hot keys underlined. Errors stay readable through their "!" marks.</summary>
internal static class Monochrome
{
    public static bool Wanted => Environment.GetEnvironmentVariable("NO_COLOR") is { Length: > 0 };

    public static Scheme Scheme { get; } = new(new Attribute(Color.White, Color.Black))
    {
        Focus = new Attribute(Color.White, Color.Black, TextStyle.Reverse),
        HotNormal = new Attribute(Color.White, Color.Black, TextStyle.Underline),
        HotFocus = new Attribute(Color.White, Color.Black, TextStyle.Reverse | TextStyle.Underline),
        Active = new Attribute(Color.White, Color.Black, TextStyle.Reverse | TextStyle.Bold),
        Disabled = new Attribute(Color.White, Color.Black, TextStyle.Faint),
    };

    public static void Apply(View root)
    {
        foreach (string name in SchemeManager.GetSchemeNames()) SchemeManager.AddScheme(name, Scheme);
        root.SetScheme(Scheme);
    }
}
