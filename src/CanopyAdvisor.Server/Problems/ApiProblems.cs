using CanopyAdvisor.Core.Validation;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Mvc;

namespace CanopyAdvisor.Server.Problems;

/// <summary>The ProblemDetails (RFC 9457) the API answers with, built in one place so every error reads alike.</summary>
internal static class ApiProblems
{
    /// <summary>The extension member that lists every problem.</summary>
    public const string ErrorsMember = "errors";

    /// <summary>A problem with a status, a title, a detail and optionally every problem with its path.</summary>
    public static ProblemDetails Create(int status, string title, string? detail, IEnumerable<ProblemError>? errors = null)
    {
        var problem = new ProblemDetails { Status = status, Title = title, Detail = detail };
        if (errors is not null)
        {
            problem.Extensions[ErrorsMember] = errors.ToList();
        }

        return problem;
    }

    /// <summary>400: the request is not valid; every problem listed with its path.</summary>
    public static ProblemDetails Invalid(IReadOnlyList<ValidationError> errors) =>
        Create(
            StatusCodes.Status400BadRequest,
            "The request is not valid",
            errors.Count == 1 ? $"{errors[0].Path}: {errors[0].Message}" : $"{errors.Count} problems; see errors",
            errors.Select(e => new ProblemError(e.Path, e.Message)));

    /// <summary>403 with the parts the caller's role may not change.</summary>
    public static ProblemHttpResult Forbidden(string detail, IEnumerable<ProblemError>? errors = null) =>
        TypedResults.Problem(Create(StatusCodes.Status403Forbidden, "Not allowed for your role", detail, errors));

    /// <summary>404: nothing with this id in the caller's organisation (the same answer whether it exists elsewhere or not).</summary>
    public static ProblemHttpResult NotFound(string what) =>
        TypedResults.Problem(Create(StatusCodes.Status404NotFound, "Not found", $"no {what} with this id in your organisation"));

    /// <summary>409: the write conflicts with what is stored.</summary>
    public static ProblemHttpResult Conflict(string detail) =>
        TypedResults.Problem(Create(StatusCodes.Status409Conflict, "Conflict", detail));

    /// <summary>412: the If-Match precondition failed (RFC 9110 §13.1.1).</summary>
    public static ProblemHttpResult PreconditionFailed(string detail) =>
        TypedResults.Problem(Create(StatusCodes.Status412PreconditionFailed, "Precondition failed", detail));
}
