using CanopyAdvisor.Core.Validation;
using Microsoft.AspNetCore.Diagnostics;
using Microsoft.AspNetCore.Mvc;

namespace CanopyAdvisor.Server.Problems;

/// <summary>Turns exceptions into ProblemDetails: rejected input (<see cref="InvalidInputException"/>) is 400 with every
/// problem, the framework's bad requests keep their status (400, 413, 415), anything else is a 500 that says nothing
/// of the inside (OWASP error-handling guidance, from memory: log the details, show the client none).</summary>
internal sealed partial class ProblemExceptionHandler(IProblemDetailsService problems, ILogger<ProblemExceptionHandler> logger) : IExceptionHandler
{
    public async ValueTask<bool> TryHandleAsync(HttpContext httpContext, Exception exception, CancellationToken cancellationToken)
    {
        ProblemDetails problem;
        switch (exception)
        {
            case InvalidInputException invalid:
                problem = ApiProblems.Invalid(invalid.Errors);
                break;
            case BadHttpRequestException bad:
                problem = ApiProblems.Create(
                    bad.StatusCode,
                    bad.StatusCode switch
                    {
                        StatusCodes.Status413PayloadTooLarge => "The request body is too large",
                        StatusCodes.Status415UnsupportedMediaType => "Unsupported media type",
                        _ => "The request is not valid",
                    },
                    bad.Message,
                    [new ProblemError("body", bad.Message)]);
                break;
            case OperationCanceledException when httpContext.RequestAborted.IsCancellationRequested:
                // The client went away; nobody reads the answer.
                return true;
            default:
                LogUnexpected(logger, exception, httpContext.Request.Method, httpContext.Request.Path);
                problem = ApiProblems.Create(StatusCodes.Status500InternalServerError, "Unexpected error", "The service failed on this request; it has been logged.");
                break;
        }

        httpContext.Response.StatusCode = problem.Status ?? StatusCodes.Status500InternalServerError;
        return await problems.TryWriteAsync(new ProblemDetailsContext { HttpContext = httpContext, ProblemDetails = problem, Exception = exception });
    }

    [LoggerMessage(Level = LogLevel.Error, Message = "Unexpected error on {Method} {Path}")]
    private static partial void LogUnexpected(ILogger logger, Exception exception, string method, string path);
}
