using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>catalogue list --json: the count and each entry in the catalogue's own document shape.</summary>
internal sealed record CatalogueListJson(int Count, CatalogueEntryDocument[] Materials);
