namespace PathFinder.Diagrams;

/// <summary>The direction in which reactions flow in a layered network drawing.</summary>
public enum LayoutDirection
{
    /// <summary>Reactants on the left, products on the right (the default; suits wide formula boxes).</summary>
    LeftToRight,

    /// <summary>Reactants at the top, products at the bottom.</summary>
    TopDown,
}
