using System.Collections.Concurrent;
using System.IO.Pipelines;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using CutSheet.LanguageServer;
using CutSheet.LanguageServer.Documents;

namespace CutSheet.LanguageServer.Tests.Support;

/// <summary>
/// A byte-level client for the server running in this process: it frames whatever it is given
/// (valid or not) and reads every message the server writes, so malformed input can be sent
/// and each answer inspected.
/// </summary>
public sealed class RawLspClient : IAsyncDisposable
{
    private readonly Pipe _toServer = new();
    private readonly Pipe _fromServer = new();
    private readonly Stream _write;
    private readonly Stream _read;
    private readonly ConcurrentQueue<JsonObject> _notifications = new();
    private readonly ConcurrentDictionary<string, TaskCompletionSource<JsonObject>> _pending = new();
    private readonly Channel _unmatched = new();
    private readonly Task _reader;
    private int _nextId = 1000;

    public RawLspClient()
    {
        _write = _toServer.Writer.AsStream();
        _read = _fromServer.Reader.AsStream();
        Log = new StringWriter();
        var library = new LibraryFiles(Path.Combine(Path.GetTempPath(), "cutsheet-lsp-tests-library"));
        Server = Task.Run(() => LanguageServerHost.RunAsync(_toServer.Reader.AsStream(), _fromServer.Writer.AsStream(), TextWriter.Synchronized(Log), library));
        _reader = Task.Run(ReadLoop);
    }

    public Task<int> Server { get; }

    public StringWriter Log { get; }

    public IEnumerable<JsonObject> Notifications => _notifications;

    /// <summary>Answers that matched no request sent through <see cref="RequestAsync"/> (parse errors carry id null).</summary>
    public Channel Unmatched => _unmatched;

    public async Task SendBodyAsync(byte[] body)
    {
        var header = Encoding.ASCII.GetBytes($"Content-Length: {body.Length}\r\n\r\n");
        await _write.WriteAsync(header);
        await _write.WriteAsync(body);
        await _write.FlushAsync();
    }

    public Task SendBodyAsync(string body) => SendBodyAsync(Encoding.UTF8.GetBytes(body));

    public Task NotifyAsync(string method, object? parameters) =>
        SendBodyAsync(JsonSerializer.Serialize(new Dictionary<string, object?> { ["jsonrpc"] = "2.0", ["method"] = method, ["params"] = parameters }));

    /// <summary>Sends a request and waits for its answer (a result or an error).</summary>
    public async Task<JsonObject> RequestAsync(string method, object? parameters, TimeSpan? timeout = null, object? id = null)
    {
        id ??= Interlocked.Increment(ref _nextId);
        var waiter = new TaskCompletionSource<JsonObject>(TaskCreationOptions.RunContinuationsAsynchronously);
        _pending[JsonSerializer.Serialize(id)] = waiter;
        var message = new Dictionary<string, object?> { ["jsonrpc"] = "2.0", ["id"] = id, ["method"] = method };
        if (parameters is not null) message["params"] = parameters;
        await SendBodyAsync(JsonSerializer.Serialize(message));
        return await waiter.Task.WaitAsync(timeout ?? TimeSpan.FromSeconds(20));
    }

    /// <summary>Starts a request without waiting (for cancellation tests); returns its id and the pending answer.</summary>
    public async Task<(int Id, Task<JsonObject> Answer)> StartRequestAsync(string method, object? parameters)
    {
        int id = Interlocked.Increment(ref _nextId);
        var waiter = new TaskCompletionSource<JsonObject>(TaskCreationOptions.RunContinuationsAsynchronously);
        _pending[id.ToString(System.Globalization.CultureInfo.InvariantCulture)] = waiter;
        await SendBodyAsync(JsonSerializer.Serialize(new Dictionary<string, object?> { ["jsonrpc"] = "2.0", ["id"] = id, ["method"] = method, ["params"] = parameters }));
        return (id, waiter.Task);
    }

