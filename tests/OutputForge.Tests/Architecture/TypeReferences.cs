using System.Reflection;
using System.Reflection.Emit;
using OutputForge.Pipeline;

namespace OutputForge.Tests.Architecture;

/// <summary>
/// The types a type's compiled code names: its base type and interfaces, attributes, fields, properties, events, method
/// signatures and locals, and every type, method and field its method bodies use (read from the IL, so a reference written
/// with a partial namespace, such as <c>Pipeline.X</c> inside <c>namespace OutputForge.Data</c>, is found too). Nested and
/// compiler-made types (lambdas, iterators, async state machines) count for the type that encloses them.
/// </summary>
internal static class TypeReferences
{
    private const BindingFlags Declared =
        BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Instance | BindingFlags.Static | BindingFlags.DeclaredOnly;

    private static readonly Dictionary<short, OpCode> OpCodesByValue = typeof(OpCodes)
        .GetFields(BindingFlags.Public | BindingFlags.Static)
        .Select(f => (OpCode)f.GetValue(null)!)
        .ToDictionary(o => o.Value);

    /// <summary>Every type <paramref name="type"/> names, with what names it (for messages), generic types as their definitions.</summary>
    public static IEnumerable<(Type Used, string Where)> Of(Type type)
    {
        var found = new List<(Type, string)>();
        void Add(Type? used, string where)
        {
            foreach (var t in Flatten(used))
            {
                found.Add((t, where));
            }
        }

        Add(type.BaseType, "base type");
        foreach (var i in type.GetInterfaces())
        {
            Add(i, "interface");
        }
        foreach (var a in type.GetCustomAttributesData())
        {
            Add(a.AttributeType, "attribute");
        }
        foreach (var f in type.GetFields(Declared))
        {
            Add(f.FieldType, $"field {f.Name}");
        }
        foreach (var p in type.GetProperties(Declared))
        {
            Add(p.PropertyType, $"property {p.Name}");
        }
        foreach (var e in type.GetEvents(Declared))
        {
            Add(e.EventHandlerType, $"event {e.Name}");
        }
        foreach (var m in type.GetMethods(Declared).Cast<MethodBase>().Concat(type.GetConstructors(Declared)))
        {
            var where = $"{(m.IsConstructor ? "constructor" : "method " + m.Name)}";
            if (m is MethodInfo method)
            {
                Add(method.ReturnType, where);
            }
            foreach (var p in m.GetParameters())
            {
                Add(p.ParameterType, where);
            }
            var body = m.GetMethodBody();
            if (body is null)
            {
                continue;
            }
            foreach (var local in body.LocalVariables)
            {
                Add(local.LocalType, where);
            }
            foreach (var member in MembersUsed(m, body.GetILAsByteArray() ?? []))
            {
                switch (member)
                {
                    case Type t:
                        Add(t, where);
                        break;
                    case MethodBase called:
                        Add(called.DeclaringType, where);
                        if (called is MethodInfo { IsGenericMethod: true } generic)
                        {
                            foreach (var argument in generic.GetGenericArguments())
                            {
                                Add(argument, where);
                            }
                        }
                        break;
                    case FieldInfo field:
                        Add(field.DeclaringType, where);
                        break;
                }
            }
        }
        foreach (var nested in type.GetNestedTypes(Declared))
        {
            found.AddRange(Of(nested).Select(u => (u.Used, $"{nested.Name}: {u.Where}")));
        }
        return found;
    }

    /// <summary>The types, methods and fields a method body's instructions name by token.</summary>
    private static IEnumerable<MemberInfo> MembersUsed(MethodBase method, byte[] il)
    {
        var typeArguments = method.DeclaringType is { IsGenericType: true } owner ? owner.GetGenericArguments() : null;
        var methodArguments = method.IsGenericMethod ? method.GetGenericArguments() : null;
        var at = 0;
        while (at < il.Length)
        {
            short value = il[at] == 0xFE ? (short)(0xFE00 | il[at + 1]) : il[at];
            at += il[at] == 0xFE ? 2 : 1;
            var code = OpCodesByValue[value];
            switch (code.OperandType)
            {
                case OperandType.InlineType:
                case OperandType.InlineTok:
                case OperandType.InlineMethod:
                case OperandType.InlineField:
                    yield return method.Module.ResolveMember(BitConverter.ToInt32(il, at), typeArguments, methodArguments)!;
                    at += 4;
                    break;
                case OperandType.InlineNone:
                    break;
                case OperandType.ShortInlineBrTarget:
                case OperandType.ShortInlineI:
                case OperandType.ShortInlineVar:
                    at += 1;
                    break;
                case OperandType.InlineVar:
                    at += 2;
                    break;
                case OperandType.InlineI8:
                case OperandType.InlineR:
                    at += 8;
                    break;
                case OperandType.InlineSwitch:
                    at += 4 + 4 * BitConverter.ToInt32(il, at);
                    break;
                default:
                    at += 4;
                    break;
            }
        }
    }

    /// <summary>A type with its element and generic argument types, generic types as their definitions.</summary>
    private static IEnumerable<Type> Flatten(Type? type)
    {
        if (type is null || type.IsGenericParameter)
        {
            yield break;
        }
        if (type.HasElementType)
        {
            foreach (var t in Flatten(type.GetElementType()))
            {
                yield return t;
            }
            yield break;
        }
        if (type.IsGenericType)
        {
            yield return type.GetGenericTypeDefinition();
            foreach (var t in type.GetGenericArguments().SelectMany(Flatten))
            {
                yield return t;
            }
            yield break;
        }
        yield return type;
    }
}
