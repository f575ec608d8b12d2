namespace PathFinder.Curation;

/// <summary>What a curation decision does to a measurement.</summary>
public enum CurationAction
{
    /// <summary>Leave the measurement out of every analysis.</summary>
    Exclude,

    /// <summary>Take a previously excluded measurement back in.</summary>
    Include,
}
