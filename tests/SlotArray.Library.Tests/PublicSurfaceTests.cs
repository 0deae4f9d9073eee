using System.Reflection;
using System.Runtime.CompilerServices;
using SlotArray.Core;
using SlotArray.Core.Waveguides;
using SlotArray.Reports;

namespace SlotArray.Library.Tests;

/// <summary>
/// The library's public surface is the facade and what its signatures expose, nothing more: every public type of the
/// library projects must be reachable from <see cref="SlotArrayDesigner"/> (and the exceptions its calls document and the
/// catalogue a spec built in code needs) through the types of public or protected members, base types and interfaces.
/// Anything else is internal (the CLI, the tests and the benchmarks see it through InternalsVisibleTo). A new public type
/// that no facade signature needs fails here: make it internal, or expose it through the facade on purpose.
/// </summary>
public class PublicSurfaceTests
{
    private static readonly Type[] Roots =
    [
        typeof(SlotArrayDesigner), typeof(InvalidSpecException), typeof(InfeasibleDesignException), typeof(ConvergenceException),
        typeof(OutputFolderException), typeof(WaveguideCatalogue),
    ];

    private static readonly string[] LibraryAssemblies = ["SlotArray.Core", "SlotArray.Spec", "SlotArray.Reports", "SlotArray.FullWave", "SlotArray.Library"];

    [Fact]
    public void Every_public_type_is_reachable_from_the_facade()
    {
        var reachable = Reachable(Roots);
        var assemblies = LibraryAssemblies.Select(Assembly.Load).ToList();
        var visible = assemblies.SelectMany(a => a.GetTypes())
            .Where(t => t.IsVisible && t.GetCustomAttribute<CompilerGeneratedAttribute>() is null).ToList();
        var extra = visible.Where(t => !reachable.Contains(t)).Select(t => t.FullName).Order(StringComparer.Ordinal).ToList();
        Assert.True(extra.Count == 0, "public types no facade signature needs (make them internal): " + string.Join(", ", extra));
        Assert.All(reachable, t => Assert.True(t.IsVisible, $"{t.FullName} is exposed by the facade but not public"));
    }

    /// <summary>The types of our assemblies that the public members of <paramref name="roots"/> expose, transitively.</summary>
    internal static HashSet<Type> Reachable(IEnumerable<Type> roots)
    {
        var seen = new HashSet<Type>();
        var queue = new Queue<Type>();
        void Add(Type? t)
        {
            if (t is null) return;
            if (t.HasElementType) { Add(t.GetElementType()); return; }
            if (t.IsGenericParameter) return;
            if (t.IsConstructedGenericType) { foreach (var g in t.GetGenericArguments()) Add(g); Add(t.GetGenericTypeDefinition()); return; }
            if (!LibraryAssemblies.Contains(t.Assembly.GetName().Name)) return;
            if (seen.Add(t)) { queue.Enqueue(t); Add(t.DeclaringType); }
        }
        foreach (var r in roots) Add(r);
        const BindingFlags All = BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Instance | BindingFlags.Static | BindingFlags.DeclaredOnly;
        static bool Exposed(MethodBase? m) => m is not null && (m.IsPublic || m.IsFamily || m.IsFamilyOrAssembly);
        while (queue.TryDequeue(out var t))
        {
            Add(t.BaseType);
            foreach (var i in t.GetInterfaces().Where(i => i.IsVisible)) Add(i);   // a public type may implement an internal interface
            foreach (var m in t.GetMembers(All).Where(m => !m.Name.Contains('<', StringComparison.Ordinal)))
            {
                switch (m)
                {
                    case FieldInfo f when f.IsPublic || f.IsFamily || f.IsFamilyOrAssembly: Add(f.FieldType); break;
                    case PropertyInfo p when p.GetAccessors(true).Any(Exposed): Add(p.PropertyType); break;
                    case MethodInfo mi when Exposed(mi):
                        Add(mi.ReturnType);
                        foreach (var pa in mi.GetParameters()) Add(pa.ParameterType);
                        break;
                    case ConstructorInfo ci when Exposed(ci):
                        foreach (var pa in ci.GetParameters()) Add(pa.ParameterType);
                        break;
                    case EventInfo e when Exposed(e.AddMethod): Add(e.EventHandlerType); break;
                }
            }
        }
        return seen;
    }
}
