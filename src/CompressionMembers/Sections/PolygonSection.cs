using System;
using System.Collections.Generic;
using System.Linq;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A general section: a simple polygon with optional polygonal holes, properties by Green's theorem.</summary>
/// <remarks>
/// <para>Area, first and second moments and the product moment come from the line integrals of Green's theorem over
/// each ring (outer ring counted positive, holes negative, whatever the order the vertices were given in).
/// The outline must be simple (no edge crosses another); each hole must lie strictly inside the outline and
/// apart from the other holes.</para>
/// <para>A polygon's St Venant torsion constant, warping constant and shear centre have no closed form: give them
/// if a torsional check needs them; otherwise they are unknown and torsional methods refuse the section.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class PolygonSection : Section
{
    private readonly SectionPoint[] _outline;
    private readonly SectionPoint[][] _holes;

    /// <summary>Creates a polygonal section.</summary>
    /// <param name="outline">The outer ring, at least three vertices, in either direction; not closed (the last vertex joins the first).</param>
    /// <param name="holes">Inner rings, each at least three vertices; null or empty for none.</param>
    /// <param name="torsionConstant">St Venant torsion constant It if known.</param>
    /// <param name="warpingConstantMm6">Warping constant Iw in mm⁶ if known.</param>
    /// <param name="shearCentre">Shear-centre position in the reference coordinates if known.</param>
    /// <exception cref="ArgumentNullException"><paramref name="outline"/> is null.</exception>
    /// <exception cref="ArgumentException">A ring has fewer than three vertices, repeats a vertex, crosses itself or
    /// another ring, encloses no area, or a hole is not inside the outline.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A coordinate or a given constant is not finite, or a constant is not positive.</exception>
    public PolygonSection(IReadOnlyList<SectionPoint> outline, IReadOnlyList<IReadOnlyList<SectionPoint>>? holes = null,
        AreaMomentOfInertia? torsionConstant = null, double? warpingConstantMm6 = null, SectionPoint? shearCentre = null)
        : base(Compute(outline, holes, torsionConstant, warpingConstantMm6, shearCentre))
    {
        _outline = outline.ToArray();
        _holes = holes is null ? [] : holes.Select(h => h.ToArray()).ToArray();
        GivenTorsionConstant = torsionConstant;
        GivenWarpingConstantMm6 = warpingConstantMm6;
        GivenShearCentre = shearCentre;
    }

    /// <summary>The outer ring as given.</summary>
    public IReadOnlyList<SectionPoint> Outline => _outline;

    /// <summary>The holes as given.</summary>
    public IReadOnlyList<IReadOnlyList<SectionPoint>> Holes => _holes;

    /// <summary>The torsion constant given at construction, if any.</summary>
    public AreaMomentOfInertia? GivenTorsionConstant { get; }

    /// <summary>The warping constant given at construction (mm⁶), if any.</summary>
    public double? GivenWarpingConstantMm6 { get; }

    /// <summary>The shear-centre position given at construction, if any.</summary>
    public SectionPoint? GivenShearCentre { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.Polygon;

    /// <inheritdoc/>
    public override string Designation =>
        $"polygon of {_outline.Length} vertices" + (_holes.Length > 0 ? $" with {_holes.Length} hole{(_holes.Length > 1 ? "s" : "")}" : "");

    private static (double[] y, double[] z) ToMeters(IReadOnlyList<SectionPoint> ring, string paramName, string what)
    {
        if (ring is null) throw new ArgumentNullException(paramName);
        if (ring.Count < 3)
            throw new ArgumentException($"{what} needs at least 3 vertices; got {ring.Count}.", paramName);
        var y = new double[ring.Count];
        var z = new double[ring.Count];
        for (int i = 0; i < ring.Count; i++)
        {
            y[i] = Si.Meters(ring[i].Y, paramName, $"{what} vertex {i} y", Si.Sign.Any);
            z[i] = Si.Meters(ring[i].Z, paramName, $"{what} vertex {i} z", Si.Sign.Any);
        }
        for (int i = 0; i < y.Length; i++)
        {
            int j = (i + 1) % y.Length;
            if (y[i] == y[j] && z[i] == z[j])
                throw new ArgumentException($"{what} repeats vertex {i} at vertex {j}; remove the duplicate.", paramName);
        }
        return (y, z);
    }

    // Green's theorem sums over one ring: ∫dA, ∫y dA, ∫z dA, ∫z² dA, ∫y² dA, ∫yz dA (signed by orientation).
    internal static (double a, double sy, double sz, double izz, double iyy, double iyz) RingIntegrals(double[] y, double[] z)
    {
        double a = 0, sy = 0, sz = 0, qz = 0, qy = 0, qyz = 0;
        int n = y.Length;
        for (int i = 0; i < n; i++)
        {
            int j = (i + 1) % n;
            double c = y[i] * z[j] - y[j] * z[i];
            a += c;
            sy += (y[i] + y[j]) * c;
            sz += (z[i] + z[j]) * c;
            qz += (z[i] * z[i] + z[i] * z[j] + z[j] * z[j]) * c;
            qy += (y[i] * y[i] + y[i] * y[j] + y[j] * y[j]) * c;
            qyz += (y[i] * z[j] + 2 * y[i] * z[i] + 2 * y[j] * z[j] + y[j] * z[i]) * c;
        }
        return (a / 2, sy / 6, sz / 6, qz / 12, qy / 12, qyz / 24);
    }

    private static SectionProperties Compute(IReadOnlyList<SectionPoint> outline, IReadOnlyList<IReadOnlyList<SectionPoint>>? holes,
        AreaMomentOfInertia? torsionConstant, double? warpingConstantMm6, SectionPoint? shearCentre)
    {
        var (oy, oz) = ToMeters(outline, nameof(outline), "Outline");
        var rings = new List<(double[] y, double[] z, string what)> { (oy, oz, "Outline") };
        if (holes is not null)
            for (int h = 0; h < holes.Count; h++)
            {
                var (hy, hz) = ToMeters(holes[h], nameof(holes), $"Hole {h}");
                rings.Add((hy, hz, $"Hole {h}"));
            }

        foreach (var (y, z, what) in rings)
            if (SelfIntersects(y, z, out int e1, out int e2))
                throw new ArgumentException($"{what} crosses itself: edge {e1} meets edge {e2}. A section outline must be a simple polygon.",
                    what == "Outline" ? nameof(outline) : nameof(holes));

        for (int h = 1; h < rings.Count; h++)
        {
            var (hy, hz, what) = rings[h];
            for (int k = 0; k < hy.Length; k++)
                if (!StrictlyInside(hy[k], hz[k], oy, oz))
                    throw new ArgumentException($"{what} vertex {k} is not inside the outline.", nameof(holes));
            if (RingsCross(hy, hz, oy, oz))
                throw new ArgumentException($"{what} crosses the outline.", nameof(holes));
            for (int g = 1; g < h; g++)
            {
                var (gy, gz, other) = rings[g];
                if (RingsCross(hy, hz, gy, gz) || StrictlyInside(hy[0], hz[0], gy, gz) || StrictlyInside(gy[0], gz[0], hy, hz))
                    throw new ArgumentException($"{what} overlaps {other.ToLowerInvariant()}.", nameof(holes));
            }
        }

        // Integrate about the first outline vertex to keep the sums well conditioned.
        double y0 = oy[0], z0 = oz[0];
        double a = 0, sy = 0, sz = 0, izz = 0, iyy = 0, iyz = 0;
        for (int r = 0; r < rings.Count; r++)
        {
            var y = rings[r].y.Select(v => v - y0).ToArray();
            var z = rings[r].z.Select(v => v - z0).ToArray();
            var m = RingIntegrals(y, z);
            double sign = (m.a >= 0 ? 1 : -1) * (r == 0 ? 1 : -1);
            if (m.a == 0)
                throw new ArgumentException($"{rings[r].what} encloses no area.", r == 0 ? nameof(outline) : nameof(holes));
            a += sign * m.a; sy += sign * m.sy; sz += sign * m.sz; izz += sign * m.izz; iyy += sign * m.iyy; iyz += sign * m.iyz;
        }
        if (!(a > 0))
            throw new ArgumentException("The holes leave the polygon no area.", nameof(holes));
        double yc = sy / a, zc = sz / a;
        double iy = izz - a * zc * zc, iz = iyy - a * yc * yc, ipr = iyz - a * yc * zc;

        double it = torsionConstant is { } tc ? Si.MetersToFourth(tc, nameof(torsionConstant), "Torsion constant") : double.NaN;
        double iw = warpingConstantMm6 is { } w ? Guard.NonNegative(w, nameof(warpingConstantMm6), "mm⁶", "Warping constant") * 1e-18 : double.NaN;
        double scy = double.NaN, scz = double.NaN;
        if (shearCentre is { } sc)
        {
            scy = Si.Meters(sc.Y, nameof(shearCentre), "Shear centre y", Si.Sign.Any) - y0;
            scz = Si.Meters(sc.Z, nameof(shearCentre), "Shear centre z", Si.Sign.Any) - z0;
        }
        var ys = oy.Select(v => v - y0).ToArray();
        var zs = oz.Select(v => v - z0).ToArray();
        var p = SectionProperties.FromReference(a, yc, zc, iy, iz, ipr, ys, zs, 0, it, iw, scy, scz);
        return p with { CentroidYM = yc + y0, CentroidZM = zc + z0 };
    }

    private static bool SelfIntersects(double[] y, double[] z, out int e1, out int e2)
    {
        int n = y.Length;
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j < n; j++)
            {
                if (j == i + 1 || (i == 0 && j == n - 1)) continue; // adjacent edges share a vertex
                if (SegmentsTouch(y[i], z[i], y[(i + 1) % n], z[(i + 1) % n], y[j], z[j], y[(j + 1) % n], z[(j + 1) % n]))
                { e1 = i; e2 = j; return true; }
            }
        e1 = e2 = -1;
        return false;
    }

    private static bool RingsCross(double[] ay, double[] az, double[] by, double[] bz)
    {
        for (int i = 0; i < ay.Length; i++)
            for (int j = 0; j < by.Length; j++)
                if (SegmentsTouch(ay[i], az[i], ay[(i + 1) % ay.Length], az[(i + 1) % ay.Length],
                                  by[j], bz[j], by[(j + 1) % by.Length], bz[(j + 1) % by.Length]))
                    return true;
        return false;
    }

    private static double Cross(double ay, double az, double by, double bz, double cy, double cz) =>
        (by - ay) * (cz - az) - (bz - az) * (cy - ay);

    private static bool OnSegment(double ay, double az, double by, double bz, double py, double pz) =>
        Math.Min(ay, by) <= py && py <= Math.Max(ay, by) && Math.Min(az, bz) <= pz && pz <= Math.Max(az, bz);

    // Closed segments [p1 p2] and [p3 p4] share a point (crossing, touching or overlapping).
    private static bool SegmentsTouch(double y1, double z1, double y2, double z2, double y3, double z3, double y4, double z4)
    {
        double d1 = Cross(y3, z3, y4, z4, y1, z1), d2 = Cross(y3, z3, y4, z4, y2, z2);
        double d3 = Cross(y1, z1, y2, z2, y3, z3), d4 = Cross(y1, z1, y2, z2, y4, z4);
        if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) return true;
        return (d1 == 0 && OnSegment(y3, z3, y4, z4, y1, z1)) || (d2 == 0 && OnSegment(y3, z3, y4, z4, y2, z2))
            || (d3 == 0 && OnSegment(y1, z1, y2, z2, y3, z3)) || (d4 == 0 && OnSegment(y1, z1, y2, z2, y4, z4));
    }

    // Ray casting; points on the boundary count as outside.
    private static bool StrictlyInside(double py, double pz, double[] y, double[] z)
    {
        bool inside = false;
        int n = y.Length;
        for (int i = 0, j = n - 1; i < n; j = i++)
        {
            if (Cross(y[j], z[j], y[i], z[i], py, pz) == 0 && OnSegment(y[j], z[j], y[i], z[i], py, pz)) return false;
            if ((z[i] > pz) != (z[j] > pz) && py < (y[j] - y[i]) * (pz - z[i]) / (z[j] - z[i]) + y[i]) inside = !inside;
        }
        return inside;
    }

    internal override void AddCanonical(CanonicalForm form)
    {
        form.Add("section.kind", Kind.ToString());
        for (int i = 0; i < _outline.Length; i++)
            form.Add($"section.outline.{i}.y", _outline[i].Y.Meters).Add($"section.outline.{i}.z", _outline[i].Z.Meters);
        for (int h = 0; h < _holes.Length; h++)
            for (int i = 0; i < _holes[h].Length; i++)
                form.Add($"section.hole{h}.{i}.y", _holes[h][i].Y.Meters).Add($"section.hole{h}.{i}.z", _holes[h][i].Z.Meters);
        form.Add("section.It", Props.TorsionConstantM4).Add("section.Iw", Props.WarpingConstantM6)
            .Add("section.scy", Props.ShearCentreYM).Add("section.scz", Props.ShearCentreZM);
    }
}
