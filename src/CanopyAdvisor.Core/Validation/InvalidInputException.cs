namespace CanopyAdvisor.Core.Validation;

/// <summary>Thrown when input is rejected; carries every problem found, not only the first.</summary>
public sealed class InvalidInputException : Exception
{
    /// <summary>Creates the exception from the list of problems.</summary>
    public InvalidInputException(IReadOnlyList<ValidationError> errors)
        : base(FormatMessage(errors))
    {
        Errors = errors;
    }

    /// <summary>Creates the exception for a single problem.</summary>
    public InvalidInputException(string path, string message)
        : this([new ValidationError(path, message)])
    {
    }

    /// <summary>Creates an exception with a plain message (prefer the path-carrying constructors).</summary>
    public InvalidInputException()
        : this("input", "invalid")
    {
    }

    /// <summary>Creates an exception with a plain message (prefer the path-carrying constructors).</summary>
    public InvalidInputException(string message)
        : this("input", message)
    {
    }

    /// <summary>Creates an exception with a plain message and cause (prefer the path-carrying constructors).</summary>
    public InvalidInputException(string message, Exception innerException)
        : base(message, innerException)
    {
        Errors = [new ValidationError("input", message)];
    }

    /// <summary>Every problem found.</summary>
    public IReadOnlyList<ValidationError> Errors { get; }

    private static string FormatMessage(IReadOnlyList<ValidationError> errors) =>
        errors.Count == 1 ? errors[0].ToString() : $"{errors.Count} problems:\n" + string.Join('\n', errors);
}
