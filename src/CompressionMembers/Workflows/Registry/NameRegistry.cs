using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Methods;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Catalogues;

namespace CompressionMembers.Workflows.Registry;

/// <summary>The names that schedules and result files use for materials, methods and catalogued sections, resolved to
/// the library's values. Immutable: <c>With…</c> returns an extended copy.</summary>
/// <remarks>
/// <para>Names ignore case. <see cref="Default"/> holds the classical methods ("euler", "johnson", "secant",
/// "perry-robertson"), the numerical ones ("fe-critical", "second-order-elastic"), the timber methods ("ec5-column",
/// "ec5-column-sc2", "ec5-column-sc3", "ec5-fire-r30/r60/r90", "nds-asd", "nds-lrfd") and aluminium methods ("ec9",
/// "aluminium-constants-lrfd", "aluminium-constants-asd", "tangent-modulus"); the materials "generic-steel", the EN 338 /
/// EN 14080 classes ("C24", "GL28h", …), NDS grades ("DF-L-No2", "SPF-No2", "SP-No2-2x4", "glulam-24F-1.8E") and EN AW
/// extrusion alloys ("6082-T6", "6063-T6", …); and the built-in catalogues. Each name is one line of <see cref="Default"/>;
/// users add their own the same way: <c>NameRegistry.Default.WithMaterial("my-oak", myOak)</c>.</para>
/// <para>A section is looked up first as a designation in the registered catalogues (in the order they were added),
/// then parsed as a <see cref="SectionSpec"/>.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class NameRegistry
{
    private readonly ImmutableDictionary<string, Material> _materials;
    private readonly ImmutableDictionary<string, IResistanceMethod> _methods;
    private readonly ImmutableList<SectionCatalogue> _catalogues;

    private NameRegistry(ImmutableDictionary<string, Material> materials, ImmutableDictionary<string, IResistanceMethod> methods, ImmutableList<SectionCatalogue> catalogues)
    {
        _materials = materials;
        _methods = methods;
        _catalogues = catalogues;
    }

    /// <summary>An empty registry.</summary>
    public static NameRegistry Empty { get; } = new(
        ImmutableDictionary.Create<string, Material>(StringComparer.OrdinalIgnoreCase),
        ImmutableDictionary.Create<string, IResistanceMethod>(StringComparer.OrdinalIgnoreCase),
        ImmutableList<SectionCatalogue>.Empty);

    /// <summary>The built-in names: classical methods, the generic steel and the built-in catalogues.</summary>
    public static NameRegistry Default { get; } = Empty
        .WithMethod("euler", ResistanceMethods.Euler)
        .WithMethod("johnson", ResistanceMethods.Johnson)
        .WithMethod("secant", ResistanceMethods.Secant)
        .WithMethod("perry-robertson", ResistanceMethods.PerryRobertsonDefault)
        .WithMethod("fe-critical", ResistanceMethods.FiniteElementCritical)
        .WithMethod("second-order-elastic", ResistanceMethods.SecondOrderElastic)
        .WithMaterial("generic-steel", IsotropicMaterial.GenericStructuralSteel)
        // Timber (one line each): EN 1995-1-1 and NDS methods, EN 338 / EN 14080 classes and NDS grades.
        .WithMethod("ec5-column", ResistanceMethods.Ec5Column)
        .WithMethod("ec5-column-sc2", ResistanceMethods.Ec5ColumnServiceClass2)
        .WithMethod("ec5-column-sc3", ResistanceMethods.Ec5ColumnServiceClass3)
        .WithMethod("ec5-fire-r30", ResistanceMethods.Ec5FireR30)
        .WithMethod("ec5-fire-r60", ResistanceMethods.Ec5FireR60)
        .WithMethod("ec5-fire-r90", ResistanceMethods.Ec5FireR90)
        .WithMethod("nds-asd", ResistanceMethods.NdsColumnAsd)
        .WithMethod("nds-lrfd", ResistanceMethods.NdsColumnLrfd)
        .WithMaterial("C16", TimberGrades.C16)
        .WithMaterial("C18", TimberGrades.C18)
        .WithMaterial("C24", TimberGrades.C24)
        .WithMaterial("C30", TimberGrades.C30)
        .WithMaterial("D30", TimberGrades.D30)
        .WithMaterial("D40", TimberGrades.D40)
        .WithMaterial("GL24h", TimberGrades.GL24h)
        .WithMaterial("GL28h", TimberGrades.GL28h)
        .WithMaterial("GL30h", TimberGrades.GL30h)
        .WithMaterial("GL32h", TimberGrades.GL32h)
        .WithMaterial("GL24c", TimberGrades.GL24c)
        .WithMaterial("GL28c", TimberGrades.GL28c)
        .WithMaterial("GL30c", TimberGrades.GL30c)
        .WithMaterial("DF-L-No2", NdsGrades.DouglasFirLarchNo2)
        .WithMaterial("SPF-No2", NdsGrades.SprucePineFirNo2)
        .WithMaterial("SP-No2-2x4", NdsGrades.SouthernPineNo2TwoByFour)
        .WithMaterial("glulam-24F-1.8E", NdsGrades.Glulam24F18E)
        // Aluminium (one line each): EN 1999-1-1 and buckling-constant methods, EN AW alloys.
        .WithMethod("ec9", ResistanceMethods.Eurocode9)
        .WithMethod("aluminium-constants-lrfd", ResistanceMethods.AluminiumBucklingConstantsLrfd)
        .WithMethod("aluminium-constants-asd", ResistanceMethods.AluminiumBucklingConstantsAsd)
        .WithMethod("tangent-modulus", ResistanceMethods.TangentModulusRambergOsgood)
        .WithMaterial("6060-T5", AluminiumAlloys.EnAw6060T5Extrusion)
        .WithMaterial("6060-T6", AluminiumAlloys.EnAw6060T6Extrusion)
        .WithMaterial("6061-T6", AluminiumAlloys.EnAw6061T6Extrusion)
        .WithMaterial("6063-T5", AluminiumAlloys.EnAw6063T5Extrusion)
        .WithMaterial("6063-T6", AluminiumAlloys.EnAw6063T6Extrusion)
        .WithMaterial("6005A-T6", AluminiumAlloys.EnAw6005AT6Extrusion)
        .WithMaterial("6082-T5", AluminiumAlloys.EnAw6082T5Extrusion)
        .WithMaterial("6082-T6", AluminiumAlloys.EnAw6082T6Extrusion)
        .WithMaterial("6082-T6-over-5mm", AluminiumAlloys.EnAw6082T6ExtrusionOver5mm)
        .WithMaterial("7020-T6", AluminiumAlloys.EnAw7020T6Extrusion)
        .WithCatalogue(SectionCatalogues.MetricSawnTimber)
        .WithCatalogue(SectionCatalogues.Glulam)
        .WithCatalogue(SectionCatalogues.UsDressedLumber)
        .WithCatalogue(SectionCatalogues.AluminiumGenericShapes);

    /// <summary>A copy with a material under a name (replacing any material of that name).</summary>
    /// <param name="name">The name, such as "C24"; not empty.</param>
    /// <param name="material">The material.</param>
    /// <returns>The extended registry.</returns>
    /// <exception cref="ArgumentException">The name is empty.</exception>
    /// <exception cref="ArgumentNullException">The material is null.</exception>
    public NameRegistry WithMaterial(string name, Material material)
    {
        ArgumentNullException.ThrowIfNull(material);
        return new(_materials.SetItem(Key(name), material), _methods, _catalogues);
    }

    /// <summary>A copy with a method under a name (replacing any method of that name).</summary>
    /// <param name="name">The name, such as "johnson"; not empty.</param>
    /// <param name="method">The method.</param>
    /// <returns>The extended registry.</returns>
    /// <exception cref="ArgumentException">The name is empty.</exception>
    /// <exception cref="ArgumentNullException">The method is null.</exception>
    public NameRegistry WithMethod(string name, IResistanceMethod method)
    {
        ArgumentNullException.ThrowIfNull(method);
        return new(_materials, _methods.SetItem(Key(name), method), _catalogues);
    }

    /// <summary>A copy with a catalogue whose designations schedules may use.</summary>
    /// <param name="catalogue">The catalogue.</param>
    /// <returns>The extended registry.</returns>
    /// <exception cref="ArgumentNullException">The catalogue is null.</exception>
    public NameRegistry WithCatalogue(SectionCatalogue catalogue)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        return new(_materials, _methods, _catalogues.Add(catalogue));
    }

    /// <summary>The material names, sorted.</summary>
    public IReadOnlyList<string> MaterialNames => Sorted(_materials.Keys);

    /// <summary>The method names, sorted.</summary>
    public IReadOnlyList<string> MethodNames => Sorted(_methods.Keys);

    /// <summary>The registered catalogues, in the order added.</summary>
    public IReadOnlyList<SectionCatalogue> Catalogues => _catalogues;

    /// <summary>Finds a material.</summary>
    /// <param name="name">The name.</param>
    /// <param name="material">The material, if found.</param>
    /// <returns>Whether it was found.</returns>
    public bool TryGetMaterial(string name, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out Material? material)
    {
        material = null;
        return !string.IsNullOrWhiteSpace(name) && _materials.TryGetValue(name.Trim(), out material);
    }

    /// <summary>Finds a method.</summary>
    /// <param name="name">The name.</param>
    /// <param name="method">The method, if found.</param>
    /// <returns>Whether it was found.</returns>
    public bool TryGetMethod(string name, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out IResistanceMethod? method)
    {
        method = null;
        return !string.IsNullOrWhiteSpace(name) && _methods.TryGetValue(name.Trim(), out method);
    }

    /// <summary>The material of a name.</summary>
    /// <param name="name">The name.</param>
    /// <returns>The material.</returns>
    /// <exception cref="KeyNotFoundException">No material has that name; the message lists the known names.</exception>
    public Material Material(string name) => TryGetMaterial(name, out var m) ? m
        : throw new KeyNotFoundException($"Unknown material \"{name}\"; known materials: {string.Join(", ", MaterialNames)}. Register your own with WithMaterial.");

    /// <summary>The method of a name.</summary>
    /// <param name="name">The name.</param>
    /// <returns>The method.</returns>
    /// <exception cref="KeyNotFoundException">No method has that name; the message lists the known names.</exception>
    public IResistanceMethod Method(string name) => TryGetMethod(name, out var m) ? m
        : throw new KeyNotFoundException($"Unknown method \"{name}\"; known methods: {string.Join(", ", MethodNames)}. Register your own with WithMethod.");

    /// <summary>The section of a catalogue designation or a <see cref="SectionSpec"/>.</summary>
    /// <param name="text">A designation of a registered catalogue, such as "glulam 140x450", or a spec such as "rect 90x140".</param>
    /// <returns>The section.</returns>
    /// <exception cref="FormatException">Neither a designation nor a spec.</exception>
    /// <exception cref="ArgumentException">The spec's dimensions do not make a valid section.</exception>
    public Section Section(string text)
    {
        if (string.IsNullOrWhiteSpace(text)) throw new FormatException($"The section is empty; give a catalogue designation or a spec ({SectionSpec.Forms}).");
        foreach (var c in _catalogues)
            if (c.TryFind(text, out var e)) return e.Section;
        return SectionSpec.Parse(text);
    }

    /// <summary>The registered name of a method instance, if it is registered.</summary>
    /// <param name="method">The method.</param>
    /// <param name="name">Its name, if found.</param>
    /// <returns>Whether it was found.</returns>
    public bool TryGetMethodName(IResistanceMethod method, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out string? name)
    {
        foreach (var k in MethodNames)
            if (ReferenceEquals(_methods[k], method)) { name = k; return true; }
        name = null;
        return false;
    }

    /// <summary>The registered name of a material instance, if it is registered.</summary>
    /// <param name="material">The material.</param>
    /// <param name="name">Its name, if found.</param>
    /// <returns>Whether it was found.</returns>
    public bool TryGetMaterialName(Material material, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out string? name)
    {
        foreach (var k in MaterialNames)
            if (ReferenceEquals(_materials[k], material)) { name = k; return true; }
        name = null;
        return false;
    }

    private static string Key(string name)
    {
        if (string.IsNullOrWhiteSpace(name)) throw new ArgumentException("A registry name must not be empty.", nameof(name));
        return name.Trim();
    }

    private static string[] Sorted(IEnumerable<string> keys)
    {
        var list = new List<string>(keys);
        list.Sort(StringComparer.OrdinalIgnoreCase);
        return list.ToArray();
    }
}
