using System.Runtime.CompilerServices;

// The benchmark drives the real window headlessly, as the tests do.
[assembly: InternalsVisibleTo("PathFinder.Benchmarks")]
