using System;
using System.Collections.Generic;
using System.IO;
using System.Text;
using System.Text.Json;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Reporting;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Registry;
using UnitsNet;
using UnitsNet.Units;

namespace CompressionMembers.Workflows.Json;

/// <summary>Writes a check result — its member, actions, method, outcome and steps — as a JSON document with the library
/// version and the input fingerprint, and reads it back to the same values, so that a report can be re-rendered from
/// the JSON alone.</summary>
/// <remarks>
/// <para>Format "compression-members/result@1" (docs/schedule-format.md). Quantities keep the caller's value and unit;
/// doubles are written in their shortest round-trip form, so they read back bit for bit.</para>
/// <para>The method is stored by its name in a <see cref="NameRegistry"/> (with its identity, which must still match when
/// read). Isotropic materials are stored by value; materials of other families by their registry name (the extension
/// point for timber and aluminium grades). Sections: rectangle, circle, round and rectangular tubes, angle, channel and
/// I. On reading, the input fingerprint is recomputed and must equal the stored one.</para>
/// <para>Reading is strict: unknown fields are errors, with depth and size limits and no type-name polymorphism.
/// Thread safety: stateless.</para>
/// </remarks>
public static class ResultJson
{
    /// <summary>The format tag.</summary>
    public const string Format = "compression-members/result@1";

    /// <summary>Writes a result as JSON.</summary>
    /// <param name="result">The result.</param>
    /// <param name="registry">Where the method (and any non-isotropic material) is registered; <see cref="NameRegistry.Default"/> if null.</param>
    /// <returns>The JSON text (indented, "\n" line ends).</returns>
    /// <exception cref="ArgumentException">The result is default, or its method or material is not registered.</exception>
    /// <exception cref="NotSupportedException">The section is of a kind this format does not hold.</exception>
    public static string Write(in CheckResult result, NameRegistry? registry = null)
    {
        if (result.Member is null) throw new ArgumentException("The result is default (no member).", nameof(result));
        registry ??= NameRegistry.Default;
        if (!registry.TryGetMethodName(result.Method, out var methodName))
            throw new ArgumentException($"The method \"{result.Method.Identity.Name}\" is not registered; add it with NameRegistry.WithMethod so that the result can be read back.", nameof(registry));
        var dto = new ResultDocumentDto
        {
            Format = Format,
            LibraryVersion = LibraryInfo.Version,
            InputFingerprint = InputFingerprint.Compute(result.Member, result.Actions, result.Method),
            Method = methodName,
            MethodIdentity = result.Method.Identity.ToString(),
            Member = ToDto(result.Member, registry),
            Actions = ToDto(result.Actions),
            DesignResistanceN = result.DesignResistanceN,
            Utilisation = result.Utilisation,
            Passed = result.Passed,
            GoverningAxis = result.GoverningAxis.ToString(),
            GoverningMode = result.GoverningMode.ToString(),
            GoverningCheck = result.GoverningCheck,
            AboutY = ToDto(result.AboutY),
            AboutZ = ToDto(result.AboutZ),
            Torsional = ToDto(result.Torsional),
        };
        foreach (var s in result.Steps)
            dto.Steps.Add(new StepDto { Symbol = s.Symbol, Meaning = s.Meaning, Expression = s.Expression, Value = double.IsNaN(s.Value) ? null : s.Value, Unit = s.Unit.ToString(), Reference = s.Reference });
        return JsonSerializer.Serialize(dto, WorkflowJsonContext.Default.ResultDocumentDto).Replace("\r\n", "\n", StringComparison.Ordinal);
    }

