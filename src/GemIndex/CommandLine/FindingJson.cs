namespace GemIndex.Cli.CommandLine;

/// <summary>One catalogue-check finding in JSON: the file ("" when not known), the entry, the field and the problem.</summary>
internal sealed record FindingJson(string File, string Entry, string Field, string Problem);
