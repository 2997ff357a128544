using System.CommandLine;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;
using IndicatrixModel = GemIndex.Core.Optics.Indicatrix.Indicatrix;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>
/// <c>calc indicatrix</c>: from α β γ (biaxial) or ω ε (uniaxial), the birefringence, optic sign and 2Vz; with a
/// facet normal and a step, the simulated refractometer readings as the stone is turned on the facet.
/// </summary>
internal static class CalcIndicatrixCommand
{
    internal sealed record SectionJson(double RotationDegrees, double LowIndex, double HighIndex, double Birefringence);

    internal sealed record IndicatrixResult(string Character, double Alpha, double Beta, double Gamma, double Birefringence,
        string Sign, double? OpticAxialAngleDegrees, double? Omega, double? Epsilon, double[]? Facet, SectionJson[]? Rotation);

    public static Command Create()
    {
        var alpha = CalcOptions.Number("--alpha", "Lowest principal index α of a biaxial material (no unit)");
        var beta = CalcOptions.Number("--beta", "Intermediate principal index β (no unit)");
        var gamma = CalcOptions.Number("--gamma", "Highest principal index γ (no unit)");
        var omega = CalcOptions.Number("--omega", "Ordinary index ω of a uniaxial material (no unit)");
        var epsilon = CalcOptions.Number("--epsilon", "Extraordinary index ε (no unit)");
        var facet = CalcOptions.Tuple("--facet", "Facet normal X,Y,Z in the indicatrix axes (α along X, γ along Z)", ',', 3);
        var step = CalcOptions.Number("--step", "Rotation step of the simulated series, in degrees (1–90); default 15", 15, "rotation step", 1, 90, "°");
        return CalcBuilder.Command("indicatrix", "Birefringence, optic sign and 2Vz from principal indices; optional simulated rotation on a facet", [alpha, beta, gamma, omega, epsilon, facet, step], pr =>
        {
            IndicatrixModel indicatrix = Build(pr.GetValue(alpha), pr.GetValue(beta), pr.GetValue(gamma), pr.GetValue(omega), pr.GetValue(epsilon));
            IndicatrixResult result = Describe(indicatrix, pr.GetValue(omega), pr.GetValue(epsilon));
            if (pr.GetValue(facet) is { Length: 3 } xyz) result = Rotate(result, indicatrix, xyz, pr.GetValue(step));
            return CalcAnswer.Of(result, Write);
        });
    }

    private static IndicatrixModel Build(double? alpha, double? beta, double? gamma, double? omega, double? epsilon) =>
        (alpha, beta, gamma, omega, epsilon) switch
        {
            ({ } a, { } b, { } g, null, null) => Named("--alpha, --beta, --gamma", () =>
                IndicatrixModel.Biaxial(new RefractiveIndex(a), new RefractiveIndex(b), new RefractiveIndex(g))),
            (null, null, null, { } o, { } e) => Named("--omega, --epsilon", () =>
                IndicatrixModel.Uniaxial(new RefractiveIndex(o), new RefractiveIndex(e))),
            _ => throw Input("give either --alpha, --beta and --gamma (biaxial) or --omega and --epsilon (uniaxial)"),
        };

    private static IndicatrixResult Describe(IndicatrixModel x, double? omega, double? epsilon) => new(x.Character.ToString().ToLowerInvariant(),
        x.Alpha.Value, x.Beta.Value, x.Gamma.Value, x.Birefringence.Value, x.Sign.ToString().ToLowerInvariant(),
        // A uniaxial crystal's one optic axis: 2V 0°, in the JSON as in the text (the angle about Z would read 180° for a negative one).
        omega is not null ? 0 : x.OpticAxialAngle?.Degrees, omega, epsilon, null, null);

    private static IndicatrixResult Rotate(IndicatrixResult result, IndicatrixModel indicatrix, double[] xyz, double stepDegrees)
    {
        Direction normal = Named("--facet", () => new Direction(xyz[0], xyz[1], xyz[2]));
        IReadOnlyList<IndicatrixSection> sections = Named("--step", () => RotationSeries.Simulate(indicatrix, normal, Angle.FromDegrees(stepDegrees)));
        SectionJson[] rows = [.. sections.Select(s => new SectionJson(s.Rotation.Degrees, s.Low.Value, s.High.Value, (s.High - s.Low).Value))];
        return result with { Facet = [normal.X, normal.Y, normal.Z], Rotation = rows };
    }

    private static void Write(TextWriter output, IndicatrixResult r)
    {
        output.WriteLine(r is { Omega: { } o, Epsilon: { } e }
            ? $"uniaxial: ω {Index(o)}, ε {Index(e)} {NoUnit}"
            : $"biaxial: α {Index(r.Alpha)}, β {Index(r.Beta)}, γ {Index(r.Gamma)} {NoUnit}");
        output.WriteLine($"birefringence {Fixed(r.Birefringence, "0.0000")} {NoUnit}; optic sign {r.Sign}" +
            // A uniaxial crystal's optic axes coincide: 2V = 0° in the trade's words, whichever axis the angle is taken about.
            (r is { Omega: not null } ? "; 2V 0° (uniaxial: one optic axis)" : r.OpticAxialAngleDegrees is { } v ? $"; 2Vz {Degrees(v)}" : ""));
        if (r.Rotation is not { } rows) return;
        output.WriteLine($"facet normal ({string.Join(", ", r.Facet!.Select(c => Fixed(c, "0.####")))}); rotation series:");
        output.WriteLine("  rotation    low index  high index  difference");
        foreach (SectionJson s in rows)
            output.WriteLine($"  {Degrees(s.RotationDegrees),8}    {Index(s.LowIndex),9}  {Index(s.HighIndex),10}  {Fixed(s.Birefringence, "0.0000"),10}");
        output.WriteLine($"  (indices and differences {NoUnit})");
    }
}
