using GemIndex.Cli.TextUi.Help;

namespace GemIndex.Tests.TextUi.Help;

public class HelpTextTests
{
    [Fact]
    public void Help_lists_every_function_key_and_the_quit_key()
    {
        string help = HelpText.Render();
        foreach (string key in new[] { "F1", "F2", "F3", "F4", "F5", "F6", "F7", "F8", "F9", "F10", "Ctrl+L", "Ctrl+N", "Ctrl+Q" }) Assert.Contains(key, help);
    }

    [Fact]
    public void Help_gives_the_cautions_on_liquids_lamps_immersion_and_certificates()
    {
        string cautions = string.Join(" ", HelpText.Cautions);
        Assert.Contains("toxic", cautions);
        Assert.Contains("heavy liquids", cautions);
        Assert.Contains("Ultraviolet lamps harm eyes and skin", cautions);
        Assert.Contains("not a certificate", cautions);
        Assert.Contains("local rules and licensed practice", cautions);
        Assert.Contains("Do not immerse", cautions);
    }
}
