using System;
using System.Threading;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Members;

/// <summary>A compression member: a material, a cross-section, a system length and its restraint.</summary>
/// <remarks>
/// <para>Validated at construction: the length must be finite and positive, and every brace must lie strictly inside
/// the member. The effective lengths follow: K × the longest braced segment about each axis and against twisting.</para>
/// <para>Thread safety: immutable reference type; safe to share between threads.</para>
/// </remarks>
[Immutable]
public sealed class Member
{
    private Member(string name, Material material, Section section, Length length, Restraint restraint)
    {
        Name = name;
        Material = material;
        Section = section;
        Length = length;
        Restraint = restraint;
        double l = Si.Meters(length, nameof(length), "Member length");
        LengthM = l;
        EffectiveLengthYM = restraint.AboutY.BucklingFactor * restraint.AboutY.LongestSegmentM(l, "y", nameof(restraint));
        EffectiveLengthZM = restraint.AboutZ.BucklingFactor * restraint.AboutZ.LongestSegmentM(l, "z", nameof(restraint));
        EffectiveLengthTorsionalM = restraint.Torsional.BucklingFactor * restraint.Torsional.LongestSegmentM(l, "the member axis (twist)", nameof(restraint));
        _resolved = new ResolvedMember(this);   // resolved once: every check reads these SI doubles
    }

    private readonly ResolvedMember _resolved;

    // The EN 1995-1-1 size factors kh for bending about y (depth h) and z (width b): constants of the member's section and
    // material that cost two powers, so the timber method computes them on first use and keeps them here (NaN: not yet).
    // Stored as the double's bits through Volatile so that a read never sees half a value on any platform; two threads
    // that race compute the same bits, so either write is right.
    private long _sizeFactorYBits = NotYet, _sizeFactorZBits = NotYet;
    private static readonly long NotYet = BitConverter.DoubleToInt64Bits(double.NaN);

    /// <summary>The size factor kh about y (depth) or z (width) computed by <paramref name="compute"/> on first use and
    /// kept with the member (it depends only on the section and the material, which a member never changes).</summary>
    internal double SizeFactor(bool aboutY, Func<Member, bool, double> compute)
    {
        ref long slot = ref aboutY ? ref _sizeFactorYBits : ref _sizeFactorZBits;
        long bits = Volatile.Read(ref slot);
        if (bits != NotYet) return BitConverter.Int64BitsToDouble(bits);
        double kh = compute(this, aboutY);
        Volatile.Write(ref slot, BitConverter.DoubleToInt64Bits(kh));
        return kh;
    }

    /// <summary>The member in SI doubles, resolved once at construction (read by reference: no copy per check).</summary>
    internal ref readonly ResolvedMember Resolved => ref _resolved;

    /// <summary>Creates a member.</summary>
    /// <param name="section">The cross-section.</param>
    /// <param name="material">The material.</param>
    /// <param name="length">The system length between end restraints.</param>
    /// <param name="restraint">The restraint about each axis and against twisting.</param>
    /// <param name="name">A name for reports; "member" if null or empty.</param>
    /// <returns>The member.</returns>
    /// <exception cref="ArgumentNullException">A reference argument is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The length is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">A brace is not strictly inside the member.</exception>
    public static Member Create(Section section, Material material, Length length, Restraint restraint, string? name = null)
    {
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(material);
        ArgumentNullException.ThrowIfNull(restraint);
        return new Member(string.IsNullOrWhiteSpace(name) ? "member" : name, material, section, length, restraint);
    }

    /// <summary>The member's name, as reports show it.</summary>
    public string Name { get; }

    /// <summary>The material.</summary>
    public Material Material { get; }

    /// <summary>The cross-section.</summary>
    public Section Section { get; }

    /// <summary>The system length between end restraints.</summary>
    public Length Length { get; }

    /// <summary>The restraint about each axis and against twisting.</summary>
    public Restraint Restraint { get; }

    internal double LengthM { get; }
    internal double EffectiveLengthYM { get; }
    internal double EffectiveLengthZM { get; }
    internal double EffectiveLengthTorsionalM { get; }

    /// <summary>Effective (buckling) length about y: K × the longest braced segment.</summary>
    public Length EffectiveLengthY => Length.FromMeters(EffectiveLengthYM).ToUnit(Length.Unit);

    /// <summary>Effective (buckling) length about z: K × the longest braced segment.</summary>
    public Length EffectiveLengthZ => Length.FromMeters(EffectiveLengthZM).ToUnit(Length.Unit);

    /// <summary>Effective length for torsional and flexural-torsional buckling.</summary>
    public Length EffectiveLengthTorsional => Length.FromMeters(EffectiveLengthTorsionalM).ToUnit(Length.Unit);

    /// <summary>A copy with another length (bracing is re-validated).</summary>
    /// <param name="length">The new length.</param>
    /// <returns>The copy.</returns>
    public Member WithLength(Length length) => new(Name, Material, Section, length, Restraint);

    /// <summary>A copy with another section.</summary>
    /// <param name="section">The new section.</param>
    /// <returns>The copy.</returns>
    public Member WithSection(Section section) => new(Name, Material, Guard.NotNull(section, nameof(section)), Length, Restraint);

    /// <summary>A copy with another material.</summary>
    /// <param name="material">The new material.</param>
    /// <returns>The copy.</returns>
    public Member WithMaterial(Material material) => new(Name, Guard.NotNull(material, nameof(material)), Section, Length, Restraint);

    /// <summary>A copy with another restraint.</summary>
    /// <param name="restraint">The new restraint.</param>
    /// <returns>The copy.</returns>
    public Member WithRestraint(Restraint restraint) => new(Name, Material, Section, Length, Guard.NotNull(restraint, nameof(restraint)));

    /// <summary>A copy with another name.</summary>
    /// <param name="name">The new name.</param>
    /// <returns>The copy.</returns>
    public Member WithName(string name) => new(string.IsNullOrWhiteSpace(name) ? "member" : name, Material, Section, Length, Restraint);

    internal void AddCanonical(CanonicalForm form)
    {
        // The material's, section's and restraint's lines are formed once per object and kept (the same text).
        form.Add("member.name", Name).Add("member.L", Length.Meters)
            .AddSegment(Material.CanonicalSegment).AddSegment(Section.CanonicalSegment).AddSegment(Restraint.CanonicalSegment);
    }

    /// <inheritdoc/>
    public override string ToString() => $"{Name}: {Material.Name}, {Section.Designation}, L = {Si.Given(Length)}";
}
