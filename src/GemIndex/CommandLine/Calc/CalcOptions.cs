using System.CommandLine;
using System.CommandLine.Parsing;
using GemIndex.Core.Quantities;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>
/// The option shapes of the <c>calc</c> commands. Numbers are read by <see cref="NumberOption"/> (culture-proof);
/// a number that does not parse is a parse error. Ranges are left to Core, whose errors <see cref="CalcFailure"/>
/// reports against the option.
/// </summary>
internal static class CalcOptions
{
    public static Option<double?> Number(string name, string description, bool required = false)
    {
        Option<double?> option = NumberOption.Optional(name, description, _ => { });
        option.Required = required;
        return option;
    }

    public static Option<double> Number(string name, string description, double defaultValue) =>
        NumberOption.WithDefault(name, description, defaultValue, _ => { });

    /// <summary>A number with a default that must lie within [minimum, maximum] (the refusal names the option and the range).</summary>
    public static Option<double> Number(string name, string description, double defaultValue, string quantity, double minimum, double maximum, string unit = "") =>
        NumberOption.WithDefault(name, description, defaultValue, v => QuantityOutOfRangeException.ThrowIfOutside(quantity, v, minimum, maximum, unit));

    /// <summary>A repeatable option whose every value is <paramref name="count"/> numbers joined by <paramref name="separator"/>.</summary>
    public static Option<double[][]> Tuples(string name, string description, char separator, int count) => new(name)
    {
        Description = description,
        CustomParser = r => ParseTuples(r, name, separator, count),
    };

    /// <summary>A single value of <paramref name="count"/> numbers joined by <paramref name="separator"/>; null when not given.</summary>
    public static Option<double[]?> Tuple(string name, string description, char separator, int count) => new(name)
    {
        Description = description,
        Arity = ArgumentArity.ExactlyOne,
        CustomParser = r => ParseTuples(r, name, separator, count).FirstOrDefault(),
    };

    public static Option<bool> Json() => CatalogueCommand.JsonOption();

    private static double[][] ParseTuples(ArgumentResult result, string name, char separator, int count)
    {
        var tuples = new List<double[]>();
        foreach (Token token in result.Tokens)
        {
            string[] parts = token.Value.Split(separator);
            if (parts.Length != count)
            {
                result.AddError($"{name}: '{token.Value}' should be {count} numbers joined by '{separator}'");
                continue;
            }
            var numbers = new double[count];
            for (int i = 0; i < count; i++)
            {
                if (!BenchNumber.TryParse(parts[i], out numbers[i], out string error))
                    result.AddError($"{name}: in '{token.Value}', {error}");
            }
            tuples.Add(numbers);
        }
        return [.. tuples];
    }
}
