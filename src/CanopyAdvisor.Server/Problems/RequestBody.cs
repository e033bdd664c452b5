using System.Buffers;
using System.Text;
using System.Text.Json;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Server.Hosting;
using Microsoft.Extensions.Options;
using Microsoft.Net.Http.Headers;

namespace CanopyAdvisor.Server.Problems;

/// <summary>Reads request bodies with the service's limits: JSON media type (415 otherwise, RFC 9110 §15.5.16), size
/// (413 beyond the limit, checked on Content-Length and again while reading, RFC 9110 §15.5.14), strict UTF-8, and for
/// typed bodies the strict JSON settings (<see cref="ServerJson"/>); JSON problems become 400 with the field's path.</summary>
internal static class RequestBody
{
    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    /// <summary>Reads the body as text; an absent body gives an empty string.</summary>
    /// <exception cref="BadHttpRequestException">415, 413 or 400 (not UTF-8).</exception>
    public static async Task<string> ReadJsonTextAsync(HttpContext context)
    {
        HttpRequest request = context.Request;
        long limit = context.RequestServices.GetRequiredService<IOptions<CanopyServerOptions>>().Value.MaxRequestBodyBytes;
        if (request.ContentLength is 0 || (request.ContentLength is null && !request.Headers.ContainsKey(HeaderNames.TransferEncoding)))
        {
            return "";
        }

        if (!IsJson(request.ContentType))
        {
            throw new BadHttpRequestException(
                $"send the body as application/json (got {(string.IsNullOrEmpty(request.ContentType) ? "no Content-Type" : request.ContentType)})",
                StatusCodes.Status415UnsupportedMediaType);
        }

        if (request.ContentLength > limit)
        {
            throw TooLarge(limit);
        }

        byte[] buffer = ArrayPool<byte>.Shared.Rent(16 * 1024);
        try
        {
            using var bytes = new MemoryStream();
            int read;
            while ((read = await request.Body.ReadAsync(buffer, context.RequestAborted)) > 0)
            {
                if (bytes.Length + read > limit)
                {
                    throw TooLarge(limit);
                }

                bytes.Write(buffer, 0, read);
            }

            try
            {
                return StrictUtf8.GetString(bytes.GetBuffer(), 0, (int)bytes.Length);
            }
            catch (DecoderFallbackException)
            {
                throw new BadHttpRequestException("the body is not UTF-8 text (RFC 8259 §8.1)", StatusCodes.Status400BadRequest);
            }
        }
        finally
        {
            ArrayPool<byte>.Shared.Return(buffer);
        }
    }

    /// <summary>Reads and deserialises a JSON body strictly; an empty body reads as <c>{}</c> when
    /// <paramref name="optional"/>, else is an error.</summary>
    /// <exception cref="InvalidInputException">Malformed JSON, wrong types, unknown or missing properties, NaN.</exception>
    public static async Task<T> ReadJsonAsync<T>(HttpContext context, bool optional)
    {
        string text = await ReadJsonTextAsync(context);
        if (text.Length == 0)
        {
            if (!optional)
            {
                throw new InvalidInputException("body", "a JSON body is required");
            }

            text = "{}";
        }

        JsonSerializerOptions options = context.RequestServices.GetRequiredService<IOptions<Microsoft.AspNetCore.Http.Json.JsonOptions>>().Value.SerializerOptions;
        try
        {
            return JsonSerializer.Deserialize<T>(text, options) ?? throw new InvalidInputException("body", "must be a JSON object, not null");
        }
        catch (JsonException e)
        {
            throw new InvalidInputException(PathOf(e.Path), Describe(e));
        }
    }

    /// <summary>Whether a Content-Type is JSON: application/json or application/*+json (RFC 6839 §3.1), UTF-8 if a charset is given.</summary>
    public static bool IsJson(string? contentType)
    {
        if (!MediaTypeHeaderValue.TryParse(contentType, out MediaTypeHeaderValue? media))
        {
            return false;
        }

        bool json = media.MediaType.Equals("application/json", StringComparison.OrdinalIgnoreCase)
            || (media.Type.Equals("application", StringComparison.OrdinalIgnoreCase) && media.Suffix.Equals("json", StringComparison.OrdinalIgnoreCase));
        return json && (!media.Charset.HasValue || media.Charset.Equals("utf-8", StringComparison.OrdinalIgnoreCase));
    }

    private static BadHttpRequestException TooLarge(long limit) =>
        new($"the body is larger than the limit of {limit} bytes", StatusCodes.Status413PayloadTooLarge);

    // System.Text.Json paths are "$.benches[2].widthM"; the API's paths drop the "$." root like the site file reader's.
    private static string PathOf(string? jsonPath) =>
        string.IsNullOrEmpty(jsonPath) || jsonPath == "$" ? "body" : jsonPath.StartsWith("$.", StringComparison.Ordinal) ? jsonPath[2..] : jsonPath.TrimStart('$');

    private static string Describe(JsonException e)
    {
        // The serializer's messages name .NET types and end with the position; keep the part a client can act on.
        string message = e.Message;
        int cut = message.IndexOf(" Path:", StringComparison.Ordinal);
        if (cut > 0)
        {
            message = message[..cut];
        }

        cut = message.IndexOf(" LineNumber:", StringComparison.Ordinal);
        if (cut > 0)
        {
            message = message[..cut];
        }

        return e.LineNumber is long line ? $"{message} (line {line + 1}, byte {(e.BytePositionInLine ?? 0) + 1})" : message;
    }
}
