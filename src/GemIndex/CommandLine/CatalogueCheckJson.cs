namespace GemIndex.Cli.CommandLine;

/// <summary>catalogue check --json: how many entries were checked and every finding.</summary>
internal sealed record CatalogueCheckJson(int Entries, FindingJson[] Findings);
