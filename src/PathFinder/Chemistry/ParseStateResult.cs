namespace PathFinder.Chemistry;

/// <summary>The outcome of reading a state such as <c>cr,graphite</c>.</summary>
/// <param name="State">The state read (meaningful only when <paramref name="Error"/> is null).</param>
/// <param name="Error">What is wrong, or null.</param>
public readonly record struct ParseStateResult(PhysicalState State, string? Error)
{
    /// <summary>A successful result.</summary>
    public static ParseStateResult Ok(PhysicalState state) => new(state, null);

    /// <summary>A failed result.</summary>
    public static ParseStateResult Fail(string error) => new(default, error);
}
