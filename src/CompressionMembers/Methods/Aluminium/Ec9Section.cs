using System;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Sections;

namespace CompressionMembers.Methods.Aluminium;

/// <summary>One flat part of a section for EN 1999-1-1 classification: its flat width b, thickness t, whether it is an
/// outstand, and the rectangle it occupies (reference axes), so that the effective section can be formed.</summary>
internal struct Ec9Plate
{
    internal double WidthM, ThicknessM, Y0, Y1, Z0, Z1;
    internal bool Outstand, ThicknessAlongZ;
    internal byte Part;
    internal double Beta, Rho;
    internal int Class;
}

/// <summary>The classified section and its effective properties (local buckling only).</summary>
internal struct Ec9Classified
{
    internal int Count;
    internal int Class;
    internal int GoverningPart;
    internal bool IsTube, IsSolid;
    internal double TubeBeta, TubeRho;
    internal double AreaEffM2, IyEffM4, IzEffM4;
    internal double MinThicknessM, MaxThicknessM;
}

/// <summary>Splits the supported sections into flat parts (EN 1999-1-1 6.1.4.3: flat widths between the faces of the
/// adjoining parts or the ends of root fillets) and forms the effective section of 6.1.5, where every class 4 part
/// keeps its width and takes the thickness ρc t over its whole width, reduced symmetrically about its mid-plane.</summary>
internal static class Ec9Section
{
    internal const int MaxPlates = 6;

    internal const byte FlangeOutstand = 0, Web = 1, Leg = 2, Stem = 3, Wall = 4;

    internal static string PartName(byte part) => part switch
    {
        FlangeOutstand => "flange outstand",
        Web => "web",
        Leg => "leg",
        Stem => "stem",
        _ => "wall",
    };

    /// <summary>Whether the section kind can be classified.</summary>
    internal static bool Supports(SectionKind kind) => kind is SectionKind.DoublySymmetricI or SectionKind.Channel or SectionKind.Angle
        or SectionKind.Tee or SectionKind.RectangularHollow or SectionKind.CircularHollow or SectionKind.SolidRectangle or SectionKind.SolidCircle;

    /// <summary>Whether the section is made entirely of radiating outstands (angles, tees), for Table 6.6.</summary>
    internal static bool IsRadiatingOutstands(SectionKind kind) => kind is SectionKind.Angle or SectionKind.Tee;

