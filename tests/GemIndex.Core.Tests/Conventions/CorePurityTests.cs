using System.Reflection.Metadata;
using System.Reflection.PortableExecutable;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Conventions;

/// <summary>
/// Core is pure (DEVELOPERS.md "Layout"): no console, files, folders, environment, clock or randomness. Checked on
/// what the compiled assembly actually references (its metadata's type and member references), since allowing every
/// System.* assembly would let System.Console through.
/// </summary>
public class CorePurityTests
{
    /// <summary>Types Core must not touch at all.</summary>
    private static readonly string[] ForbiddenTypes =
    [
        "System.Console", "System.Environment", "System.Random", "System.TimeProvider", "System.Diagnostics.Stopwatch", "System.Diagnostics.Process",
        "System.IO.File", "System.IO.Directory", "System.IO.FileInfo", "System.IO.DirectoryInfo", "System.IO.FileSystemInfo", "System.IO.FileStream",
        "System.IO.StreamReader", "System.IO.StreamWriter", "System.IO.Path", "System.IO.DriveInfo", "System.IO.FileSystemWatcher",
        "System.Security.Cryptography.RandomNumberGenerator", "System.Threading.Timer",
    ];

    /// <summary>
    /// What Core may reference of the types above: the compiler's own iterator code asks for the thread id, and a
    /// <see cref="Random"/> handed in by the caller may be drawn from (the source, and its seed, come from outside,
    /// as a clock would); creating one, or using the shared one, stays forbidden.
    /// </summary>
    private static readonly string[] Allowed =
    [
        "System.Environment", "System.Environment.get_CurrentManagedThreadId",
        "System.Random", "System.Random.NextDouble", "System.Random.Next", "System.Random.NextInt64", "System.Random.NextSingle", "System.Random.NextBytes",
    ];

    /// <summary>Members of otherwise harmless types that read the clock or a random source.</summary>
    private static readonly string[] ForbiddenMembers =
    [
        "System.DateTime.get_Now", "System.DateTime.get_UtcNow", "System.DateTime.get_Today",
        "System.DateTimeOffset.get_Now", "System.DateTimeOffset.get_UtcNow", "System.Guid.NewGuid", "System.Environment.get_TickCount64",
    ];

    /// <summary>Every "Namespace.Type" and "Namespace.Type.Member" an assembly file references.</summary>
    internal static IReadOnlyList<string> References(string assemblyPath)
    {
        using var stream = File.OpenRead(assemblyPath);
        using var pe = new PEReader(stream);
        MetadataReader md = pe.GetMetadataReader();
        var found = new List<string>();
        foreach (TypeReferenceHandle handle in md.TypeReferences) found.Add(Name(md, handle));
        foreach (MemberReferenceHandle handle in md.MemberReferences)
        {
            MemberReference member = md.GetMemberReference(handle);
            if (member.Parent.Kind == HandleKind.TypeReference)
                found.Add($"{Name(md, (TypeReferenceHandle)member.Parent)}.{md.GetString(member.Name)}");
        }
        return found;
    }

    internal static IReadOnlyList<string> Impure(string assemblyPath) =>
        [.. References(assemblyPath).Where(r => !Allowed.Contains(r)).Where(r => ForbiddenTypes.Any(t => r == t || r.StartsWith(t + ".", StringComparison.Ordinal)) || ForbiddenMembers.Contains(r)
            || r.StartsWith("System.Net.", StringComparison.Ordinal)).Distinct().Order(StringComparer.Ordinal)];

    private static string Name(MetadataReader md, TypeReferenceHandle handle)
    {
        TypeReference type = md.GetTypeReference(handle);
        string name = md.GetString(type.Name);
        return type.ResolutionScope.Kind == HandleKind.TypeReference
            ? $"{Name(md, (TypeReferenceHandle)type.ResolutionScope)}+{name}"
            : $"{md.GetString(type.Namespace)}.{name}";
    }

    [Fact]
    public void Core_references_no_console_file_folder_environment_clock_or_random_API()
    {
        string core = typeof(QuantityOutOfRangeException).Assembly.Location;
        Assert.Empty(Impure(core));
    }

    [Fact]
    public void The_check_finds_such_references_where_they_are()
    {
        // This test assembly opens files (above): the same check must see it, or it could never fail.
        string tests = typeof(CorePurityTests).Assembly.Location;
        Assert.Contains("System.IO.File.OpenRead", Impure(tests));
        Assert.Contains("System.IO.File", Impure(tests));
        Assert.Contains("System.Random..ctor", Impure(tests));
    }

    [Fact]
    public void The_check_reads_member_references_of_harmless_types_too()
    {
        string tests = typeof(CorePurityTests).Assembly.Location;
        Assert.Contains("System.DateTime.get_UtcNow", References(tests));
        Assert.Contains("System.DateTime.get_UtcNow", Impure(tests));
    }

    // Referenced only so that the tests above have a clock read and a new random source to find.
    private static DateTime Clock() => DateTime.UtcNow;

    private static Random Source() => new(1);
}
