namespace PathFinder.Cli;

/// <summary>A problem with what the user asked for (an option value, a target); reported as a message with exit code 2.</summary>
public sealed class UserInputException : Exception
{
    /// <summary>Creates the exception with the message shown to the user.</summary>
    public UserInputException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with the message shown to the user and its cause.</summary>
    public UserInputException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>Creates the exception with a generic message.</summary>
    public UserInputException()
        : base("invalid input")
    {
    }
}
