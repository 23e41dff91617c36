using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Text;
using System.Threading;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Registry;
using CompressionMembers.Workflows.Schedules;

namespace CompressionMembers.Tests.Workflows;

public class ScheduleTests
{
    internal static string BoathousePath()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "CompressionMembers.sln"))) dir = dir.Parent;
        return Path.Combine(dir!.FullName, "samples", "scripts", "data", "boathouse-schedule.csv");
    }

    private static MemberSchedule Boathouse() => MemberSchedule.ReadCsv(new StringReader(File.ReadAllText(BoathousePath())), "boathouse-schedule.csv");

    [Fact]
    public void ReadCsv_Boathouse_EveryRowKeptWithItsLine()
    {
        var s = Boathouse();
        Assert.Equal(11, s.Items.Count); // eleven data rows, none dropped
        Assert.Equal(Enumerable.Range(3, 11).Select(i => (long)i), s.Items.Select(i => i.Line)); // line 1 is a comment, line 2 the header
        Assert.Equal("line 9", s.Items[6].Location);
    }

    [Fact]
    public void Check_Boathouse_BadRowsBecomeErrorRowsWithReasons()
    {
        var o = ScheduleChecker.Check(Boathouse());
        Assert.Equal(11, o.Rows.Count);
        var byMember = o.Rows.ToDictionary(r => r.Item.Location);
        Assert.Equal(RowStatus.Error, byMember["line 9"].Status);
        Assert.Equal("N_kN \"seventy\" is not a finite number (use a point as the decimal separator).", byMember["line 9"].Error);
        Assert.StartsWith("Unknown material \"ship-oak\"; known materials: ", byMember["line 10"].Error);
        Assert.StartsWith("Euler elastic buckling with squash-load cut-off does not apply:", byMember["line 11"].Error); // eccentric load
        Assert.Equal(8, o.PassedCount + o.FailedCount); // the timber (EC5) and aluminium (EC9) rows are checked too
        Assert.Equal(3, o.ErrorCount);
    }

    [Fact]
    public void Check_Boathouse_JettyPostMatchesHandCalculation()
    {
        var p1 = ScheduleChecker.Check(Boathouse()).Rows[0].Result!.Value;
        // Johnson parabola (Shigley, column formulas; from memory), CHS 76 × 3, L = 3.2 m, E = 200 GPa, fy = 250 MPa:
        double a = System.Math.PI / 4 * (76.0 * 76 - 70.0 * 70) * 1e-6, i = System.Math.PI / 64 * (System.Math.Pow(76, 4) - System.Math.Pow(70, 4)) * 1e-12;
        double lam = 3.2 / System.Math.Sqrt(i / a); // 123.9 < λc = π √(2E/f) = 125.7: Johnson governs
        double nrd = a * 250e6 * (1 - 250e6 * lam * lam / (4 * System.Math.PI * System.Math.PI * 200e9));
        CompressionMembers.Tests.Support.Near.Relative(nrd, p1.DesignResistanceN, 1e-9, "hand calculation, Johnson parabola");
        CompressionMembers.Tests.Support.Near.Relative(85e3 / nrd, p1.Utilisation, 1e-9, "NEd / NRd by hand");
    }

    [Fact]
    public void WriteCsv_SerialAndParallel_AreByteForByteEqual()
    {
        var s = Boathouse();
        string serial = ScheduleChecker.Check(s, BatchOptions.Serial).ToCsv();
        string parallel = ScheduleChecker.Check(s, new BatchOptions(2)).ToCsv();
        Assert.Equal(serial, parallel);
        Assert.Equal(ScheduleChecker.Check(s, BatchOptions.Serial).RenderReport(), ScheduleChecker.Check(s, new BatchOptions(2)).RenderReport());
        Assert.Equal(12, serial.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length); // header + 11 rows
    }

    [Fact]
    public void Outcome_AndRows_HaveOneLineTexts()
    {
        // One good row and one that names no known material: the outcome counts both, each row says where it stands.
        const string csv = "member,material,section,method,length_mm,N_kN\nS1,generic-steel,rect 50x50,euler,1000,10\nS2,unobtainium,rect 50x50,euler,1000,10\n";
        var outcome = ScheduleChecker.Check(MemberSchedule.ReadCsv(new StringReader(csv), "two rows"), BatchOptions.Serial);
        Assert.Equal("schedule \"two rows\": 2 rows: 1 passed, 0 failed, 1 errors", outcome.ToString());
        Assert.StartsWith("line 2: S1: utilisation ", outcome.Rows[0].ToString());
        Assert.StartsWith("line 3: error: ", outcome.Rows[1].ToString());
        Assert.Contains("unobtainium", outcome.Rows[1].ToString());
    }

    [Fact]
    public void WriteCsv_FormulaLikeText_IsEscaped()
    {
        const string csv = "member,material,section,method,length_mm,N_kN\n=HYPERLINK(\"x\"),generic-steel,rect 50x50,euler,1000,10\n@SUM(A1),generic-steel,rect 50x50,euler,1000,10\n";
        var text = ScheduleChecker.Check(MemberSchedule.ReadCsv(new StringReader(csv), "evil")).ToCsv();
        Assert.Contains("'=HYPERLINK", text);
        Assert.Contains("'@SUM(A1)", text);
        Assert.DoesNotContain(",=", text);
        Assert.DoesNotContain(",@", text);
    }

    [Fact]
    public void ReadCsv_UnknownColumn_IsAFileError()
    {
        var ex = Assert.Throws<FormatException>(() => MemberSchedule.ReadCsv(new StringReader("member,material,section,method,length_mm,N_kN,colour\n"), "x"));
        Assert.StartsWith("Line 1: unknown column \"colour\" in the schedule CSV", ex.Message);
    }

    [Fact]
    public void ReadCsv_BadHeaderAfterComments_NamesTheHeadersOwnLine()
    {
        var ex = Assert.Throws<FormatException>(() => MemberSchedule.ReadCsv(new StringReader("# a comment\n\nmember,material,section,method,length_mm,N_kN,colour\n"), "x"));
        Assert.StartsWith("Line 3: unknown column \"colour\"", ex.Message); // line 1 a comment, line 2 blank
    }

    [Fact]
    public void ReadCsv_MissingRequiredColumn_IsAFileError()
    {
        var ex = Assert.Throws<FormatException>(() => MemberSchedule.ReadCsv(new StringReader("member,material,section,method,length_mm\n"), "x"));
        Assert.StartsWith("Line 1: the schedule CSV has no column \"N_kN\"", ex.Message);
    }

    [Fact]
    public void ReadCsv_RegistryExtendedByOneLine_ResolvesTheNewName()
    {
        var reg = NameRegistry.Default.WithMethod("my-euler", CompressionMembers.Methods.ResistanceMethods.Euler);
        var s = MemberSchedule.ReadCsv(new StringReader("member,material,section,method,length_mm,N_kN\nA,generic-steel,glulam 140x450,my-euler,3000,10\n"), "x", reg);
        Assert.True(s.Items[0].IsValid, s.Items[0].Error);
        Assert.Equal("rectangle 140 mm wide × 450 mm deep", s.Items[0].Member!.Section.Designation); // resolved through the built-in glulam catalogue
    }

    private static MemoryStream Utf8(string s) => new(Encoding.UTF8.GetBytes(s));

    private const string JsonSchedule = """
        {
          "format": "compression-members/schedule@1",
          "members": [
            {
              "member": "C1", "material": "generic-steel", "section": "CHS 76x3", "method": "johnson", "length_mm": 3000,
              "cases": [
                { "case": "ULS 1", "N_kN": 50 },
                { "case": "ULS 2", "N_kN": 90 }
              ]
            },
            {
              "member": "C2", "material": "unobtainium", "section": "rect 50x50", "method": "euler", "length_mm": 1000,
              "cases": [ { "case": "ULS 1", "N_kN": 5 } ]
            }
          ]
        }
        """;

    [Fact]
    public void ReadJson_Cases_KeepTheirLinesAndLocations()
    {
        var s = MemberSchedule.ReadJson(Utf8(JsonSchedule), "j");
        Assert.Equal(3, s.Items.Count);
        Assert.Equal([7L, 8L, 13L], s.Items.Select(i => i.Line));
        Assert.Equal("members[0].cases[1]", s.Items[1].Location);
        Assert.False(s.Items[2].IsValid);
        var o = ScheduleChecker.Check(s);
        Assert.Equal(RowStatus.Error, o.Rows[2].Status);
    }

    [Fact]
    public void ReadJson_UnknownField_IsRejected()
    {
        var ex = Assert.Throws<FormatException>(() => MemberSchedule.ReadJson(Utf8("{\"format\":\"compression-members/schedule@1\",\"members\":[{\"member\":\"a\",\"colour\":\"red\"}]}"), "j"));
        Assert.Contains("colour", ex.Message);
    }

    [Fact]
    public void ReadJson_TypeNamePolymorphism_IsRejected()
    {
        Assert.Throws<FormatException>(() => MemberSchedule.ReadJson(Utf8("{\"$type\":\"System.IO.FileInfo\",\"format\":\"compression-members/schedule@1\",\"members\":[]}"), "j"));
    }

    [Fact]
    public void ReadJson_WrongFormatTag_IsRejected()
    {
        var ex = Assert.Throws<FormatException>(() => MemberSchedule.ReadJson(Utf8("{\"format\":\"other@9\",\"members\":[]}"), "j"));
        Assert.Equal("The schedule JSON has format \"other@9\"; expected \"compression-members/schedule@1\".", ex.Message);
    }

    private sealed class Collect : IProgress<BatchProgress>
    {
        public readonly List<BatchProgress> Seen = [];
        public void Report(BatchProgress value) { lock (Seen) Seen.Add(value); }
    }

    [Fact]
    public void Check_WithProgress_ReportsCompletion()
    {
        var p = new Collect();
        ScheduleChecker.Check(Boathouse(), new BatchOptions(2, p));
        Assert.Contains(p.Seen, x => x.Completed == 11 && x.Total == 11);
    }

    [Fact]
    public void Check_Cancelled_Throws()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => ScheduleChecker.Check(Boathouse(), new BatchOptions(2, null, cts.Token)));
    }

    [Fact]
    public void RenderReport_Boathouse_HasTableErrorsCalculationsAndCaution()
    {
        var text = ScheduleChecker.Check(Boathouse()).RenderReport();
        Assert.Contains("rows    : 11 (", text);
        Assert.Contains("line 10: Unknown material \"ship-oak\"", text);
        Assert.Contains("[line 4]", text); // P1 is governed by its heavier case, dead + snow, on line 4
        Assert.Contains("CAUTION", text);
    }
}
