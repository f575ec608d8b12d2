namespace PathFinder.Diagrams;

/// <summary>What a vertical arrow of a level diagram shows.</summary>
public enum LevelArrowKind
{
    /// <summary>One step between successive levels.</summary>
    Step,

    /// <summary>The target's overall change, from 0 to the final level.</summary>
    Overall,

    /// <summary>A cycle's closure gap, between 0 and the final level.</summary>
    Gap,
}
