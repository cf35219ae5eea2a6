using System.Reflection;
using System.Reflection.Emit;

namespace NetSolve.Tests.Architecture;

/// <summary>
/// The metadata tokens a method body refers to: the operands of the instructions that name a type, a method or a
/// field (calls, object creation, field access, casts, <c>typeof</c>, <c>ldtoken</c>).
/// </summary>
internal static class IlTokens
{
    private static readonly OpCode?[] OneByte = new OpCode?[0x100];
    private static readonly OpCode?[] TwoByte = new OpCode?[0x100];

#pragma warning disable CA1810 // The opcode tables are filled from every OpCodes field, which an initialiser cannot say.
    static IlTokens()
#pragma warning restore CA1810
    {
        foreach (var field in typeof(OpCodes).GetFields(BindingFlags.Public | BindingFlags.Static))
        {
            if (field.GetValue(null) is OpCode code)
            {
                ushort value = unchecked((ushort)code.Value);
                if (code.Size == 1)
                {
                    OneByte[value] = code;
                }
                else
                {
                    TwoByte[value & 0xFF] = code;
                }
            }
        }
    }

    /// <summary>The tokens of <paramref name="il"/>, in order.</summary>
    public static IEnumerable<int> Of(byte[] il)
    {
        int i = 0;
        while (i < il.Length)
        {
            OpCode code = il[i] == 0xFE
                ? TwoByte[il[++i]] ?? throw new InvalidOperationException(FormattableString.Invariant($"unknown two-byte opcode at {i}"))
                : OneByte[il[i]] ?? throw new InvalidOperationException(FormattableString.Invariant($"unknown opcode at {i}"));
            i++;
            if (code.OperandType is OperandType.InlineMethod or OperandType.InlineField or OperandType.InlineType or OperandType.InlineTok)
            {
                yield return BitConverter.ToInt32(il, i);
            }

            i += OperandSize(code.OperandType, il, i);
        }
    }

    private static int OperandSize(OperandType type, byte[] il, int at) => type switch
    {
        OperandType.InlineNone => 0,
        OperandType.ShortInlineBrTarget or OperandType.ShortInlineI or OperandType.ShortInlineVar => 1,
        OperandType.InlineVar => 2,
        OperandType.InlineI8 or OperandType.InlineR => 8,
        OperandType.InlineSwitch => 4 + (4 * BitConverter.ToInt32(il, at)),
        _ => 4,
    };
}
