namespace CanopyAdvisor.Storage;

/// <summary>Thrown when a store's file is already open in another instance or process.</summary>
public sealed class StoreInUseException : Exception
{
    /// <summary>Creates the exception.</summary>
    public StoreInUseException()
    {
    }

    /// <summary>Creates the exception with a message.</summary>
    public StoreInUseException(string message)
        : base(message)
    {
    }

    /// <summary>Creates the exception with a message and its cause.</summary>
    public StoreInUseException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}
