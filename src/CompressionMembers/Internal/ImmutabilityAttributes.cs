using System;

namespace CompressionMembers.Internal;

/// <summary>Marks a type whose instances never change after construction (checked by a reflection test).</summary>
[AttributeUsage(AttributeTargets.Class | AttributeTargets.Struct | AttributeTargets.Interface, Inherited = false)]
internal sealed class ImmutableAttribute : Attribute;

/// <summary>Marks a type whose instances can change after construction (checked by a reflection test).</summary>
[AttributeUsage(AttributeTargets.Class | AttributeTargets.Struct, Inherited = false)]
internal sealed class MutableAttribute : Attribute;
