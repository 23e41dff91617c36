#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:package UnitsNet@5.75.1
// Check a schedule: read the invented boathouse schedule (data/boathouse-schedule.csv), check every row across the
// cores with progress, write the results CSV (every row gets a result or an error row with its reason) and print the
// combined report's summary. The results file goes to the temporary folder.
using System;
using System.IO;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Schedules;

// The data folder beside this script, wherever it is run from (a file-based app knows its own folder).
string here = AppContext.GetData("EntryPointFileDirectoryPath") as string ?? ".";
string input = Path.Combine(here, "data", "boathouse-schedule.csv");
using var reader = new StreamReader(input);
var schedule = MemberSchedule.ReadCsv(reader, "boathouse-schedule.csv");
var progress = new Progress<BatchProgress>(_ => { });
var outcome = ScheduleChecker.Check(schedule, new BatchOptions(maxDegreeOfParallelism: 2, progress: progress));

string outDir = Path.Combine(Path.GetTempPath(), "compression-members-demo");
Directory.CreateDirectory(outDir);
string csvPath = Path.Combine(outDir, "boathouse-results.csv");
using (var w = new StreamWriter(csvPath)) outcome.WriteCsv(w);
string report = outcome.RenderReport(detailLimit: 2);
File.WriteAllText(Path.Combine(outDir, "boathouse-report.txt"), report);

// Print the report up to its calculations, then where the files went.
int cut = report.IndexOf("Calculations", StringComparison.Ordinal);
Console.Write(cut > 0 ? report[..cut] : report);
Console.WriteLine($"results CSV: {csvPath}");
Console.WriteLine($"{outcome.PassedCount} passed, {outcome.FailedCount} failed, {outcome.ErrorCount} error rows of {outcome.Rows.Count}");
Console.WriteLine(CompressionMembers.LibraryInfo.Caution);
return outcome.Rows.Count == schedule.Items.Count ? 0 : 1;
