using System;
using System.Collections.Generic;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Double;
using MathNet.Numerics.LinearAlgebra.Factorization;

namespace CompressionMembers.Methods.Numerical;

/// <summary>
/// Euler–Bernoulli beam elements (cubic Hermite shape functions, degrees of freedom v and θ = dv/dx at each node) with
/// the consistent elastic stiffness ∫EI N''ᵀN'' dx and the consistent geometric stiffness ∫N(x) N'ᵀN' dx, both
/// integrated by 3-point Gauss quadrature (exact for EI and N linear within an element).
/// </summary>
/// <remarks>Sources: the consistent geometric stiffness of the beam element (Przemieniecki, Theory of Matrix Structural
/// Analysis, 1968, ch. 15, from memory); the buckling equation (K − λ Kg) φ = 0 (Timoshenko &amp; Gere §2.1 in weak form).</remarks>
internal sealed class BeamKernel
{
    private static readonly double[] GaussPoint = [0.5 - Math.Sqrt(0.15), 0.5, 0.5 + Math.Sqrt(0.15)];
    private static readonly double[] GaussWeight = [5.0 / 18, 8.0 / 18, 5.0 / 18];

    private BeamKernel(double[] nodes, int[] map, Matrix<double> k, Matrix<double> g, double[] scale, double maxCompression)
    {
        NodesM = nodes;
        Map = map;
        Elastic = k;
        Geometric = g;
        Scale = scale;
        MaxReferenceCompressionN = maxCompression;
    }

    /// <summary>Node positions, m.</summary>
    internal double[] NodesM { get; }
    /// <summary>For each of the 2 × nodes degrees of freedom, its index among the free ones, or −1 where held.</summary>
    internal int[] Map { get; }
    /// <summary>Elastic stiffness on the free degrees of freedom (diagonally scaled).</summary>
    internal Matrix<double> Elastic { get; }
    /// <summary>Geometric stiffness for the reference loads, same scaling.</summary>
    internal Matrix<double> Geometric { get; }
    /// <summary>Diagonal scaling: physical dof = scale × scaled dof.</summary>
    internal double[] Scale { get; }
    /// <summary>The largest reference compression in the member, N.</summary>
    internal double MaxReferenceCompressionN { get; }
    internal int ElementCount => NodesM.Length - 1;

