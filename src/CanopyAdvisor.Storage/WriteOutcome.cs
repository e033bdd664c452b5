namespace CanopyAdvisor.Storage;

/// <summary>What became of a conditional write.</summary>
public enum WriteOutcome
{
    /// <summary>Written.</summary>
    Written,

    /// <summary>Nothing to write to: no such document in the organisation.</summary>
    NotFound,

    /// <summary>Not written: a unique key (an e-mail, a site key) is taken by another document.</summary>
    KeyTaken,

    /// <summary>Not written: the document changed since the version the caller read.</summary>
    VersionMismatch,
}
