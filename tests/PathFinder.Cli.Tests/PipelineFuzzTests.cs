using CsCheck;
using PathFinder.Cli.Tests.TestSupport;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Cli.Tests;

/// <summary>Generated and mutated network files through <c>validate</c> and <c>check</c>: exit 0, 1 or 2, never a stack trace.</summary>
[Trait("Category", "Fuzz")]
public sealed class PipelineFuzzTests
{
    [Fact]
    public void ValidateAndCheck_OnMutatedFiles_ExitZeroOneOrTwoWithoutAStackTrace()
    {
        using var folder = new TempFolder();
        FuzzInputs.MutatedBytes(FuzzInputs.NetworkFile).Sample(bytes =>
        {
            string file = folder.WriteBytes($"{Guid.NewGuid():N}.csv", bytes);
            try
            {
                foreach (string command in new[] { "validate", "check" })
                {
                    CliRun run = CliRun.Of(command, file);
                    Assert.True(run.ExitCode is 0 or 1 or 2, $"{command} exited {run.ExitCode}: {run.Error}");
                    Assert.DoesNotContain("   at ", run.Error, StringComparison.Ordinal);
                }
            }
            finally
            {
                File.Delete(file);
            }
        }, iter: 5_000, threads: 1, print: FuzzInputs.Show);
    }
}