    /// <summary>Reads a result written by <see cref="Write"/>.</summary>
    /// <param name="json">The JSON text.</param>
    /// <param name="registry">Where the method is registered; <see cref="NameRegistry.Default"/> if null.</param>
    /// <param name="maxBytes">The largest input accepted (64 MiB by default).</param>
    /// <returns>The result, with its steps.</returns>
    /// <exception cref="FormatException">The JSON is invalid or strict reading fails, a name is unknown, or the recomputed fingerprint differs.</exception>
    public static CheckResult Read(string json, NameRegistry? registry = null, long maxBytes = StrictJson.DefaultMaxBytes)
    {
        ArgumentNullException.ThrowIfNull(json);
        registry ??= NameRegistry.Default;
        var dto = StrictJson.Read(new MemoryStream(Encoding.UTF8.GetBytes(json)), WorkflowJsonContext.Default.ResultDocumentDto, maxBytes, "result JSON");
        if (dto.Format != Format) throw new FormatException($"The result JSON has format \"{dto.Format}\"; expected \"{Format}\".");
        try
        {
            var method = registry.Method(dto.Method);
            if (method.Identity.ToString() != dto.MethodIdentity)
                throw new FormatException($"The method registered as \"{dto.Method}\" is now \"{method.Identity}\", but the result was computed with \"{dto.MethodIdentity}\".");
            var member = FromDto(dto.Member, registry);
            var actions = FromDto(dto.Actions);
            string fp = InputFingerprint.Compute(member, actions, method);
            if (fp != dto.InputFingerprint)
                throw new FormatException($"The input read back has fingerprint {fp}, not the stored {dto.InputFingerprint}: the file was changed or a registered name now means something else.");
            var trace = new CalculationTrace();
            foreach (var s in dto.Steps)
                trace.Add(s.Symbol, s.Meaning, s.Expression, s.Value ?? double.NaN, Parse<StepUnit>(s.Unit, "step unit"), s.Reference);
            return new CheckResult(ResolvedMember.From(member), ResolvedActions.From(actions), method, dto.DesignResistanceN, dto.Utilisation,
                Parse<BucklingAxis>(dto.GoverningAxis, "governing axis"), Parse<FailureMode>(dto.GoverningMode, "governing mode"), dto.GoverningCheck,
                FromDto(dto.AboutY), FromDto(dto.AboutZ), FromDto(dto.Torsional), dto.Steps.Count > 0 ? trace : null);
        }
        catch (Exception ex) when (ex is ArgumentException or KeyNotFoundException)
        {
            throw new FormatException("The result JSON does not describe a valid check: " + ex.Message, ex);
        }
    }

    private static T Parse<T>(string text, string what) where T : struct, Enum =>
        Enum.TryParse<T>(text, false, out var v) && Enum.IsDefined(v) && !int.TryParse(text, out _) ? v
            : throw new FormatException($"\"{text}\" is not a known {what}; expected one of {string.Join(", ", Enum.GetNames<T>())}.");

    private static QuantityDto Q(Length q) => new() { Value = q.Value, Unit = q.Unit.ToString() };
    private static QuantityDto Q(Force q) => new() { Value = q.Value, Unit = q.Unit.ToString() };
    private static QuantityDto Q(Torque q) => new() { Value = q.Value, Unit = q.Unit.ToString() };
    private static QuantityDto Q(Pressure q) => new() { Value = q.Value, Unit = q.Unit.ToString() };
    private static QuantityDto Q(Density q) => new() { Value = q.Value, Unit = q.Unit.ToString() };

    private static Length L(QuantityDto q) => Length.From(q.Value, Parse<LengthUnit>(q.Unit, "length unit"));
    private static Force F(QuantityDto q) => Force.From(q.Value, Parse<ForceUnit>(q.Unit, "force unit"));
    private static Torque T(QuantityDto q) => Torque.From(q.Value, Parse<TorqueUnit>(q.Unit, "torque unit"));
    private static Pressure P(QuantityDto? q, string what) => q is null ? throw new FormatException($"The material has no {what}.") : Pressure.From(q.Value, Parse<PressureUnit>(q.Unit, "pressure unit"));
    private static Density D(QuantityDto? q) => q is null ? throw new FormatException("The material has no density.") : Density.From(q.Value, Parse<DensityUnit>(q.Unit, "density unit"));

    private static MemberDto ToDto(Member m, NameRegistry registry) => new()
    {
        Name = m.Name,
        Material = ToDto(m.Material, registry),
        Section = ToDto(m.Section),
        Length = Q(m.Length),
        RestraintY = ToDto(m.Restraint.AboutY),
        RestraintZ = ToDto(m.Restraint.AboutZ),
        RestraintTwist = ToDto(m.Restraint.Torsional),
    };

