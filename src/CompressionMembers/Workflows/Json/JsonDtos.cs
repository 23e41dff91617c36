using System.Collections.Generic;
using System.Text.Json.Serialization;

namespace CompressionMembers.Workflows.Json;

// Data-transfer shapes of our own JSON formats (docs/schedule-format.md). Property names are snake_case with the unit
// in the name where the value is a bare number; quantities that must keep the caller's unit are {value, unit}.

internal sealed class CatalogueFileDto
{
    [JsonPropertyName("format")] public string? Format { get; set; }
    [JsonPropertyName("name")] public string? Name { get; set; }
    [JsonPropertyName("source")] public string? Source { get; set; }
    [JsonPropertyName("sections")] public List<CatalogueEntryDto>? Sections { get; set; }
}

internal sealed class CatalogueEntryDto
{
    [JsonPropertyName("designation")] public string? Designation { get; set; }
    [JsonPropertyName("family")] public string? Family { get; set; }
    [JsonPropertyName("section")] public string? Section { get; set; }
    [JsonPropertyName("mass_kg_per_m")] public double? MassKgPerM { get; set; }
}

internal sealed class ScheduleFileDto
{
    [JsonPropertyName("format")] public string? Format { get; set; }
    [JsonPropertyName("members")] public List<ScheduleMemberDto>? Members { get; set; }
}

internal sealed class ScheduleMemberDto
{
    [JsonPropertyName("member")] public string? Member { get; set; }
    [JsonPropertyName("material")] public string? Material { get; set; }
    [JsonPropertyName("section")] public string? Section { get; set; }
    [JsonPropertyName("method")] public string? Method { get; set; }
    [JsonPropertyName("length_mm")] public double? LengthMm { get; set; }
    [JsonPropertyName("K_y")] public double? Ky { get; set; }
    [JsonPropertyName("K_z")] public double? Kz { get; set; }
    [JsonPropertyName("K_t")] public double? Kt { get; set; }
    [JsonPropertyName("cases")] public List<ScheduleCaseDto>? Cases { get; set; }
}

internal sealed class ScheduleCaseDto
{
    [JsonPropertyName("case")] public string? Case { get; set; }
    [JsonPropertyName("N_kN")] public double? NkN { get; set; }
    [JsonPropertyName("ey_mm")] public double? EyMm { get; set; }
    [JsonPropertyName("ez_mm")] public double? EzMm { get; set; }
    [JsonPropertyName("My_top_kNm")] public double? MyTop { get; set; }
    [JsonPropertyName("My_bottom_kNm")] public double? MyBottom { get; set; }
    [JsonPropertyName("Mz_top_kNm")] public double? MzTop { get; set; }
    [JsonPropertyName("Mz_bottom_kNm")] public double? MzBottom { get; set; }
    [JsonPropertyName("bow_y_mm")] public double? BowY { get; set; }
    [JsonPropertyName("bow_z_mm")] public double? BowZ { get; set; }
    [JsonPropertyName("duration")] public string? Duration { get; set; }
}

internal sealed class QuantityDto
{
    [JsonPropertyName("value")] public double Value { get; set; }
    [JsonPropertyName("unit")] public string Unit { get; set; } = "";
}

internal sealed class MaterialDto
{
    [JsonPropertyName("kind")] public string Kind { get; set; } = "";
    [JsonPropertyName("registry_name")] public string? RegistryName { get; set; }
    [JsonPropertyName("name")] public string Name { get; set; } = "";
    [JsonPropertyName("source")] public string Source { get; set; } = "";
    [JsonPropertyName("E")] public QuantityDto? E { get; set; }
    [JsonPropertyName("G")] public QuantityDto? G { get; set; }
    [JsonPropertyName("f")] public QuantityDto? F { get; set; }
    [JsonPropertyName("density")] public QuantityDto? Density { get; set; }
}

internal sealed class SectionDto
{
    [JsonPropertyName("shape")] public string Shape { get; set; } = "";
    [JsonPropertyName("dimensions")] public List<QuantityDto> Dimensions { get; set; } = [];
}

internal sealed class AxisRestraintDto
{
    [JsonPropertyName("K")] public double K { get; set; }
    [JsonPropertyName("basis_text")] public string BasisText { get; set; } = "";
    [JsonPropertyName("bottom")] public string? Bottom { get; set; }
    [JsonPropertyName("top")] public string? Top { get; set; }
    [JsonPropertyName("basis")] public string? Basis { get; set; }
    [JsonPropertyName("bracing")] public List<QuantityDto> Bracing { get; set; } = [];
}

