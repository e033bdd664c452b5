using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Storage;
using Microsoft.AspNetCore.Identity;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>Password hashing with the framework's <see cref="PasswordHasher{TUser}"/> (PBKDF2 with a per-password salt,
/// its own versioned format) and the password rules.</summary>
internal sealed class Passwords
{
    /// <summary>Shortest password: 12 characters (OWASP ASVS 4.0 V2.1.1, from memory).</summary>
    public const int MinimumLength = 12;

    /// <summary>Longest password: 128 characters (ASVS V2.1.2 asks to allow at least 64; from memory).</summary>
    public const int MaximumLength = 128;

    private readonly PasswordHasher<UserRecord> _hasher = new();

    // A hash to check against when no user has the e-mail, so an unknown e-mail costs as much time as a wrong password
    // (OWASP authentication guidance against account enumeration, from memory).
    private readonly string _decoy;

    /// <summary>Creates the hasher.</summary>
    public Passwords()
    {
        _decoy = _hasher.HashPassword(Placeholder, "decoy password that is never used");
    }

    private static UserRecord Placeholder { get; } = new("", "", "", "", UserRole.Grower, "", "", default);

    /// <summary>The stored hash of a password.</summary>
    public string Hash(string password) => _hasher.HashPassword(Placeholder, password);

    /// <summary>Whether the password matches the user's hash; with no user, spends the same time and answers false.</summary>
    public bool Verify(UserRecord? user, string password)
    {
        PasswordVerificationResult result = _hasher.VerifyHashedPassword(Placeholder, user?.PasswordHash ?? _decoy, password);
        return user is not null && result != PasswordVerificationResult.Failed;
    }

    /// <summary>The problems of a new password (length only: NIST SP 800-63B §5.1.1.2 advises against composition rules).</summary>
    public static IEnumerable<ValidationError> Check(string password, string path)
    {
        if (password.Length < MinimumLength || password.Length > MaximumLength)
        {
            yield return new ValidationError(path, $"must be {MinimumLength} to {MaximumLength} characters long");
        }
    }
}
