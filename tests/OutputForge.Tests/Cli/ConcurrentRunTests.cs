using OutputForge.Pipeline;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Cli;

public sealed class ConcurrentRunTests
{
    [Fact]
    public void A_second_run_into_the_same_folder_stops_with_a_clear_message()
    {
        using var study = new MiniStudy();
        using (OutputLock.Acquire(study.OutputFolder))
        {
            var error = new StringWriter();
            var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder], error);
            Assert.Equal(OutputForge.Cli.ExitCodes.OutputError, code);
            Assert.Contains("another OutputForge run is writing to this folder", error.ToString());
            Assert.False(Directory.Exists(study.OutputFolder));
        }
        Assert.Equal(0, OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet"], new StringWriter()));
    }
}