    private static Member FromDto(MemberDto d, NameRegistry registry) =>
        Member.Create(FromDto(d.Section), FromDto(d.Material, registry), L(d.Length),
            new Restraint(FromDto(d.RestraintY), FromDto(d.RestraintZ), FromDto(d.RestraintTwist)), d.Name);

    private static MaterialDto ToDto(Material m, NameRegistry registry)
    {
        registry.TryGetMaterialName(m, out var regName);
        if (m is IsotropicMaterial)
            return new MaterialDto { Kind = "isotropic", RegistryName = regName, Name = m.Name, Source = m.Source, E = Q(m.ElasticModulus), G = Q(m.ShearModulus), F = Q(m.CompressiveStrength), Density = Q(m.Density) };
        if (regName is null)
            throw new ArgumentException($"The material \"{m.Name}\" ({m.Kind}) is not registered; materials other than isotropic ones are stored by their registry name, so add it with NameRegistry.WithMaterial.", nameof(registry));
        return new MaterialDto { Kind = m.Kind.ToString().ToLowerInvariant(), RegistryName = regName, Name = m.Name, Source = m.Source };
    }

    private static Material FromDto(MaterialDto d, NameRegistry registry)
    {
        if (d.Kind == "isotropic")
        {
            // A registered instance is reused when its values are the same, so that equality by reference survives.
            var made = new IsotropicMaterial(d.Name, P(d.E, "E"), P(d.G, "G"), P(d.F, "strength"), D(d.Density), d.Source);
            if (d.RegistryName is { } rn && registry.TryGetMaterial(rn, out var reg) && reg is IsotropicMaterial
                && reg.Name == made.Name && reg.Source == made.Source && Same(Q(reg.ElasticModulus), d.E) && Same(Q(reg.ShearModulus), d.G)
                && Same(Q(reg.CompressiveStrength), d.F) && Same(Q(reg.Density), d.Density))
                return reg;
            return made;
        }
        if (d.RegistryName is null) throw new FormatException($"The {d.Kind} material \"{d.Name}\" has no registry name.");
        var m = registry.Material(d.RegistryName);
        if (m.Name != d.Name) throw new FormatException($"The material registered as \"{d.RegistryName}\" is now \"{m.Name}\", not \"{d.Name}\".");
        return m;
    }

    private static bool Same(QuantityDto a, QuantityDto? b) => b is not null && a.Value.Equals(b.Value) && a.Unit == b.Unit;

    private static SectionDto ToDto(Section s) => s switch
    {
        RectangleSection r => new() { Shape = "rect", Dimensions = [Q(r.Width), Q(r.Depth)] },
        CircleSection c => new() { Shape = "round", Dimensions = [Q(c.Diameter)] },
        CircularHollowSection c => new() { Shape = "chs", Dimensions = [Q(c.OutsideDiameter), Q(c.WallThickness)] },
        RectangularHollowSection r => new() { Shape = "rhs", Dimensions = [Q(r.Width), Q(r.Depth), Q(r.WallThickness)] },
        AngleSection a => new() { Shape = "angle", Dimensions = [Q(a.VerticalLeg), Q(a.HorizontalLeg), Q(a.Thickness)] },
        ChannelSection c => new() { Shape = "channel", Dimensions = [Q(c.Depth), Q(c.FlangeWidth), Q(c.FlangeThickness), Q(c.WebThickness)] },
        ISection i => new() { Shape = "i", Dimensions = [Q(i.Depth), Q(i.FlangeWidth), Q(i.FlangeThickness), Q(i.WebThickness), Q(i.RootRadius)] },
        _ => throw new NotSupportedException($"The result format holds rectangles, circles, tubes, angles, channels and I-sections; \"{s.Designation}\" ({s.Kind}) is not one of them."),
    };

