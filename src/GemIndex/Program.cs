using GemIndex.Cli.CommandLine;

return CommandTree.Build().Parse(args).Invoke();
