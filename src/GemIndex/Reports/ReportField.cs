namespace GemIndex.Cli.Reports;

/// <summary>One labelled line of a report: "Polariscope" — "doubly refractive".</summary>
/// <param name="Key">Stable snake_case name for machine-readable formats ("polariscope").</param>
/// <param name="Label">The label for people ("Polariscope").</param>
/// <param name="Value">The value in words, with its unit.</param>
internal sealed record ReportField(string Key, string Label, string Value);
