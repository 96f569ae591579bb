using StreamJsonRpc;

namespace CutSheet.LanguageServer.Transport;

/// <summary>
/// A message body the formatter could not read. When the body is a JSON object with an id, the
/// id is kept so the answer reaches the request's sender (<see cref="Code"/> is then "invalid
/// request"); otherwise the answer carries id null and "parse error".
/// </summary>
public sealed class UnreadableMessageException(RequestId? id, int code, bool isNotification, string reason, Exception inner)
    : Exception(reason, inner)
{
    public RequestId? Id { get; } = id;

    public int Code { get; } = code;

    /// <summary>A notification gets no answer, even a malformed one.</summary>
    public bool IsNotification { get; } = isNotification;
}
