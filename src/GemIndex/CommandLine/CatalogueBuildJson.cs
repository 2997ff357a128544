namespace GemIndex.Cli.CommandLine;

/// <summary>catalogue build --json: the file written.</summary>
internal sealed record CatalogueBuildJson(string Output, int Entries, string SourceHash);
