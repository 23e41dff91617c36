using ApprovalTests.Namers;
using ApprovalTests.Reporters;

[assembly: UseApprovalSubdirectory("approved")]
[assembly: UseReporter(typeof(CompressionMembers.Tests.Support.LineDiffReporter))]
