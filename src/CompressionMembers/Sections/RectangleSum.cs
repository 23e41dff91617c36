using System;

namespace CompressionMembers.Sections;

/// <summary>
/// Area, first and second moments of a shape made of axis-aligned rectangles (added or removed) and root fillets,
/// by the parallel-axis theorem. This is the closed-form route; <see cref="PolygonSection"/> uses Green's theorem
/// instead, and the tests hold one against the other.
/// </summary>
internal struct RectangleSum
{
    private double _a, _sy, _sz, _iyy0, _izz0, _iyz0; // about the reference origin: ∫dA, ∫y, ∫z, ∫z², ∫y², ∫yz

    /// <summary>Adds (sign +1) or removes (sign −1) the rectangle [y0, y1] × [z0, z1].</summary>
    internal void Add(double y0, double y1, double z0, double z1, double sign = 1)
    {
        double b = y1 - y0, h = z1 - z0, a = b * h * sign;
        double yc = 0.5 * (y0 + y1), zc = 0.5 * (z0 + z1);
        _a += a; _sy += a * yc; _sz += a * zc;
        _iyy0 += sign * b * h * h * h / 12 + a * zc * zc;
        _izz0 += sign * h * b * b * b / 12 + a * yc * yc;
        _iyz0 += a * yc * zc;
    }

    /// <summary>
    /// Adds a root fillet (the spandrel between two perpendicular faces and a quarter circle of radius r) whose
    /// corner is at (cy, cz) and which extends into the quadrant (dirY, dirZ) ∈ {−1, +1}².
    /// Area (1 − π/4) r², centroid (10 − 3π) r / (12 − 3π) from each face, second moment about a face
    /// (1 − 5π/16) r⁴ (integration of square minus quarter disc).
    /// </summary>
    internal void AddFillet(double cy, double cz, double dirY, double dirZ, double r)
    {
        if (r <= 0) return;
        double a = (1 - Math.PI / 4) * r * r;
        double w = r * (10 - 3 * Math.PI) / (12 - 3 * Math.PI);
        double iFace = (1 - 5 * Math.PI / 16) * r * r * r * r;
        double iOwn = iFace - a * w * w;
        double yc = cy + dirY * w, zc = cz + dirZ * w;
        // Product moment of the spandrel about its own centroid, from ∫uv over square minus quarter disc.
        double uvFace = r * r * r * r / 4 - QuarterDiscUv(r);
        double iyzOwn = (uvFace - a * w * w) * dirY * dirZ;
        _a += a; _sy += a * yc; _sz += a * zc;
        _iyy0 += iOwn + a * zc * zc;
        _izz0 += iOwn + a * yc * yc;
        _iyz0 += iyzOwn + a * yc * zc;
    }

    // ∫uv dA of the quarter disc centred at (r, r) that lies in [0, r]²: in local polar coordinates about the centre,
    // u = r − ρcosφ, v = r − ρsinφ, φ ∈ [0, π/2]. ∫∫(r − ρc)(r − ρs) ρ dρ dφ = r²·πr²/4 − 2·r·r³/3 + r⁴/8.
    private static double QuarterDiscUv(double r) => Math.PI * r * r * r * r / 4 - 2 * r * r * r * r / 3 + r * r * r * r / 8;

    internal readonly double Area => _a;
    internal readonly double CentroidY => _sy / _a;
    internal readonly double CentroidZ => _sz / _a;
    internal readonly double Iy => _iyy0 - _a * CentroidZ * CentroidZ;
    internal readonly double Iz => _izz0 - _a * CentroidY * CentroidY;
    internal readonly double Iyz => _iyz0 - _a * CentroidY * CentroidZ;
}
