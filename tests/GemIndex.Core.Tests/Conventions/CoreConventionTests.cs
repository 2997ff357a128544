using System.Reflection;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Conventions;

/// <summary>House rules checked by tests rather than by review (STYLE.md: "Convention tests").</summary>
public class CoreConventionTests
{
    private static readonly Assembly Core = typeof(QuantityOutOfRangeException).Assembly;

    [Fact]
    public void Core_references_nothing_but_the_base_library_and_MathNet()
    {
        var allowed = new[] { "System.", "Microsoft.Win32.Primitives", "netstandard", "mscorlib", "MathNet.Numerics" };
        var references = Core.GetReferencedAssemblies().Select(a => a.Name!).ToList();
        Assert.All(references, name => Assert.True(allowed.Any(a => name == a.TrimEnd('.') || name.StartsWith(a, StringComparison.Ordinal)), name));
        Assert.DoesNotContain(references, n => n.Contains("Sqlite", StringComparison.OrdinalIgnoreCase) || n.Contains("Terminal", StringComparison.Ordinal));
    }

    [Fact]
    public void Every_public_struct_of_Core_is_readonly()
    {
        var structs = Core.GetExportedTypes().Where(t => t.IsValueType && !t.IsEnum).ToList();
        Assert.NotEmpty(structs);
        Assert.All(structs, t => Assert.True(
            t.GetCustomAttributes().Any(a => a.GetType().FullName == "System.Runtime.CompilerServices.IsReadOnlyAttribute"), t.FullName));
    }

    [Fact]
    public void Core_has_no_static_field_that_can_change_after_start_up()
    {
        var mutable = Core.GetTypes()
            .SelectMany(t => t.GetFields(BindingFlags.Static | BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.DeclaredOnly))
            .Where(f => !f.IsLiteral && !f.IsInitOnly && !f.Name.Contains('<', StringComparison.Ordinal))
            .Select(f => $"{f.DeclaringType!.FullName}.{f.Name}")
            .ToList();
        Assert.Empty(mutable);
    }
}
