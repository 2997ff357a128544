using System.CommandLine;
using GemIndex.Cli.CommandLine;

namespace GemIndex.Tests.CommandLine;

public class CommandTreeTests
{
    public static TheoryData<string[]> CommandLines => new()
    {
        new[] { "--version" },
        new[] { "--workbook", "x.db", "--new" },
        new[] { "identify", "--sg", "2.65" },
        new[] { "identify", "--sg", "abc" },
        new[] { "catalogue", "list", "--index", "1.544" },
        new[] { "report", "stone" },
        new[] { "calc", "carats", "--grams", "1" },
        new[] { "calc", "nonsense" },
        new[] { "identfy", "--sg", "2.65" },
        new[] { "--bogus" },
    };

    [Theory]
    [MemberData(nameof(CommandLines))]
    public void A_command_line_reads_the_same_on_the_tree_built_for_it_as_on_the_whole_tree(string[] args)
    {
        ParseResult whole = CommandTree.Build().Parse(args), own = CommandTree.Build(args).Parse(args);
        Assert.Equal(whole.CommandResult.Command.Name, own.CommandResult.Command.Name);
        Assert.Equal(whole.Errors.Select(e => e.Message), own.Errors.Select(e => e.Message));
    }

    [Fact]
    public void A_start_with_only_root_options_builds_no_subcommand() =>
        Assert.Empty(CommandTree.Build(["--workbook", "x.db"]).Subcommands);

    [Fact]
    public void A_named_command_builds_only_that_one() =>
        Assert.Equal(["identify"], CommandTree.Build(["identify", "--sg", "2.65"]).Subcommands.Select(c => c.Name));
}
