namespace CompressionMembers.Methods.Common;

// Which caller a method's kernel is compiled for. A kernel written once as Kernel<TEntry> (TEntry one of the two structs
// below) is compiled by the runtime once per struct, and a test `typeof(TEntry) == typeof(CheckEntry)` is a constant in
// each body, so the branch not taken disappears: one source, two machine-code bodies (docs/performance.md, fourth round).
// A kernel ends with CheckNumbers.Accepted<TEntry>, which says what each entry does with numbers a result refuses.

/// <summary>Check's untraced entry: the kernel tests applicability itself, writes no steps, returns null for numbers a
/// result would refuse, and makes no call.</summary>
internal readonly struct CheckEntry;

/// <summary>The method's own entry (its Evaluate, traced or not): applicability already tested by the caller, steps
/// written when traced, a broken result thrown.</summary>
internal readonly struct MethodEntry;