    /// <summary>Fills the parts of a section; returns their count (0 for solid sections and tubes).</summary>
    internal static int Plates(Section s, Span<Ec9Plate> p, out double minT, out double maxT)
    {
        int n = 0;
        switch (s)
        {
            case ISection i:
            {
                double h = i.Depth.Meters, b = i.FlangeWidth.Meters, tf = i.FlangeThickness.Meters, tw = i.WebThickness.Meters, r = i.RootRadius.Meters;
                double c = (b - tw - 2 * r) / 2, zt = h / 2;
                Add(p, ref n, c, tf, true, true, FlangeOutstand, tw / 2 + r, b / 2, zt - tf, zt);
                Add(p, ref n, c, tf, true, true, FlangeOutstand, -b / 2, -tw / 2 - r, zt - tf, zt);
                Add(p, ref n, c, tf, true, true, FlangeOutstand, tw / 2 + r, b / 2, -zt, -zt + tf);
                Add(p, ref n, c, tf, true, true, FlangeOutstand, -b / 2, -tw / 2 - r, -zt, -zt + tf);
                double hw = h - 2 * tf - 2 * r;
                Add(p, ref n, hw, tw, false, false, Web, -tw / 2, tw / 2, -hw / 2, hw / 2);
                minT = Math.Min(tf, tw); maxT = Math.Max(tf, tw);
                return n;
            }
            case ChannelSection c:
            {
                double h = c.Depth.Meters, b = c.FlangeWidth.Meters, tf = c.FlangeThickness.Meters, tw = c.WebThickness.Meters;
                Add(p, ref n, b - tw, tf, true, true, FlangeOutstand, tw, b, h / 2 - tf, h / 2);
                Add(p, ref n, b - tw, tf, true, true, FlangeOutstand, tw, b, -h / 2, -h / 2 + tf);
                Add(p, ref n, h - 2 * tf, tw, false, false, Web, 0, tw, -h / 2 + tf, h / 2 - tf);
                minT = Math.Min(tf, tw); maxT = Math.Max(tf, tw);
                return n;
            }
            case AngleSection a:
            {
                double h = a.VerticalLeg.Meters, b = a.HorizontalLeg.Meters, t = a.Thickness.Meters;
                Add(p, ref n, b - t, t, true, true, Leg, t, b, 0, t);
                Add(p, ref n, h - t, t, true, false, Leg, 0, t, t, h);
                minT = maxT = t;
                return n;
            }
            case TeeSection te:
            {
                double h = te.Depth.Meters, b = te.FlangeWidth.Meters, tf = te.FlangeThickness.Meters, tw = te.StemThickness.Meters;
                double c = (b - tw) / 2;
                Add(p, ref n, c, tf, true, true, FlangeOutstand, tw / 2, b / 2, h - tf, h);
                Add(p, ref n, c, tf, true, true, FlangeOutstand, -b / 2, -tw / 2, h - tf, h);
                Add(p, ref n, h - tf, tw, true, false, Stem, -tw / 2, tw / 2, 0, h - tf);
                minT = Math.Min(tf, tw); maxT = Math.Max(tf, tw);
                return n;
            }
            case RectangularHollowSection rh:
            {
                double b = rh.Width.Meters, h = rh.Depth.Meters, t = rh.WallThickness.Meters;
                Add(p, ref n, b - 2 * t, t, false, true, Wall, -b / 2 + t, b / 2 - t, h / 2 - t, h / 2);
                Add(p, ref n, b - 2 * t, t, false, true, Wall, -b / 2 + t, b / 2 - t, -h / 2, -h / 2 + t);
                Add(p, ref n, h - 2 * t, t, false, false, Wall, b / 2 - t, b / 2, -h / 2 + t, h / 2 - t);
                Add(p, ref n, h - 2 * t, t, false, false, Wall, -b / 2, -b / 2 + t, -h / 2 + t, h / 2 - t);
                minT = maxT = t;
                return n;
            }
            case CircularHollowSection ch:
                minT = maxT = ch.WallThickness.Meters;
                return 0;
            case RectangleSection re:
                minT = maxT = Math.Min(re.Width.Meters, re.Depth.Meters);
                return 0;
            case CircleSection ci:
                minT = maxT = ci.Diameter.Meters;
                return 0;
            default:
                minT = maxT = double.NaN;
                return -1;
        }
    }

    private static void Add(Span<Ec9Plate> p, ref int n, double b, double t, bool outstand, bool thicknessAlongZ, byte part,
        double y0, double y1, double z0, double z1)
    {
        p[n++] = new Ec9Plate
        {
            WidthM = b, ThicknessM = t, Outstand = outstand, ThicknessAlongZ = thicknessAlongZ, Part = part,
            Y0 = y0, Y1 = y1, Z0 = z0, Z1 = z1, Beta = b / t, Rho = 1, Class = 1,
        };
    }

