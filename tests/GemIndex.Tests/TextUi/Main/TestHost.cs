namespace GemIndex.Tests.TextUi.Main;

/// <summary>What the text UI's tests allow for a host busy with other test assemblies.</summary>
internal static class TestHost
{
    /// <summary>
    /// How long a test waits for the session's background saves. The program allows five seconds at exit; a test host
    /// running three assemblies on two cores once took longer to schedule a save (a full run, not reproduced alone), so
    /// the tests still require the saves to finish but allow a starved thread pool a minute.
    /// </summary>
    public static readonly TimeSpan SaveWait = TimeSpan.FromMinutes(1);
}
