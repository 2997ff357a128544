namespace GemIndex.Cli.CommandLine;

/// <summary>One import error in JSON: line, column(s), problem.</summary>
internal sealed record ImportErrorJson(int Line, string Field, string Problem);
