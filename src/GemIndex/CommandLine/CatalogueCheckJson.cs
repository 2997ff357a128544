using GemIndex.Core.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>catalogue check --json: how many entries were checked, how many values are sourced, and every finding.</summary>
internal sealed record CatalogueCheckJson(int Entries, SourcingSummary Sourcing, FindingJson[] Findings);
