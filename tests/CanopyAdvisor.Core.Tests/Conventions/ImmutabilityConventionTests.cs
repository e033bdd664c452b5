using System.Reflection;
using CanopyAdvisor.Core.Sites;

namespace CanopyAdvisor.Core.Tests.Conventions;

/// <summary>Keeps the architecture's promise that inputs and results are immutable (ARCHITECTURE.md, Conventions).</summary>
public class ImmutabilityConventionTests
{
    private static readonly Assembly Core = typeof(Site).Assembly;

    public static TheoryData<string> SiteModelTypes()
    {
        var data = new TheoryData<string>();
        foreach (Type t in Core.GetTypes().Where(t => t.IsPublic && t.Namespace == typeof(Site).Namespace && !t.IsAbstract && !t.IsInterface && t.IsClass && !IsStatic(t)))
        {
            data.Add(t.FullName!);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(SiteModelTypes))]
    public void Site_model_types_have_no_public_setters(string typeName)
    {
        Type t = Core.GetType(typeName)!;
        foreach (PropertyInfo p in t.GetProperties(BindingFlags.Public | BindingFlags.Instance))
        {
            MethodInfo? setter = p.SetMethod;
            bool mutable = setter is { IsPublic: true } && !setter.ReturnParameter.GetRequiredCustomModifiers().Any(m => m.Name == "IsExternalInit");
            Assert.False(mutable, $"{t.Name}.{p.Name} has a public setter");
        }

        Assert.All(t.GetFields(BindingFlags.Public | BindingFlags.Instance), f => Assert.True(f.IsInitOnly, $"{t.Name}.{f.Name} is a mutable field"));
    }

    [Fact]
    public void Core_references_no_io_web_or_storage_assemblies()
    {
        string[] forbidden = ["CanopyAdvisor.Files", "CanopyAdvisor.Cli", "LiteDB", "Microsoft.AspNetCore", "Quartz"];
        foreach (AssemblyName referenced in Core.GetReferencedAssemblies())
        {
            Assert.DoesNotContain(referenced.Name, forbidden);
        }
    }

    private static bool IsStatic(Type t) => t.IsAbstract && t.IsSealed;
}