    /// <summary>Builds the mesh and assembles the matrices of a model.</summary>
    internal static BeamKernel Assemble(BucklingModel model)
    {
        double l = model.LengthM;
        var keys = new SortedSet<double> { 0, l };
        double acc = 0;
        foreach (var s in model.SegmentArray) { acc += s.LengthM; keys.Add(Math.Min(acc, l)); }
        foreach (var s in model.SupportArray) keys.Add(s.Position.Meters);
        foreach (var p in model.LoadArray) keys.Add(Math.Min(p.Position.Meters, l));
        var key = new List<double>(keys);
        // Merge points closer than a rounding error (a segment boundary computed by summation against a given level).
        for (int i = key.Count - 2; i >= 1; i--)
            if (key[i + 1] - key[i] < 1e-9 * l) key.RemoveAt(i);
        if (key[^1] != l) key[^1] = l;

        int target = model.ElementCount ?? 48;
        int minPer = model.ElementCount is null ? 2 : 1;
        var nodes = new List<double> { 0 };
        for (int i = 0; i + 1 < key.Count; i++)
        {
            double a = key[i], b = key[i + 1];
            int n = Math.Max(minPer, (int)Math.Round(target * (b - a) / l));
            for (int j = 1; j <= n; j++) nodes.Add(j == n ? b : a + (b - a) * j / n);
        }
        var x = nodes.ToArray();
        int nn = x.Length, ndof = 2 * nn;

        var kFull = new double[ndof, ndof];
        var gFull = new double[ndof, ndof];
        double maxN = 0;
        for (int e = 0; e + 1 < nn; e++)
        {
            double xa = x[e], xb = x[e + 1], h = xb - xa;
            var seg = SegmentAt(model, 0.5 * (xa + xb), out double segStart);
            for (int q = 0; q < 3; q++)
            {
                double xi = GaussPoint[q], w = GaussWeight[q] * h, xq = xa + xi * h;
                double t = Math.Clamp((xq - segStart) / seg.LengthM, 0, 1);
                double ei = seg.ElasticModulusPa * (seg.SecondMomentBottomM4 + t * (seg.SecondMomentTopM4 - seg.SecondMomentBottomM4));
                double n = Compression(model, xq, xb);
                maxN = Math.Max(maxN, n);
                Span<double> d1 = [(-6 * xi + 6 * xi * xi) / h, 1 - 4 * xi + 3 * xi * xi, (6 * xi - 6 * xi * xi) / h, -2 * xi + 3 * xi * xi];
                Span<double> d2 = [(-6 + 12 * xi) / (h * h), (-4 + 6 * xi) / h, (6 - 12 * xi) / (h * h), (-2 + 6 * xi) / h];
                for (int r = 0; r < 4; r++)
                    for (int c = 0; c < 4; c++)
                    {
                        kFull[2 * e + r, 2 * e + c] += w * ei * d2[r] * d2[c];
                        gFull[2 * e + r, 2 * e + c] += w * n * d1[r] * d1[c];
                    }
            }
            maxN = Math.Max(maxN, Compression(model, xa + 1e-12 * h, xb));
        }

        var held = new bool[ndof];
        Restrain(model.Bottom, 0, kFull, held);
        Restrain(model.Top, nn - 1, kFull, held);
        foreach (var s in model.SupportArray)
            Restrain(s.Restraint, NodeAt(x, s.Position.Meters), kFull, held);

        var map = new int[ndof];
        int nf = 0;
        for (int i = 0; i < ndof; i++) map[i] = held[i] ? -1 : nf++;
        var scale = new double[nf];
        for (int i = 0; i < ndof; i++) if (map[i] >= 0) scale[map[i]] = 1 / Math.Sqrt(kFull[i, i]);
        var k = DenseMatrix.Create(nf, nf, 0);
        var g = DenseMatrix.Create(nf, nf, 0);
        for (int i = 0; i < ndof; i++)
        {
            int fi = map[i];
            if (fi < 0) continue;
            for (int j = 0; j < ndof; j++)
            {
                int fj = map[j];
                if (fj < 0) continue;
                k[fi, fj] = kFull[i, j] * scale[fi] * scale[fj];
                g[fi, fj] = gFull[i, j] * scale[fi] * scale[fj];
            }
        }
        return new BeamKernel(x, map, k, g, scale, maxN);
    }

    private static MemberSegment SegmentAt(BucklingModel m, double xM, out double startM)
    {
        double a = 0;
        var segs = m.SegmentArray;
        for (int i = 0; i < segs.Length; i++)
        {
            if (xM <= a + segs[i].LengthM || i == segs.Length - 1) { startM = a; return segs[i]; }
            a += segs[i].LengthM;
        }
        startM = 0;
        return segs[0];
    }

    /// <summary>Reference compression at level x inside an element whose top is at xTop: point loads at or above xTop, plus self-weight above x.</summary>
    private static double Compression(BucklingModel m, double xM, double elementTopM)
    {
        double l = m.LengthM;
        if (!m.HasLoads) return 1.0;
        double n = m.SelfWeight.NewtonsPerMeter * (l - xM);
        foreach (var p in m.LoadArray)
            if (Math.Min(p.Position.Meters, l) >= elementTopM - 1e-9 * l) n += p.Compression.Newtons;
        return n;
    }

    private static int NodeAt(double[] x, double pos)
    {
        int best = 0;
        for (int i = 1; i < x.Length; i++) if (Math.Abs(x[i] - pos) < Math.Abs(x[best] - pos)) best = i;
        return best;
    }

    private static void Restrain(Restraints.EndSpring s, int node, double[,] k, bool[] held)
    {
        int v = 2 * node, t = 2 * node + 1;
        if (s.HoldsTranslation) held[v] = true; else k[v, v] += s.TranslationalNPerM;
        if (s.HoldsRotation) held[t] = true; else k[t, t] += s.RotationalNmPerRad;
    }

