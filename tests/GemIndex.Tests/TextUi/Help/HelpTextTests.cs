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
    public void Help_says_how_to_read_the_answer_the_SG_clash_and_where_the_examiner_is_set()
    {
        string help = HelpText.Render();
        Assert.Contains("READING THE ANSWER", help);
        Assert.Contains("<1% and >99%", help);
        Assert.Contains("neither is used until one is cleared", help);
        Assert.Contains("Examiner: typed once at the foot of F2 Stone", help);
        Assert.Contains("Ctrl+Z", help);
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
