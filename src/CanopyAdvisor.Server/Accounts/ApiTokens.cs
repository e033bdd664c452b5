using System.Security.Cryptography;
using System.Text;

namespace CanopyAdvisor.Server.Accounts;

/// <summary>API token texts: 256 random bits from the operating system's CSPRNG, base64url (RFC 4648 §5), behind a
/// fixed prefix; only their SHA-256 is stored.</summary>
/// <remarks>A fast hash is enough here, unlike for passwords: the token has 256 bits of entropy, so there is nothing
/// to guess from a stolen hash (OWASP guidance on secrets and session ids, from memory). The token travels as an
/// RFC 6750 bearer token (<c>Authorization: Bearer …</c>), whose b64token syntax (§2.1) base64url fits.</remarks>
internal static class ApiTokens
{
    /// <summary>The prefix of every token, so a leaked one is easy to recognise and scan for.</summary>
    public const string Prefix = "cat_";

    /// <summary>A new token text.</summary>
    public static string NewToken() => Prefix + Base64Url(RandomNumberGenerator.GetBytes(32));

    /// <summary>The stored form of a token: lower-case hex SHA-256 of its UTF-8 text.</summary>
    public static string Hash(string token) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(token)));

    /// <summary>A new opaque id with a readable prefix (96 random bits, hex).</summary>
    public static string NewId(string prefix) => prefix + "_" + Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(12));

    private static string Base64Url(byte[] bytes) => Convert.ToBase64String(bytes).TrimEnd('=').Replace('+', '-').Replace('/', '_');
}