    /// <summary>Cholesky factor of the elastic stiffness, or throws a clear error for a mechanism.</summary>
    internal Cholesky<double> Factor()
    {
        if (Elastic.RowCount == 0)
            throw new ArgumentException("Every degree of freedom of the model is held: there is nothing to buckle.", "model");
        Cholesky<double> chol;
        try { chol = Elastic.Cholesky(); }
        catch (ArgumentException) { chol = null!; ThrowMechanism(); }
        // MathNet may return a factor with a zero or tiny pivot for a near-mechanism: check the conditioning as well.
        var d = chol.Factor.Diagonal();
        double min = double.PositiveInfinity, max = 0;
        foreach (double p in d) { min = Math.Min(min, Math.Abs(p)); max = Math.Max(max, Math.Abs(p)); }
        if (!(min > 1e-7 * max)) ThrowMechanism();
        return chol;
    }

    private static void ThrowNoCompression() =>
        throw new ArgumentException("The model carries no compression that could buckle it.", "model");

    private static void ThrowMechanism() =>
        throw new ArgumentException(
            "The supports of the model leave a mechanism: the member can move without bending (the elastic stiffness is singular). " +
            "Hold at least one end against translation and give a rotational restraint, or give two levels a lateral restraint.", "model");

    /// <summary>Solves (K − λ Kg) φ = 0 for the lowest positive λ: K = L Lᵀ, then the symmetric EVD of L⁻¹ Kg L⁻ᵀ, whose
    /// largest eigenvalues μ give λ = 1/μ (MathNet has no generalized symmetric solver).</summary>
    internal void Buckle(int modes, out double[] factors, out double[][] shapes)
    {
        var chol = Factor();
        var lower = chol.Factor;
        int n = lower.RowCount;
        // X = L⁻¹ Kg, then A = L⁻¹ Xᵀ = L⁻¹ Kg L⁻ᵀ.
        var x = ForwardSolve(lower, Geometric);
        var a = ForwardSolve(lower, x.Transpose());
        a = 0.5 * (a + a.Transpose());
        var evd = a.Evd(Symmetricity.Symmetric);
        var mu = evd.EigenValues;
        var vec = evd.EigenVectors;
        double muMax = mu[n - 1].Real;
        if (!(muMax > 0)) ThrowNoCompression();
        var f = new List<double>();
        var s = new List<double[]>();
        for (int i = n - 1; i >= 0 && f.Count < modes; i--)
        {
            double m = mu[i].Real;
            if (!(m > 1e-12 * muMax)) break;
            var y = vec.Column(i);
            var phi = BackSolveTranspose(lower, y);
            f.Add(1 / m);
            s.Add(Deflections(phi));
        }
        factors = f.ToArray();
        shapes = s.ToArray();
    }

    /// <summary>Node deflections of a free-dof vector (scaled), normalised so that the largest |v| is 1 and positive.</summary>
    internal double[] Deflections(Vector<double> scaledFree)
    {
        int nn = NodesM.Length;
        var v = new double[nn];
        double big = 0;
        int at = 0;
        for (int i = 0; i < nn; i++)
        {
            int fi = Map[2 * i];
            v[i] = fi < 0 ? 0 : scaledFree[fi] * Scale[fi];
            if (Math.Abs(v[i]) > big * (1 + 1e-9)) { big = Math.Abs(v[i]); at = i; }
        }
        double norm = big == 0 ? 1 : (v[at] < 0 ? -big : big);
        for (int i = 0; i < nn; i++) v[i] = v[i] / norm + 0.0;
        return v;
    }

    /// <summary>Physical value of dof i of a node from a scaled free vector (0 where held).</summary>
    internal double Physical(Vector<double> scaledFree, int dof)
    {
        int fi = Map[dof];
        return fi < 0 ? 0 : scaledFree[fi] * Scale[fi];
    }

    private static Matrix<double> ForwardSolve(Matrix<double> lower, Matrix<double> b)
    {
        int n = lower.RowCount, m = b.ColumnCount;
        var x = DenseMatrix.Create(n, m, 0);
        for (int c = 0; c < m; c++)
            for (int i = 0; i < n; i++)
            {
                double s = b[i, c];
                for (int k = 0; k < i; k++) s -= lower[i, k] * x[k, c];
                x[i, c] = s / lower[i, i];
            }
        return x;
    }

    private static Vector<double> BackSolveTranspose(Matrix<double> lower, Vector<double> y)
    {
        int n = lower.RowCount;
        var x = Vector<double>.Build.Dense(n);
        for (int i = n - 1; i >= 0; i--)
        {
            double s = y[i];
            for (int k = i + 1; k < n; k++) s -= lower[k, i] * x[k];
            x[i] = s / lower[i, i];
        }
        return x;
    }
}
