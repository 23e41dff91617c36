using System.Collections.Generic;
using CompressionMembers.Internal;

namespace CompressionMembers.Methods;

/// <summary>Who a method is: its name, the standard or source, the edition, the clause, and the settings it was
/// created with (partial factors and other values a national annex can change).</summary>
/// <remarks>Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class MethodIdentity
{
    private readonly MethodSetting[] _settings;

    /// <summary>Creates an identity.</summary>
    /// <param name="name">Method name, such as "EN 1995-1-1 column stability".</param>
    /// <param name="standard">Standard or source, such as "EN 1995-1-1".</param>
    /// <param name="edition">Edition, such as "2004+A2:2014".</param>
    /// <param name="clause">Clause, such as "6.3.2".</param>
    /// <param name="settings">Settings the method was created with.</param>
    /// <exception cref="System.ArgumentException">The name is empty.</exception>
    public MethodIdentity(string name, string standard, string edition, string clause, params MethodSetting[] settings)
    {
        if (string.IsNullOrWhiteSpace(name)) throw new System.ArgumentException("Method name must not be empty.", nameof(name));
        Name = name;
        Standard = standard ?? "";
        Edition = edition ?? "";
        Clause = clause ?? "";
        _settings = settings is null ? [] : (MethodSetting[])settings.Clone();
        _canonicalSettings = _settings;
    }

    /// <summary>An identity whose canonical form (the input fingerprint) is written from
    /// <paramref name="fingerprintSettings"/> instead of the settings a report shows: for a method whose settings' wording
    /// changed after a release, the released lines keep the fingerprints of earlier reports valid
    /// (docs/reproducibility.md).</summary>
    internal MethodIdentity(string name, string standard, string edition, string clause, MethodSetting[] fingerprintSettings, params MethodSetting[] settings)
        : this(name, standard, edition, clause, settings) =>
        _canonicalSettings = (MethodSetting[])fingerprintSettings.Clone();

    private readonly MethodSetting[] _canonicalSettings;

    /// <summary>Method name.</summary>
    public string Name { get; }
    /// <summary>Standard or source.</summary>
    public string Standard { get; }
    /// <summary>Edition.</summary>
    public string Edition { get; }
    /// <summary>Clause.</summary>
    public string Clause { get; }
    /// <summary>Settings the method was created with.</summary>
    public IReadOnlyList<MethodSetting> Settings => _settings;

    /// <summary>"Name (Standard Edition, clause)".</summary>
    /// <returns>The identity in one line.</returns>
    public override string ToString() =>
        Name + (Standard.Length > 0 ? $" ({Standard}{(Edition.Length > 0 ? " " + Edition : "")}{(Clause.Length > 0 ? ", " + Clause : "")})" : "");

    private string? _canonicalSegment;

    /// <summary>The identity's canonical lines, formed on first use and kept (an identity never changes).</summary>
    internal string CanonicalSegment => _canonicalSegment ??= CanonicalForm.Segment(AddCanonical);

    internal void AddCanonical(CanonicalForm form)
    {
        form.Add("method.name", Name).Add("method.standard", Standard).Add("method.edition", Edition).Add("method.clause", Clause);
        foreach (var s in _canonicalSettings) form.Add("method.setting." + s.Symbol, s.Value).Add("method.setting." + s.Symbol + ".note", s.Note);
    }
}