    public Task<JsonObject> InitializeAsync(object? capabilities = null, object? initializationOptions = null) =>
        RequestAsync("initialize", new Dictionary<string, object?>
        {
            ["processId"] = null,
            ["rootUri"] = null,
            ["capabilities"] = capabilities ?? new { textDocument = new { inlayHint = new { } } },
            ["initializationOptions"] = initializationOptions,
        });

    public async Task StartAsync()
    {
        await InitializeAsync();
        await NotifyAsync("initialized", new { });
    }

    /// <summary>Waits for diagnostics of a document that satisfy the test.</summary>
    public async Task<JsonObject> DiagnosticsAsync(string uri, Func<JsonObject, bool>? test = null, TimeSpan? timeout = null)
    {
        var deadline = DateTime.UtcNow + (timeout ?? TimeSpan.FromSeconds(20));
        while (DateTime.UtcNow < deadline)
        {
            var found = _notifications.Where(n => (string?)n["method"] == "textDocument/publishDiagnostics" && (string?)n["params"]!["uri"] == uri)
                .Select(n => n["params"]!.AsObject()).LastOrDefault();
            if (found is not null && (test is null || test(found))) return found;
            await Task.Delay(10);
        }
        throw new TimeoutException($"no matching diagnostics for {uri}; log:\n{Log}");
    }

    public void ForgetNotifications() => _notifications.Clear();

    private async Task ReadLoop()
    {
        try
        {
            while (true)
            {
                int length = -1;
                while (true)
                {
                    string? line = await ReadLineAsync();
                    if (line is null) return;
                    if (line.Length == 0) break;
                    if (line.StartsWith("Content-Length:", StringComparison.OrdinalIgnoreCase)) length = int.Parse(line[15..].Trim(), System.Globalization.CultureInfo.InvariantCulture);
                }
                var body = new byte[length];
                await _read.ReadExactlyAsync(body);
                var message = JsonNode.Parse(body)!.AsObject();
                if (message.ContainsKey("method") && !message.ContainsKey("id")) { _notifications.Enqueue(message); continue; }
                if (message.ContainsKey("method"))
                {
                    // A request from the server (a refresh): recorded, and answered as a client would.
                    _notifications.Enqueue(message);
                    await SendBodyAsync($"{{\"jsonrpc\":\"2.0\",\"id\":{message["id"]!.ToJsonString()},\"result\":null}}");
                    continue;
                }
                string key = message["id"]?.ToJsonString() ?? "null";
                if (_pending.TryRemove(key, out var waiter)) waiter.TrySetResult(message);
                else _unmatched.Add(message);
            }
        }
        catch (Exception e) when (e is IOException or ObjectDisposedException or EndOfStreamException)
        {
        }
    }

    private async Task<string?> ReadLineAsync()
    {
        var bytes = new List<byte>();
        var one = new byte[1];
        while (true)
        {
            if (await _read.ReadAsync(one) == 0) return null;
            if (one[0] == '\n') return Encoding.ASCII.GetString(bytes.ToArray()).TrimEnd('\r');
            bytes.Add(one[0]);
        }
    }

    public async ValueTask DisposeAsync()
    {
        await _toServer.Writer.CompleteAsync();
        try { await Server.WaitAsync(TimeSpan.FromSeconds(10)); } catch (TimeoutException) { }
        await _fromServer.Writer.CompleteAsync();
    }

    /// <summary>Unmatched answers, waited for.</summary>
    public sealed class Channel
    {
        private readonly ConcurrentQueue<JsonObject> _items = new();

        public void Add(JsonObject item) => _items.Enqueue(item);

        public async Task<JsonObject> NextAsync(TimeSpan? timeout = null)
        {
            var deadline = DateTime.UtcNow + (timeout ?? TimeSpan.FromSeconds(10));
            while (DateTime.UtcNow < deadline)
            {
                if (_items.TryDequeue(out var item)) return item;
                await Task.Delay(10);
            }
            throw new TimeoutException("no unmatched answer arrived");
        }

        public int Count => _items.Count;
    }
}
