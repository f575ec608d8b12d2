namespace PathFinder.Solving;

/// <summary>Which dense linear-algebra code factors and inverts the normal matrix.</summary>
public enum LinearAlgebraBackend
{
    /// <summary>Native OpenBLAS/LAPACK when <c>libopenblas.so.0</c> can be loaded, otherwise managed code.</summary>
    Automatic,

    /// <summary>Native OpenBLAS/LAPACK only; solving throws when the library cannot be loaded.</summary>
    Native,

    /// <summary>The managed pivoted Cholesky of this library (slower, always available).</summary>
    Managed,
}
