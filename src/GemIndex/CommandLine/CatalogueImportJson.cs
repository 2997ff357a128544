namespace GemIndex.Cli.CommandLine;

/// <summary>catalogue import --json: what was imported, or every error.</summary>
internal sealed record CatalogueImportJson(string File, string UserCatalogue, int Imported, ImportErrorJson[] Errors);
