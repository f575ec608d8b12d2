namespace PathFinder.IO;

/// <summary>An output file that <see cref="AtomicFile"/> refused to write, and why; nothing was written.</summary>
/// <remarks>An <see cref="IOException"/>, so callers that report I/O failures report this one too.</remarks>
public sealed class OutputFileException : IOException
{
    /// <summary>Creates the exception with the message shown to the user and the reason.</summary>
    public OutputFileException(string message, OutputRefusal refusal, string path)
        : base(message)
    {
        Refusal = refusal;
        OutputPath = path;
    }

    /// <summary>Creates the exception with a generic message.</summary>
    public OutputFileException()
        : base("the output file was refused")
    {
        OutputPath = "";
    }

    /// <summary>Creates the exception with a message.</summary>
    public OutputFileException(string message)
        : base(message)
    {
        OutputPath = "";
    }

    /// <summary>Creates the exception with a message and its cause.</summary>
    public OutputFileException(string message, Exception innerException)
        : base(message, innerException)
    {
        OutputPath = "";
    }

    /// <summary>Why the file was refused.</summary>
    public OutputRefusal Refusal { get; }

    /// <summary>The output path as given.</summary>
    public string OutputPath { get; }
}
