namespace PathFinder.Cli.Output;

/// <summary>Checks an output path before any work is done, so a long analysis never ends in an unwritable path.</summary>
public static class OutputPaths
{
    /// <summary>Throws a <see cref="UserInputException"/> when <paramref name="path"/> is a folder or its folder does not exist.</summary>
    /// <param name="path">The path given.</param>
    /// <param name="option">The option that gave it, for the message (e.g. <c>--covariance</c>).</param>
    public static void Check(string path, string option)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (path.Length == 0 || Directory.Exists(path))
        {
            throw new UserInputException($"{option} must name a file, not a folder: '{path}'");
        }

        string? folder = Path.GetDirectoryName(Path.GetFullPath(path));
        if (folder is not null && !Directory.Exists(folder))
        {
            throw new UserInputException($"the folder of {option} does not exist: {folder}");
        }
    }
}
