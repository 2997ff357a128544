namespace GemIndex.Cli.TextUi.Results;

/// <summary>One row of the answer pane; <see cref="Candidate"/> is the candidate's index when the row names one (Enter opens its detail).</summary>
internal sealed record AnswerRow(string Text, int? Candidate = null);
