using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Reporting;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Catalogues;
using UnitsNet;

namespace CompressionMembers.Workflows.Tables;

/// <summary>Design resistance against effective length for a set of sections, one material and one method: the table
/// an engineer reads a column size from. Renders as Markdown and CSV; the Plotting package draws it as a chart.</summary>
/// <remarks>
/// <para>Each cell is the method's design resistance of a pinned–pinned member (K = 1) whose length is the effective
/// length of the column, under the given actions (concentric 1 kN by default; the resistance of a concentric check does
/// not depend on the demand). A cell where the method does not apply is NaN and prints as "n/a".</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class CapacityTable
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;
    private readonly CatalogueEntry[] _sections;
    private readonly Length[] _lengths;
    private readonly double[][] _resistanceN;

    private CapacityTable(CatalogueEntry[] sections, Length[] lengths, double[][] resistanceN, Material material, IResistanceMethod method)
    {
        _sections = sections;
        _lengths = lengths;
        _resistanceN = resistanceN;
        Material = material;
        Method = method;
    }

    /// <summary>Computes a table.</summary>
    /// <param name="sections">The sections (rows).</param>
    /// <param name="material">The material.</param>
    /// <param name="method">The method.</param>
    /// <param name="effectiveLengths">The effective lengths (columns), each greater than 0.</param>
    /// <param name="actions">The actions (concentric 1 kN if null): give eccentricities here for an eccentric table.</param>
    /// <param name="options">Cores, progress, cancellation.</param>
    /// <returns>The table.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">There is no section or no length.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A length is not finite or not positive.</exception>
    public static CapacityTable Compute(IEnumerable<CatalogueEntry> sections, Material material, IResistanceMethod method,
        IEnumerable<Length> effectiveLengths, DesignActions? actions = null, BatchOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(sections);
        ArgumentNullException.ThrowIfNull(material);
        ArgumentNullException.ThrowIfNull(method);
        ArgumentNullException.ThrowIfNull(effectiveLengths);
        var secs = new List<CatalogueEntry>(sections).ToArray();
        var lens = new List<Length>(effectiveLengths).ToArray();
        if (secs.Length == 0) throw new ArgumentException("A capacity table needs at least one section.", nameof(sections));
        if (lens.Length == 0) throw new ArgumentException("A capacity table needs at least one effective length.", nameof(effectiveLengths));
        foreach (var l in lens) Si.Meters(l, nameof(effectiveLengths), "Effective length");
        var ra = ResolvedActions.From(actions ?? DesignActions.Compression(Force.FromKilonewtons(1), "unit load"));
        var rows = BatchEvaluator.Run(secs, (e, _) =>
        {
            var row = new double[lens.Length];
            var m = Member.Create(e.Section, material, lens[0], Restraint.PinnedBothAxes, e.Designation);
            for (int j = 0; j < lens.Length; j++)
            {
                var rm = ResolvedMember.From(j == 0 ? m : m.WithLength(lens[j]));
                // Applicability asked once: an inapplicable cell is NaN, an applicable one is evaluated directly.
                row[j] = method.AppliesTo(rm, ra).IsApplicable ? method.Evaluate(rm, ra, null).DesignResistanceN : double.NaN;
            }
            return row;
        }, options);
        return new CapacityTable(secs, lens, [.. rows], material, method);
    }

    /// <summary>The sections (rows).</summary>
    public IReadOnlyList<CatalogueEntry> Sections => _sections;

    /// <summary>The effective lengths (columns).</summary>
    public IReadOnlyList<Length> EffectiveLengths => _lengths;

    /// <summary>The material.</summary>
    public Material Material { get; }

    /// <summary>The method.</summary>
    public IResistanceMethod Method { get; }

    /// <summary>The design resistance of section <paramref name="row"/> at length <paramref name="column"/>, N (NaN where the method does not apply).</summary>
    /// <param name="row">Section index.</param>
    /// <param name="column">Length index.</param>
    /// <returns>The resistance in N.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    public double ResistanceN(int row, int column)
    {
        if ((uint)row >= (uint)_sections.Length) throw new ArgumentOutOfRangeException(nameof(row), row, $"Row must be from 0 to {_sections.Length - 1}; got {row}.");
        if ((uint)column >= (uint)_lengths.Length) throw new ArgumentOutOfRangeException(nameof(column), column, $"Column must be from 0 to {_lengths.Length - 1}; got {column}.");
        return _resistanceN[row][column];
    }

    private string Cell(int i, int j) => double.IsNaN(_resistanceN[i][j]) ? "n/a" : NumberFormat.Number(_resistanceN[i][j] / 1e3);

    private static string LengthHead(Length l) => "L_cr " + Guard.Show(l.Value) + " " + l.ToString("a", Inv);

    /// <summary>The table as Markdown: a title, the method and material, and one row per section (resistance in kN).</summary>
    /// <returns>The Markdown text; lines end with "\n".</returns>
    public string ToMarkdown()
    {
        var sb = new StringBuilder();
        sb.Append("### Design resistance N_Rd (kN) against effective length\n\n");
        sb.Append("Method: ").Append(Method.Identity.ToString()).Append("  \n");
        sb.Append("Material: ").Append(Material.Name).Append(" (").Append(Material.Source).Append(")  \n");
        sb.Append("Library: CompressionMembers ").Append(LibraryInfo.Version).Append("\n\n");
        sb.Append("| section |");
        foreach (var l in _lengths) sb.Append(' ').Append(LengthHead(l)).Append(" |");
        sb.Append("\n|---|");
        foreach (var _ in _lengths) sb.Append("---:|");
        sb.Append('\n');
        for (int i = 0; i < _sections.Length; i++)
        {
            sb.Append("| ").Append(_sections[i].Designation.Replace("|", "\\|", StringComparison.Ordinal)).Append(" |");
            for (int j = 0; j < _lengths.Length; j++) sb.Append(' ').Append(Cell(i, j)).Append(" |");
            sb.Append('\n');
        }
        sb.Append('\n').Append(LibraryInfo.Caution).Append('\n');
        return sb.ToString();
    }

    /// <summary>The table as CSV: <c>section,L_cr_mm=…</c> columns, resistances in kN (shortest round-trip form; empty where
    /// the method does not apply); text cells that look like formulas are escaped. Lines end with "\n".</summary>
    /// <returns>The CSV text.</returns>
    public string ToCsv()
    {
        var text = new StringBuilder();
        var csv = new CsvRecordWriter(text);
        csv.Text("section");
        for (int j = 0; j < _lengths.Length; j++) csv.Text("N_Rd_kN@L_cr_mm=" + _lengths[j].Millimeters.ToString("R", Inv));
        csv.EndRecord();
        for (int i = 0; i < _sections.Length; i++)
        {
            csv.Text(_sections[i].Designation);
            for (int j = 0; j < _lengths.Length; j++)
            {
                if (double.IsNaN(_resistanceN[i][j])) csv.Text("");
                else csv.Number(_resistanceN[i][j] / 1e3);
            }
            csv.EndRecord();
        }
        return text.ToString();
    }
}
