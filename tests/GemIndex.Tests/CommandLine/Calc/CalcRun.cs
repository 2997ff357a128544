using System.Text.Json;

namespace GemIndex.Tests.CommandLine.Calc;

/// <summary>Runs <c>gemindex calc …</c> in-process (through <see cref="CommandRun.Plain"/>) and reads its output.</summary>
internal static class CalcRun
{
    public const int BadInput = 3;
    public const int Usage = 1;

    public static (int Exit, string Out, string Err) Text(params string[] args) => CommandRun.Plain(["calc", .. args]);

    /// <summary>Runs with <c>--json</c>, asserts success, and returns the parsed root element.</summary>
    public static JsonElement Json(params string[] args)
    {
        var (exit, output, error) = Text([.. args, "--json"]);
        Assert.True(exit == 0, error);
        using JsonDocument doc = JsonDocument.Parse(output);
        return doc.RootElement.Clone();
    }

    /// <summary>Asserts a domain error: exit <see cref="BadInput"/>, nothing on stdout, exactly one line on stderr; returns it.</summary>
    public static string OneErrorLine(params string[] args)
    {
        var (exit, output, error) = Text(args);
        Assert.Equal(BadInput, exit);
        Assert.Equal("", output);
        string[] lines = error.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        Assert.Single(lines);
        Assert.StartsWith("gemindex", lines[0], StringComparison.Ordinal);
        Assert.DoesNotContain(" at ", lines[0], StringComparison.Ordinal); // no stack frame
        return lines[0];
    }

    public static double Number(this JsonElement element, string name) => element.GetProperty(name).GetDouble();

    /// <summary>A number as a user would type it, to the last digit (round-trip format, dot decimal mark).</summary>
    public static string Typed(double value) => value.ToString("R", System.Globalization.CultureInfo.InvariantCulture);

    public static double Radians(double degrees) => degrees * Math.PI / 180;

    public static double Degrees(double radians) => radians * 180 / Math.PI;
}
