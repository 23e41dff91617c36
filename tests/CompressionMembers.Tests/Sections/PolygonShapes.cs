using System;
using System.Collections.Generic;
using CompressionMembers.Sections;

namespace CompressionMembers.Tests.Sections;

/// <summary>Closed shapes drawn as polygons, as an independent model of the closed-form sections.</summary>
internal static class PolygonShapes
{
    /// <summary>An I-section with its four root fillets drawn as arcs of <paramref name="segments"/> straight pieces.</summary>
    internal static PolygonSection IWithFillets(double h, double b, double tf, double tw, double r, int segments)
    {
        var pts = new List<SectionPoint>();
        void P(double y, double z) => pts.Add(SectionPoint.FromMillimeters(y, z));
        // Arc of radius r centred at (cy, cz) from angle a0 to a1 (radians), excluding the start point.
        void Arc(double cy, double cz, double a0, double a1)
        {
            for (int i = 1; i <= segments; i++)
            {
                double a = a0 + (a1 - a0) * i / segments;
                P(cy + r * Math.Cos(a), cz + r * Math.Sin(a));
            }
        }
        double zf = h / 2 - tf, yw = tw / 2;
        P(-b / 2, -h / 2); P(b / 2, -h / 2); P(b / 2, -zf);
        P(yw + r, -zf); Arc(yw + r, -zf + r, -Math.PI / 2, -Math.PI);
        P(yw, zf - r); Arc(yw + r, zf - r, Math.PI, Math.PI / 2);
        P(b / 2, zf); P(b / 2, h / 2); P(-b / 2, h / 2); P(-b / 2, zf);
        P(-yw - r, zf); Arc(-yw - r, zf - r, Math.PI / 2, 0);
        P(-yw, -zf + r); Arc(-yw - r, -zf + r, 0, -Math.PI / 2);
        P(-b / 2, -zf);
        // Remove consecutive duplicates the arc end points create.
        var clean = new List<SectionPoint>();
        foreach (var p in pts)
            if (clean.Count == 0 || Math.Abs(clean[^1].Y.Millimeters - p.Y.Millimeters) > 1e-12 || Math.Abs(clean[^1].Z.Millimeters - p.Z.Millimeters) > 1e-12)
                clean.Add(p);
        return new PolygonSection(clean);
    }
}
