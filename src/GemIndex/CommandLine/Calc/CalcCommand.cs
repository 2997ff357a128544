using System.CommandLine;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>The <c>calc</c> group: the optics and gravity calculations of GemIndex.Core, one subcommand each.</summary>
internal static class CalcCommand
{
    public static Command Create() => new("calc", "Bench calculations: optics (Snell, refractometer, reflectance, dispersion, indicatrix) and gravity")
    {
        CalcSnellCommand.Create(),
        CalcCriticalAngleCommand.Create(),
        CalcRefractometerCommand.Create(),
        CalcReflectanceCommand.Create(),
        CalcBrewsterCommand.Create(),
        CalcPrismCommand.Create(),
        CalcDispersionCommand.Create(),
        CalcIndicatrixCommand.Create(),
        CalcSpecificGravityCommand.Create(),
        CalcCaratsCommand.Create(),
    };
}