    /// <summary>Classifies every part under uniform compression and forms the effective section.</summary>
    internal static Ec9Classified Classify(Section s, Span<Ec9Plate> p, double f0Pa, BucklingClass cls, bool welded)
    {
        var r = new Ec9Classified { Count = Plates(s, p, out double minT, out double maxT), Class = 1, GoverningPart = -1 };
        r.MinThicknessM = minT; r.MaxThicknessM = maxT;
        var g = s.Props;
        r.AreaEffM2 = g.AreaM2; r.IyEffM4 = g.IyM4; r.IzEffM4 = g.IzM4;
        double eps = Ec9Rules.Epsilon(f0Pa);
        if (s is CircularHollowSection tube)
        {
            // EN 1999-1-1 6.1.4.3: a round tube in uniform compression has β = 3 √(D / t), classified as an internal part (from memory).
            r.IsTube = true;
            double d = tube.OutsideDiameter.Meters, t = tube.WallThickness.Meters;
            r.TubeBeta = 3 * Math.Sqrt(d / t);
            r.Class = Ec9Rules.ClassOf(r.TubeBeta, eps, cls, welded, false);
            r.TubeRho = Ec9Rules.RhoC(r.TubeBeta, eps, cls, welded, false);
            r.AreaEffM2 = r.TubeRho * g.AreaM2; r.IyEffM4 = r.TubeRho * g.IyM4; r.IzEffM4 = r.TubeRho * g.IzM4;
            return r;
        }
        if (r.Count == 0) { r.IsSolid = true; return r; }

        double worst = 0;
        var loss = new RectangleSum();
        for (int i = 0; i < r.Count; i++)
        {
            ref var pl = ref p[i];
            pl.Class = Ec9Rules.ClassOf(pl.Beta, eps, cls, welded, pl.Outstand);
            pl.Rho = Ec9Rules.RhoC(pl.Beta, eps, cls, welded, pl.Outstand);
            if (pl.Class > r.Class) r.Class = pl.Class;
            Ec9Rules.ClassLimits(cls, welded, pl.Outstand, out _, out _, out double b3);
            double ratio = pl.Beta / (b3 * eps);
            if (ratio > worst) { worst = ratio; r.GoverningPart = i; }
            if (pl.Rho < 1)
            {
                // Remove (1 − ρc) t from the part, half at each face.
                double cut = 0.5 * (1 - pl.Rho) * pl.ThicknessM;
                if (pl.ThicknessAlongZ)
                {
                    loss.Add(pl.Y0, pl.Y1, pl.Z0, pl.Z0 + cut);
                    loss.Add(pl.Y0, pl.Y1, pl.Z1 - cut, pl.Z1);
                }
                else
                {
                    loss.Add(pl.Y0, pl.Y0 + cut, pl.Z0, pl.Z1);
                    loss.Add(pl.Y1 - cut, pl.Y1, pl.Z0, pl.Z1);
                }
            }
        }
        if (loss.Area > 0)
        {
            double a = g.AreaM2, al = loss.Area, ae = a - al;
            double yc = g.CentroidYM, zc = g.CentroidZM, yl = loss.CentroidY, zl = loss.CentroidZ;
            double ye = (a * yc - al * yl) / ae, ze = (a * zc - al * zl) / ae;
            double iyy = g.ReferenceIyM4 + a * (zc - ze) * (zc - ze) - (loss.Iy + al * (zl - ze) * (zl - ze));
            double izz = g.ReferenceIzM4 + a * (yc - ye) * (yc - ye) - (loss.Iz + al * (yl - ye) * (yl - ye));
            double iyz = g.ReferenceIyzM4 + a * (yc - ye) * (zc - ze) - (loss.Iyz + al * (yl - ye) * (zl - ze));
            // Kept on the gross principal directions (the rotation of the principal axes by the reduction is neglected).
            double th = g.PrincipalAngleRad, avg = 0.5 * (iyy + izz), half = 0.5 * (iyy - izz);
            r.AreaEffM2 = ae;
            if (th == 0) { r.IyEffM4 = iyy; r.IzEffM4 = izz; }
            else
            {
                r.IyEffM4 = avg + half * Math.Cos(2 * th) - iyz * Math.Sin(2 * th);
                r.IzEffM4 = avg - half * Math.Cos(2 * th) + iyz * Math.Sin(2 * th);
            }
        }
        return r;
    }
}
