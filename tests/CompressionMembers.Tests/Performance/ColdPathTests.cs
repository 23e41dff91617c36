using System;
using System.Collections.Generic;
using System.Linq;
using System.Reflection;
using System.Reflection.Emit;
using System.Runtime.CompilerServices;
using CompressionMembers.Methods;

namespace CompressionMembers.Tests.Performance;

/// <summary>
/// The applicability test runs before every check, and the JIT inlines it, with the rules it calls, into the caller's loop:
/// what it holds in line is paid in every check's code. The sentences that explain a refusal must therefore be built in
/// separate methods marked <see cref="MethodImplOptions.NoInlining"/>. Built in line (interpolated strings), they made the
/// EN 1995-1-2 applicability test 1,363 bytes of machine code inside the benchmark's loop, spilled the loop's registers
/// and spent the caller's inlining budget, so that the caller's own code after the check (the benchmark's sum of the
/// result) was left as a call with a 240-byte copy of the result (seen with DOTNET_JitDisasm; docs/performance.md). This
/// test reads the IL of every closed-form method's <c>AppliesTo</c> and <c>Evaluate</c>, and of the library methods they
/// call that the JIT may inline, and fails on any string building there.
/// </summary>
public class ColdPathTests
{
    private static readonly Dictionary<short, OpCode> OpCodesByValue = typeof(OpCodes)
        .GetFields(BindingFlags.Public | BindingFlags.Static)
        .Select(f => (OpCode)f.GetValue(null)!)
        .ToDictionary(o => o.Value);

    public static TheoryData<string> BuiltInMethods()
    {
        var data = new TheoryData<string>();
        foreach (var t in BuiltInMethodTypes()) data.Add(t.FullName!);
        return data;
    }

    // The closed-form methods, whose checks take tens of nanoseconds. The numerical methods (Methods.Numerical) are left
    // out: their applicability test builds the model they then solve, and a check takes micro- to milliseconds.
    private static IEnumerable<Type> BuiltInMethodTypes() =>
        typeof(IResistanceMethod).Assembly.GetTypes()
            .Where(t => t is { IsClass: true, IsAbstract: false } && typeof(IResistanceMethod).IsAssignableFrom(t)
                && t.Namespace != "CompressionMembers.Methods.Numerical")
            .OrderBy(t => t.FullName, StringComparer.Ordinal);

    [Fact]
    public void EveryClosedFormMethodIsCovered() =>
        Assert.Equal(10, BuiltInMethodTypes().Count());   // Euler, Johnson, secant, Perry–Robertson, EC5, EC5 fire, NDS, EC9, constants, tangent

    [Theory]
    [MemberData(nameof(BuiltInMethods))]
    public void AppliesTo_BuildsNoSentenceInLine(string typeName) =>
        AssertBuildsNoStringInLine(typeName, nameof(IResistanceMethod.AppliesTo), "move the sentence into");

    [Theory]
    [MemberData(nameof(BuiltInMethods))]
    public void Evaluate_BuildsNoStringInLine(string typeName) =>
        AssertBuildsNoStringInLine(typeName, nameof(IResistanceMethod.Evaluate), "trace writing belongs in");

    private static void AssertBuildsNoStringInLine(string typeName, string methodName, string advice)
    {
        var type = typeof(IResistanceMethod).Assembly.GetType(typeName)!;
        var method = type.GetMethod(methodName, BindingFlags.Public | BindingFlags.Instance)!;
        var found = new List<string>();
        Walk(method, method.Name, found, new HashSet<MethodBase>(), depth: 0);
        Assert.True(found.Count == 0,
            $"{type.Name}.{methodName} builds strings in line ({advice} a [MethodImpl(MethodImplOptions.NoInlining)] method):\n  "
            + string.Join("\n  ", found));
    }

    [Fact]
    public void CheckDispatch_CallsTheTimberAndAluminiumCodeMethodsDirectly()
    {
        // Check calls these methods directly after a type test, so that their speed does not depend on the runtime's guess
        // at the shared interface call site (docs/performance.md); the classical methods and the tangent-modulus column
        // stay on the interface path, where their short checks are inlined whole. A new code method of the same kind
        // belongs in the type test; through the interface it still works, only slower in a process that checks several.
        var run = typeof(Check).GetMethod("Run", BindingFlags.NonPublic | BindingFlags.Static)!;
        var tested = TypesTestedIn(run);
        Type[] direct =
        [
            typeof(CompressionMembers.Methods.Timber.Ec5ColumnStability), typeof(CompressionMembers.Methods.Timber.Ec5FireReducedSection), typeof(CompressionMembers.Methods.Timber.NdsColumnStability),
            typeof(CompressionMembers.Methods.Aluminium.Eurocode9Compression), typeof(CompressionMembers.Methods.Aluminium.BucklingConstantMethod),
        ];
        foreach (var t in direct)
            Assert.True(tested.Contains(t), $"Check.Run has no type test for {t.Name}.");
    }

