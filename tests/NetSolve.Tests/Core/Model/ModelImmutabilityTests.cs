using System.Reflection;
using System.Runtime.CompilerServices;
using NetSolve.Model;

namespace NetSolve.Tests.Core.Model;

public class ModelImmutabilityTests
{
    // Common practice (house style, "Types: immutable by default"): a what-if is `unit with { ... }`, so no public
    // type in NetSolve.Model may have a public setter that is not init-only, nor a public writable field.
    [Fact]
    public void No_public_model_type_has_a_public_setter_that_is_not_init_only()
    {
        var modelTypes = typeof(Network).Assembly.GetExportedTypes()
            .Where(type => type.Namespace == "NetSolve.Model")
            .ToList();
        Assert.Contains(typeof(Unit), modelTypes);

        var mutable = new List<string>();
        foreach (var type in modelTypes)
        {
            foreach (var property in type.GetProperties(BindingFlags.Public | BindingFlags.Instance | BindingFlags.Static))
            {
                var setter = property.GetSetMethod(nonPublic: false);
                if (setter is not null && !IsInitOnly(setter))
                {
                    mutable.Add($"{type.Name}.{property.Name}");
                }
            }

            foreach (var field in type.GetFields(BindingFlags.Public | BindingFlags.Instance | BindingFlags.Static))
            {
                if (!field.IsInitOnly && !field.IsLiteral && !type.IsEnum)
                {
                    mutable.Add($"{type.Name}.{field.Name} (field)");
                }
            }
        }

        Assert.Empty(mutable);
    }

    [Fact]
    public void The_check_recognises_a_plain_setter_as_mutable()
    {
        var setter = typeof(MutableExample).GetProperty(nameof(MutableExample.Count))!.GetSetMethod()!;
        var initSetter = typeof(Unit).GetProperty(nameof(Unit.Servers))!.GetSetMethod()!;

        Assert.False(IsInitOnly(setter));
        Assert.True(IsInitOnly(initSetter));
    }

    private static bool IsInitOnly(MethodInfo setter) =>
        setter.ReturnParameter.GetRequiredCustomModifiers().Contains(typeof(IsExternalInit));

    private sealed class MutableExample
    {
        public int Count { get; set; }
    }
}
