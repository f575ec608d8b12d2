namespace PathFinder.Data;

/// <summary>How many errors and warnings one file of a network has, for a one-line-per-file summary before the list.</summary>
/// <param name="File">The file as given (or the network path for problems of the whole network).</param>
/// <param name="Errors">Errors located in the file.</param>
/// <param name="Warnings">Warnings located in the file.</param>
public sealed record FileProblemCount(string File, int Errors, int Warnings);
