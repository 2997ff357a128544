using System.CommandLine;
using GemIndex.Core.Bench;

namespace GemIndex.Cli.CommandLine;

/// <summary>
/// A word option limited to a few choices, whose refusal names the option and shows the value at most
/// <see cref="BenchText.MostShown"/> characters (the library's own check names neither).
/// </summary>
internal static class ChoiceOption
{
    /// <summary>Limits the option to the choices (offered for completion too).</summary>
    public static void Restrict<T>(Option<T> option, params string[] choices)
    {
        option.CompletionSources.Add(choices);
        option.Validators.Add(r =>
        {
            foreach (var token in r.Tokens)
                if (!choices.Contains(token.Value, StringComparer.Ordinal))
                    r.AddError($"{option.Name}: '{BenchText.Shown(token.Value)}' is not one of {string.Join(" | ", choices)}");
        });
    }
}
