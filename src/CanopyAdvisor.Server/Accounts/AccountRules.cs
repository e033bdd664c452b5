using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>The rules for account fields: e-mail, display names and labels.</summary>
internal static class AccountRules
{
    /// <summary>Longest e-mail: 254 characters (RFC 5321 §4.5.3.1.3 path limit less the angle brackets).</summary>
    public const int MaximumEmailLength = 254;

    /// <summary>Longest display name or label.</summary>
    public const int MaximumNameLength = 100;

    /// <summary>The problems of an e-mail address: one '@' with text on both sides, no spaces or control characters.</summary>
    public static IEnumerable<ValidationError> CheckEmail(string email, string path)
    {
        int at = email.IndexOf('@', StringComparison.Ordinal);
        if (email.Length > MaximumEmailLength || at <= 0 || at != email.LastIndexOf('@') || at == email.Length - 1
            || email.Any(c => char.IsWhiteSpace(c) || char.IsControl(c)))
        {
            yield return new ValidationError(path, $"must be an e-mail address (name@domain, at most {MaximumEmailLength} characters, no spaces)");
        }
    }

    /// <summary>The problems of a display name or label: 1 to 100 characters, not blank, no control characters.</summary>
    public static IEnumerable<ValidationError> CheckName(string name, string path)
    {
        if (string.IsNullOrWhiteSpace(name) || name.Length > MaximumNameLength || name.Any(char.IsControl))
        {
            yield return new ValidationError(path, $"must be 1 to {MaximumNameLength} characters, not blank, without control characters");
        }
    }

    /// <summary>A new random security stamp (128 bits, hex).</summary>
    public static string NewSecurityStamp() => Convert.ToHexStringLower(System.Security.Cryptography.RandomNumberGenerator.GetBytes(16));

    /// <summary>Throws every problem at once, if there is any.</summary>
    public static void ThrowIfAny(IEnumerable<ValidationError> errors)
    {
        List<ValidationError> list = errors.ToList();
        if (list.Count > 0)
        {
            throw new InvalidInputException(list);
        }
    }
}
