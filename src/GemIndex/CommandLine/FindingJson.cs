namespace GemIndex.Cli.CommandLine;

/// <summary>One catalogue-check finding in JSON.</summary>
internal sealed record FindingJson(string Entry, string Field, string Problem);