    private static Section FromDto(SectionDto d)
    {
        var x = d.Dimensions;
        int need = d.Shape switch { "rect" => 2, "round" => 1, "chs" => 2, "rhs" => 3, "angle" => 3, "channel" => 4, "i" => 5, _ => -1 };
        if (need < 0) throw new FormatException($"Unknown section shape \"{d.Shape}\".");
        if (x.Count != need) throw new FormatException($"A \"{d.Shape}\" section has {need} dimensions; the JSON gives {x.Count}.");
        return d.Shape switch
        {
            "rect" => new RectangleSection(L(x[0]), L(x[1])),
            "round" => new CircleSection(L(x[0])),
            "chs" => new CircularHollowSection(L(x[0]), L(x[1])),
            "rhs" => new RectangularHollowSection(L(x[0]), L(x[1]), L(x[2])),
            "angle" => new AngleSection(L(x[0]), L(x[1]), L(x[2])),
            "channel" => new ChannelSection(L(x[0]), L(x[1]), L(x[2]), L(x[3])),
            _ => new ISection(L(x[0]), L(x[1]), L(x[2]), L(x[3]), L(x[4])),
        };
    }

    private static AxisRestraintDto ToDto(AxisRestraint r)
    {
        var d = new AxisRestraintDto { K = r.BucklingFactor, BasisText = r.BasisText, Bottom = r.BottomEnd?.ToString(), Top = r.TopEnd?.ToString(), Basis = r.Basis?.ToString() };
        foreach (var b in r.BracingPositions) d.Bracing.Add(Q(b));
        return d;
    }

    private static AxisRestraint FromDto(AxisRestraintDto d)
    {
        if (!double.IsFinite(d.K) || d.K < 0.5) throw new FormatException($"Buckling factor K = {d.K} is not valid (at least 0.5).");
        var bracing = new Length[d.Bracing.Count];
        for (int i = 0; i < bracing.Length; i++) bracing[i] = L(d.Bracing[i]);
        EndCondition? bottom = d.Bottom is null ? null : Parse<EndCondition>(d.Bottom, "end condition");
        EndCondition? top = d.Top is null ? null : Parse<EndCondition>(d.Top, "end condition");
        EffectiveLengthBasis? basis = d.Basis is null ? null : Parse<EffectiveLengthBasis>(d.Basis, "effective-length basis");
        var r = new AxisRestraint(d.K, d.BasisText, bottom, top, basis, []);
        return bracing.Length > 0 ? r.WithBracingAt(bracing) : r;
    }

    private static ActionsDto ToDto(DesignActions a) => new()
    {
        Name = a.Name,
        N = Q(a.AxialCompression),
        Ey = Q(a.EccentricityY),
        Ez = Q(a.EccentricityZ),
        MyTop = Q(a.EndMomentYTop),
        MyBottom = Q(a.EndMomentYBottom),
        MzTop = Q(a.EndMomentZTop),
        MzBottom = Q(a.EndMomentZBottom),
        BowY = a.InitialBowY is { } by ? Q(by) : null,
        BowZ = a.InitialBowZ is { } bz ? Q(bz) : null,
        Duration = a.LoadDuration.ToString(),
    };

    private static DesignActions FromDto(ActionsDto d)
    {
        var a = DesignActions.Compression(F(d.N), d.Name)
            .WithEccentricity(L(d.Ey), L(d.Ez))
            .WithEndMomentsAboutY(T(d.MyTop), T(d.MyBottom))
            .WithEndMomentsAboutZ(T(d.MzTop), T(d.MzBottom))
            .WithLoadDuration(Parse<LoadDurationClass>(d.Duration, "load-duration class"));
        if (d.BowY is not null || d.BowZ is not null)
            a = a.WithInitialBow(d.BowY is null ? null : L(d.BowY), d.BowZ is null ? null : L(d.BowZ));
        return a;
    }

    private static AxisOutcomeDto ToDto(in AxisOutcome o) => new()
    {
        Evaluated = o.IsEvaluated,
        EffectiveLengthM = o.EffectiveLengthM,
        Slenderness = o.Slenderness,
        RelativeSlenderness = o.RelativeSlenderness,
        CriticalForceN = o.CriticalForceN,
        ReductionFactor = o.ReductionFactor,
        ResistanceN = o.ResistanceN,
    };

    private static AxisOutcome FromDto(AxisOutcomeDto d) => d.Evaluated
        ? new AxisOutcome(d.EffectiveLengthM, d.Slenderness, d.RelativeSlenderness, d.CriticalForceN, d.ReductionFactor, d.ResistanceN)
        : default;
}
