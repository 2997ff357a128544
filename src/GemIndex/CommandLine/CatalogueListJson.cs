namespace GemIndex.Cli.CommandLine;

/// <summary>catalogue list --json: the entries shown.</summary>
internal sealed record CatalogueListJson(int Count, MaterialJson[] Materials);
