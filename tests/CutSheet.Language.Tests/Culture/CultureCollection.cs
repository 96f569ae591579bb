namespace CutSheet.Language.Tests.Culture;

/// <summary>
/// Tests that change the process-wide default culture. xUnit runs a collection with
/// parallelisation disabled on its own, after the parallel ones, so no other test sees the
/// culture change half-way.
/// </summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class CultureCollection
{
    public const string Name = "Culture";
}
