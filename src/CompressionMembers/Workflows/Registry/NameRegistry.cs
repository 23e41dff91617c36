using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Methods;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Catalogues;

namespace CompressionMembers.Workflows.Registry;

/// <summary>The names that schedules and result files use for materials, methods and catalogued sections, resolved to
/// the library's values. Immutable: <c>With…</c> returns an extended copy.</summary>
/// <remarks>
/// <para>Names ignore case. <see cref="Default"/> holds the classical methods ("euler", "johnson", "secant",
/// "perry-robertson"), the material "generic-steel" and the built-in catalogues. Families add their own names with one
/// line each, for example <c>NameRegistry.Default.WithMethod("ec5-column", ResistanceMethods.…)</c>.</para>
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
        .WithMaterial("generic-steel", IsotropicMaterial.GenericStructuralSteel)
        // Timber and aluminium materials and methods are registered here, one line each, when those families land.
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
