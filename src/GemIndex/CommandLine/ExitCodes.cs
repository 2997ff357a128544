namespace GemIndex.Cli.CommandLine;

/// <summary>Process exit codes of every command.</summary>
internal static class ExitCodes
{
    public const int Ok = 0;
    /// <summary>What System.CommandLine returns for a parse or validation error.</summary>
    public const int Usage = 1;
    public const int NoTerminal = 2;
    /// <summary>Some input could not be read (a bad batch line, a bad import row, a failed check).</summary>
    public const int BadInput = 3;
    public const int BadFile = 4;
}
