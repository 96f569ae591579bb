using Xunit.Sdk;

namespace CutSheet.Language.Tests.Support;

/// <summary>
/// Runs work on a task with a time limit, so that a hang in the code under test fails the test
/// instead of stalling the run (LANGUAGE.md H: "nothing crashes or hangs"). The task is
/// long-running, i.e. it gets a thread of its own with the ordinary stack size: deep recursion
/// overflows there as it would in the editor, and property runs that start many bounded runs
/// at once cannot starve the thread pool into false timeouts.
/// </summary>
public static class Bounded
{
    public static readonly TimeSpan DefaultLimit = TimeSpan.FromSeconds(5);

    public static T Run<T>(Func<T> work, string what, TimeSpan? limit = null)
    {
        var task = Task.Factory.StartNew(work, CancellationToken.None, TaskCreationOptions.LongRunning, TaskScheduler.Default);
        bool finished;
        try
        {
            finished = task.Wait(limit ?? DefaultLimit);
        }
        catch (AggregateException e) when (e.InnerExceptions.Count == 1)
        {
            throw new XunitException($"{what} threw {e.InnerException!.GetType().Name}: {e.InnerException.Message}\n{e.InnerException.StackTrace}");
        }
        if (!finished) throw new XunitException($"{what} did not finish within {(limit ?? DefaultLimit).TotalSeconds} s");
        return task.Result;
    }
}
