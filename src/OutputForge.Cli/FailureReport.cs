using OutputForge.Data;
using OutputForge.Demo;
using OutputForge.Pipeline;
using OutputForge.Spec;

namespace OutputForge.Cli;

/// <summary>
/// Runs a command's work and turns any failure into one plain line on stderr and an exit code:
/// never a stack trace. Spec failures list every problem found, one per line.
/// </summary>
public static class FailureReport
{
    public static int Guard(TextWriter error, Func<int> work)
    {
        try
        {
            return work();
        }
        catch (Pipeline.TableSelectionException e)
        {
            error.WriteLine($"outputforge: error: {e.Message}");
            return ExitCodes.Usage;
        }
        catch (SpecException e)
        {
            foreach (var problem in e.Problems.Take(20))
            {
                error.WriteLine($"outputforge: error: {problem}");
            }
            if (e.Problems.Count > 20)
            {
                error.WriteLine($"outputforge: ... and {e.Problems.Count - 20} more problems");
            }
            return ExitCodes.InputError;
        }
        catch (Templates.TemplateException e)
        {
            error.WriteLine($"outputforge: error: {e.Message}");
            return ExitCodes.InputError;
        }
        catch (DataException e)
        {
            error.WriteLine($"outputforge: error: {e.Message}");
            return ExitCodes.InputError;
        }
        catch (DemoStudyException e)
        {
            error.WriteLine($"outputforge: error: {e.Message}");
            return ExitCodes.OutputError;
        }
        catch (UsageException e)
        {
            error.WriteLine($"outputforge: error: {e.Message}");
            return ExitCodes.Usage;
        }
        catch (RunException e)
        {
            error.WriteLine($"outputforge: error: {e.Message}");
            return ExitCodes.OutputError;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"outputforge: error: {e.Message}");
            return ExitCodes.OutputError;
        }
        catch (Exception e)
        {
            error.WriteLine($"outputforge: internal error: {e.GetType().Name}: {e.Message} (please report this with the spec that caused it)");
            return ExitCodes.InternalError;
        }
    }
}
