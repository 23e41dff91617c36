using CompressionMembers.Restraints;
using UnitsNet;

namespace CompressionMembers.Methods.Numerical;

/// <summary>A support, brace or spring at an intermediate level of a numerical model.</summary>
/// <remarks>The default value has a null <see cref="Restraint"/> and is never held by a model. Thread safety: immutable value type.</remarks>
/// <param name="Position">Level above the bottom end, strictly inside the member.</param>
/// <param name="Restraint">Its rotational and translational stiffness (a rigid brace is <see cref="EndSpring.Pinned"/>).</param>
public readonly record struct ModelSupport(Length Position, EndSpring Restraint);
