namespace CutSheet.LanguageServer.Server;

/// <summary>A request of the protocol: convert in → editing feature → convert out. <see cref="RequestGuard{TParams,TResult}"/> guards it.</summary>
public interface IRequestHandler<in TParams, TResult>
{
    string Method { get; }

    Task<TResult?> HandleAsync(TParams parameters, CancellationToken cancellation);
}
