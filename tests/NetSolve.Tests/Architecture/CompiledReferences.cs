using System.Reflection;

namespace NetSolve.Tests.Architecture;

/// <summary>
/// The NetSolve types compiled code uses, by reflection: base type and interfaces, attributes, fields, properties,
/// events, method signatures and locals, and every type, method and field named in method bodies. Nested and
/// compiler-made types (lambdas, iterators, async state machines) count for the namespace of the type around them.
/// </summary>
/// <remarks>
/// Constants are copied into the code that uses them, so compiled code cannot show a use of a constant; the source
/// check (<see cref="SourceReferences"/>) finds those.
/// </remarks>
internal static class CompiledReferences
{
    private const BindingFlags Declared = BindingFlags.DeclaredOnly | BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Instance | BindingFlags.Static;

    /// <summary>Every NetSolve type used by the types of <paramref name="assembly"/>; types in no namespace belong to <paramref name="defaultNamespace"/>.</summary>
    public static IEnumerable<NamespaceReference> Find(Assembly assembly, string defaultNamespace) =>
        assembly.GetTypes().SelectMany(type => Of(type, defaultNamespace));

    /// <summary>Every NetSolve type that <paramref name="type"/> uses, once each.</summary>
    public static IEnumerable<NamespaceReference> Of(Type type, string defaultNamespace)
    {
        ArgumentNullException.ThrowIfNull(type);
        if (type.Name.StartsWith('<') && type.DeclaringType is null)
        {
            // Compiler-made types outside any class (<PrivateImplementationDetails>, anonymous types) hold no code of ours.
            return [];
        }

        string from = type.Namespace ?? defaultNamespace;
        var used = new HashSet<Type>();
        foreach (var direct in DirectlyUsed(type))
        {
            Add(direct, used);
        }

        return used
            .Where(t => t.Namespace?.StartsWith("NetSolve", StringComparison.Ordinal) == true)
            .Select(t => new NamespaceReference(from, t.FullName ?? t.Name, type.FullName ?? type.Name))
            .OrderBy(reference => reference.ToName, StringComparer.Ordinal);
    }

    private static IEnumerable<Type?> DirectlyUsed(Type type)
    {
        yield return type.BaseType;
        foreach (var face in type.GetInterfaces())
        {
            yield return face;
        }

        foreach (var attribute in Attributes(type.CustomAttributes))
        {
            yield return attribute;
        }

        foreach (var field in type.GetFields(Declared))
        {
            yield return field.FieldType;
        }

        foreach (var property in type.GetProperties(Declared))
        {
            yield return property.PropertyType;
        }

        foreach (var @event in type.GetEvents(Declared))
        {
            yield return @event.EventHandlerType;
        }

        var methods = type.GetMethods(Declared).Cast<MethodBase>().Concat(type.GetConstructors(Declared));
        foreach (var method in methods)
        {
            foreach (var used in InMethod(type, method))
            {
                yield return used;
            }
        }
    }

    private static IEnumerable<Type?> InMethod(Type type, MethodBase method)
    {
        if (method is MethodInfo info)
        {
            yield return info.ReturnType;
        }

        foreach (var parameter in method.GetParameters())
        {
            yield return parameter.ParameterType;
        }

        foreach (var attribute in Attributes(method.CustomAttributes))
        {
            yield return attribute;
        }

        var body = method.GetMethodBody();
        if (body is null)
        {
            yield break;
        }

        foreach (var local in body.LocalVariables)
        {
            yield return local.LocalType;
        }

        var typeArguments = type.IsGenericType ? type.GetGenericArguments() : null;
        var methodArguments = method.IsGenericMethod ? method.GetGenericArguments() : null;
        foreach (int token in IlTokens.Of(body.GetILAsByteArray() ?? []))
        {
            foreach (var used in Named(method.Module.ResolveMember(token, typeArguments, methodArguments)))
            {
                yield return used;
            }
        }
    }

    private static IEnumerable<Type?> Named(MemberInfo? member)
    {
        switch (member)
        {
            case Type named:
                yield return named;
                break;
            case FieldInfo field:
                yield return field.DeclaringType;
                yield return field.FieldType;
                break;
            case MethodBase called:
                yield return called.DeclaringType;
                if (called.IsGenericMethod)
                {
                    foreach (var argument in called.GetGenericArguments())
                    {
                        yield return argument;
                    }
                }

                break;
        }
    }

    private static IEnumerable<Type> Attributes(IEnumerable<CustomAttributeData> attributes)
    {
        foreach (var attribute in attributes)
        {
            yield return attribute.AttributeType;
            foreach (var argument in attribute.ConstructorArguments.Concat(attribute.NamedArguments.Select(named => named.TypedValue)))
            {
                if (argument.Value is Type named)
                {
                    yield return named;
                }
            }
        }
    }

    /// <summary>Adds <paramref name="type"/> and the types it is built from: element types, generic arguments, the type around a nested type.</summary>
    private static void Add(Type? type, HashSet<Type> used)
    {
        if (type is null || type.IsGenericParameter)
        {
            return;
        }

        if (type.HasElementType)
        {
            Add(type.GetElementType(), used);
            return;
        }

        if (type.IsGenericType && !type.IsGenericTypeDefinition)
        {
            foreach (var argument in type.GetGenericArguments())
            {
                Add(argument, used);
            }

            Add(type.GetGenericTypeDefinition(), used);
            return;
        }

        if (used.Add(type) && type.DeclaringType is not null)
        {
            Add(type.DeclaringType, used);
        }
    }
}
