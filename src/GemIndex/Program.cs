using GemIndex.Cli.CommandLine;

return CommandTree.Run(args);
