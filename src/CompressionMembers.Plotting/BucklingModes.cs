using System;
using System.Collections.Generic;
using CompressionMembers.Members;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using MathNet.Numerics.LinearAlgebra;

namespace CompressionMembers.Plotting;

/// <summary>Flexural buckling modes of a prismatic member about one axis from a finite-element model: Hermite cubic
/// beam elements with the consistent geometric stiffness, K φ = N G φ, reduced through the Cholesky factor of K to a
/// symmetric eigenproblem.</summary>
/// <remarks>
/// <para>Ends follow the axis restraint's end conditions (pinned: no deflection; fixed: no deflection or rotation;
/// guided: no rotation; free: none); intermediate braces stop deflection. A restraint given only as K is modelled as
/// pinned–pinned over the effective length K·L. Source of the element matrices: the standard cubic Hermite beam element
/// with consistent geometric stiffness (e.g. Przemieniecki, Theory of Matrix Structural Analysis, ch. 15; from memory).</para>
/// <para>Thread safety: immutable value.</para>
/// </remarks>
public sealed class BucklingModes
{
    private readonly double[] _x;
    private readonly double[][] _shapes;
    private readonly double[] _loads;

    private BucklingModes(double[] x, double[][] shapes, double[] loads, BucklingAxis axis)
    {
        _x = x;
        _shapes = shapes;
        _loads = loads;
        Axis = axis;
    }

    /// <summary>The axis the member buckles about.</summary>
    public BucklingAxis Axis { get; }

    /// <summary>Node positions from the bottom end, m.</summary>
    public IReadOnlyList<double> PositionsM => _x;

    /// <summary>Elastic critical forces of the modes, lowest first, N.</summary>
    public IReadOnlyList<double> CriticalForcesN => _loads;

    /// <summary>The deflected shape of mode <paramref name="mode"/> at the nodes, scaled to a largest magnitude of 1.</summary>
    /// <param name="mode">Mode index, from 0.</param>
    /// <returns>The shape.</returns>
    public IReadOnlyList<double> Shape(int mode) => _shapes[mode];

    /// <summary>Number of modes computed.</summary>
    public int Count => _loads.Length;

    /// <summary>Computes the lowest modes of a member about an axis.</summary>
    /// <param name="member">The member.</param>
    /// <param name="axis"><see cref="BucklingAxis.Y"/> or <see cref="BucklingAxis.Z"/>.</param>
    /// <param name="modes">How many modes (1 to 6).</param>
    /// <param name="elements">How many elements (8 to 200; 40 by default).</param>
    /// <returns>The modes.</returns>
    /// <exception cref="ArgumentNullException">The member is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The axis, mode count or element count is out of range.</exception>
    public static BucklingModes Compute(Member member, BucklingAxis axis, int modes = 3, int elements = 40)
    {
        ArgumentNullException.ThrowIfNull(member);
        if (axis is not (BucklingAxis.Y or BucklingAxis.Z)) throw new ArgumentOutOfRangeException(nameof(axis), axis, $"The axis must be Y or Z; got {axis}.");
        if (modes < 1 || modes > 6) throw new ArgumentOutOfRangeException(nameof(modes), modes, $"The number of modes must be from 1 to 6; got {modes}.");
        if (elements < 8 || elements > 200) throw new ArgumentOutOfRangeException(nameof(elements), elements, $"The number of elements must be from 8 to 200; got {elements}.");
        var rm = ResolvedMember.From(member);
        var r = axis == BucklingAxis.Y ? member.Restraint.AboutY : member.Restraint.AboutZ;
        double ei = rm.ElasticModulusPa * (axis == BucklingAxis.Y ? rm.SecondMomentYM4 : rm.SecondMomentZM4);
        bool ends = r.BottomEnd is not null && r.TopEnd is not null;
        double length = ends ? rm.LengthM : (axis == BucklingAxis.Y ? rm.EffectiveLengthYM : rm.EffectiveLengthZM);
        var bottom = ends ? r.BottomEnd!.Value : EndCondition.Pinned;
        var top = ends ? r.TopEnd!.Value : EndCondition.Pinned;
        var braces = new List<double>();
        if (ends) foreach (var b in r.BracingPositions) braces.Add(b.Meters);

        int n = elements, dofs = 2 * (n + 1);
        double h = length / n;
        var k = Matrix<double>.Build.Dense(dofs, dofs);
        var g = Matrix<double>.Build.Dense(dofs, dofs);
        double[,] ke = { { 12, 6 * h, -12, 6 * h }, { 6 * h, 4 * h * h, -6 * h, 2 * h * h }, { -12, -6 * h, 12, -6 * h }, { 6 * h, 2 * h * h, -6 * h, 4 * h * h } };
        double[,] ge = { { 36, 3 * h, -36, 3 * h }, { 3 * h, 4 * h * h, -3 * h, -h * h }, { -36, -3 * h, 36, -3 * h }, { 3 * h, -h * h, -3 * h, 4 * h * h } };
        for (int el = 0; el < n; el++)
            for (int i = 0; i < 4; i++)
                for (int j = 0; j < 4; j++)
                {
                    k[2 * el + i, 2 * el + j] += ei / (h * h * h) * ke[i, j];
                    g[2 * el + i, 2 * el + j] += ge[i, j] / (30 * h);
                }
        var fixedDofs = new SortedSet<int>();
        void Fix(EndCondition c, int node)
        {
            if (c is EndCondition.Pinned or EndCondition.Fixed) fixedDofs.Add(2 * node);
            if (c is EndCondition.Fixed or EndCondition.Guided) fixedDofs.Add(2 * node + 1);
        }
        Fix(bottom, 0);
        Fix(top, n);
        foreach (var b in braces) fixedDofs.Add(2 * (int)Math.Round(b / h));
        var free = new List<int>();
        for (int d = 0; d < dofs; d++) if (!fixedDofs.Contains(d)) free.Add(d);
        var kr = Matrix<double>.Build.Dense(free.Count, free.Count, (i, j) => k[free[i], free[j]]);
        var gr = Matrix<double>.Build.Dense(free.Count, free.Count, (i, j) => g[free[i], free[j]]);
        // K φ = N G φ  ⇒  (L⁻¹ G L⁻ᵀ) ψ = (1/N) ψ with K = L Lᵀ and ψ = Lᵀ φ: the largest 1/N are the lowest loads.
        var chol = kr.Cholesky();
        var lInv = chol.Factor.Inverse();
        var a = lInv * gr * lInv.Transpose();
        a = (a + a.Transpose()) / 2;
        var evd = a.Evd(Symmetricity.Symmetric);
        int count = Math.Min(modes, free.Count);
        var loads = new double[count];
        var shapes = new double[count][];
        var x = new double[n + 1];
        for (int i = 0; i <= n; i++) x[i] = i * h;
        for (int m = 0; m < count; m++)
        {
            int col = free.Count - 1 - m; // eigenvalues ascending
            double mu = evd.EigenValues[col].Real;
            loads[m] = 1 / mu;
            var phi = lInv.Transpose() * evd.EigenVectors.Column(col);
            var full = new double[dofs];
            for (int i = 0; i < free.Count; i++) full[free[i]] = phi[i];
            var w = new double[n + 1];
            double max = 0;
            for (int i = 0; i <= n; i++) { w[i] = full[2 * i]; if (Math.Abs(w[i]) > Math.Abs(max)) max = w[i]; }
            for (int i = 0; i <= n; i++) w[i] = max == 0 ? 0 : w[i] / max;
            shapes[m] = w;
        }
        return new BucklingModes(x, shapes, loads, axis);
    }
}