internal sealed class MemberDto
{
    [JsonPropertyName("name")] public string Name { get; set; } = "";
    [JsonPropertyName("material")] public MaterialDto Material { get; set; } = new();
    [JsonPropertyName("section")] public SectionDto Section { get; set; } = new();
    [JsonPropertyName("length")] public QuantityDto Length { get; set; } = new();
    [JsonPropertyName("restraint_y")] public AxisRestraintDto RestraintY { get; set; } = new();
    [JsonPropertyName("restraint_z")] public AxisRestraintDto RestraintZ { get; set; } = new();
    [JsonPropertyName("restraint_twist")] public AxisRestraintDto RestraintTwist { get; set; } = new();
}

internal sealed class ActionsDto
{
    [JsonPropertyName("name")] public string Name { get; set; } = "";
    [JsonPropertyName("N")] public QuantityDto N { get; set; } = new();
    [JsonPropertyName("ey")] public QuantityDto Ey { get; set; } = new();
    [JsonPropertyName("ez")] public QuantityDto Ez { get; set; } = new();
    [JsonPropertyName("My_top")] public QuantityDto MyTop { get; set; } = new();
    [JsonPropertyName("My_bottom")] public QuantityDto MyBottom { get; set; } = new();
    [JsonPropertyName("Mz_top")] public QuantityDto MzTop { get; set; } = new();
    [JsonPropertyName("Mz_bottom")] public QuantityDto MzBottom { get; set; } = new();
    [JsonPropertyName("bow_y")] public QuantityDto? BowY { get; set; }
    [JsonPropertyName("bow_z")] public QuantityDto? BowZ { get; set; }
    [JsonPropertyName("duration")] public string Duration { get; set; } = "";
}

internal sealed class AxisOutcomeDto
{
    [JsonPropertyName("evaluated")] public bool Evaluated { get; set; }
    [JsonPropertyName("effective_length_m")] public double EffectiveLengthM { get; set; }
    [JsonPropertyName("slenderness")] public double Slenderness { get; set; }
    [JsonPropertyName("relative_slenderness")] public double RelativeSlenderness { get; set; }
    [JsonPropertyName("critical_force_N")] public double CriticalForceN { get; set; }
    [JsonPropertyName("reduction_factor")] public double ReductionFactor { get; set; }
    [JsonPropertyName("resistance_N")] public double ResistanceN { get; set; }
}

internal sealed class StepDto
{
    [JsonPropertyName("symbol")] public string Symbol { get; set; } = "";
    [JsonPropertyName("meaning")] public string Meaning { get; set; } = "";
    [JsonPropertyName("expression")] public string Expression { get; set; } = "";
    [JsonPropertyName("value")] public double? Value { get; set; }
    [JsonPropertyName("unit")] public string Unit { get; set; } = "";
    [JsonPropertyName("reference")] public string Reference { get; set; } = "";
}

internal sealed class ResultDocumentDto
{
    [JsonPropertyName("format")] public string Format { get; set; } = "";
    [JsonPropertyName("library_version")] public string LibraryVersion { get; set; } = "";
    [JsonPropertyName("input_fingerprint")] public string InputFingerprint { get; set; } = "";
    [JsonPropertyName("method")] public string Method { get; set; } = "";
    [JsonPropertyName("method_identity")] public string MethodIdentity { get; set; } = "";
    [JsonPropertyName("member")] public MemberDto Member { get; set; } = new();
    [JsonPropertyName("actions")] public ActionsDto Actions { get; set; } = new();
    [JsonPropertyName("design_resistance_N")] public double DesignResistanceN { get; set; }
    [JsonPropertyName("utilisation")] public double Utilisation { get; set; }
    [JsonPropertyName("passed")] public bool Passed { get; set; }
    [JsonPropertyName("governing_axis")] public string GoverningAxis { get; set; } = "";
    [JsonPropertyName("governing_mode")] public string GoverningMode { get; set; } = "";
    [JsonPropertyName("governing_check")] public string GoverningCheck { get; set; } = "";
    [JsonPropertyName("about_y")] public AxisOutcomeDto AboutY { get; set; } = new();
    [JsonPropertyName("about_z")] public AxisOutcomeDto AboutZ { get; set; } = new();
    [JsonPropertyName("torsional")] public AxisOutcomeDto Torsional { get; set; } = new();
    [JsonPropertyName("steps")] public List<StepDto> Steps { get; set; } = [];
}

[JsonSourceGenerationOptions(
    UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow,
    MaxDepth = 16,
    WriteIndented = true,
    NumberHandling = JsonNumberHandling.AllowNamedFloatingPointLiterals,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
    ReadCommentHandling = System.Text.Json.JsonCommentHandling.Disallow,
    AllowTrailingCommas = false)]
[JsonSerializable(typeof(CatalogueFileDto))]
[JsonSerializable(typeof(ScheduleFileDto))]
[JsonSerializable(typeof(ResultDocumentDto))]
internal sealed partial class WorkflowJsonContext : JsonSerializerContext;