    private static HashSet<Type> TypesTestedIn(MethodBase method)
    {
        var found = new HashSet<Type>();
        byte[] il = method.GetMethodBody()!.GetILAsByteArray()!;
        foreach (var (op, operand) in Instructions(il))
            if (op == OpCodes.Isinst || op == OpCodes.Castclass) found.Add(method.Module.ResolveType(BitConverter.ToInt32(il, operand)));
        return found;
    }

    // Each instruction of a method body: its opcode and where its operand starts.
    private static IEnumerable<(OpCode Op, int Operand)> Instructions(byte[] il)
    {
        int pc = 0;
        while (pc < il.Length)
        {
            short value = il[pc] == 0xFE ? unchecked((short)(0xFE00 | il[pc + 1])) : il[pc];
            pc += il[pc] == 0xFE ? 2 : 1;
            var op = OpCodesByValue[value];
            yield return (op, pc);
            pc += OperandSize(op.OperandType, il, pc);
        }
    }

    [Fact]
    public void TheWalkerFindsStringBuilding()
    {
        // The walker itself: a method that builds an interpolated string in line is found.
        var found = new List<string>();
        Walk(typeof(ColdPathTests).GetMethod(nameof(BuildsInLine), BindingFlags.NonPublic | BindingFlags.Static)!, "BuildsInLine", found,
            new HashSet<MethodBase>(), 0);
        Assert.NotEmpty(found);
    }

    private static string BuildsInLine(int n) => $"n = {n} is out of range";

    private static void Walk(MethodBase method, string path, List<string> found, HashSet<MethodBase> seen, int depth)
    {
        if (!seen.Add(method) || depth > 4) return;
        var body = method.GetMethodBody();
        if (body is null) return;
        byte[] il = body.GetILAsByteArray() ?? [];
        var module = method.Module;
        Type[]? typeArgs = method.DeclaringType is { IsGenericType: true } dt ? dt.GetGenericArguments() : null;
        Type[]? methodArgs = method.IsGenericMethod ? method.GetGenericArguments() : null;
        foreach (var (op, operand) in Instructions(il))
        {
            if (op.OperandType != OperandType.InlineMethod) continue;
            var callee = module.ResolveMethod(BitConverter.ToInt32(il, operand), typeArgs, methodArgs)!;
            string name = $"{callee.DeclaringType?.Name}.{callee.Name}";
            if (BuildsString(callee)) found.Add($"{path} → {name}");
            else if (callee.Module == typeof(IResistanceMethod).Module && Inlinable(callee))
                Walk(callee, $"{path} → {name}", found, seen, depth + 1);
        }
    }

    private static bool BuildsString(MethodBase m) =>
        m.DeclaringType == typeof(DefaultInterpolatedStringHandler)
        || (m.DeclaringType == typeof(string) && m.Name is "Concat" or "Format" or "Join" or "Create")
        || m.DeclaringType == typeof(System.Text.StringBuilder);

    // What the JIT may inline: not marked NoInlining, and small (its default limit is 100 bytes of IL) or marked
    // AggressiveInlining. A sentence built in a larger callee stays in that callee's own code.
    private static bool Inlinable(MethodBase m)
    {
        var flags = m.MethodImplementationFlags;
        if ((flags & MethodImplAttributes.NoInlining) != 0 || m.IsAbstract) return false;
        return (flags & MethodImplAttributes.AggressiveInlining) != 0 || (m.GetMethodBody()?.GetILAsByteArray()?.Length ?? 0) <= 100;
    }

    private static int OperandSize(OperandType t, byte[] il, int pc) => t switch
    {
        OperandType.InlineNone => 0,
        OperandType.ShortInlineBrTarget or OperandType.ShortInlineI or OperandType.ShortInlineVar => 1,
        OperandType.InlineVar => 2,
        OperandType.InlineI8 or OperandType.InlineR => 8,
        OperandType.InlineSwitch => 4 + 4 * BitConverter.ToInt32(il, pc),
        _ => 4,
    };
}
