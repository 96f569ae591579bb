'use strict';
// Starts the real 'cutsheet lsp' as a child process and connects the real LSP client library to it.
const { spawn } = require('node:child_process');
const path = require('node:path');
const fs = require('node:fs');
const os = require('node:os');
const { pathToFileURL } = require('node:url');
const rpc = require('vscode-languageserver-protocol/node');

/** The server: CUTSHEET_DLL (set by the xunit runner; a .dll, or a published native binary) or the CLI's Debug build. */
function serverDll() {
  const fromEnv = process.env.CUTSHEET_DLL;
  if (fromEnv) return fromEnv;
  return path.resolve(__dirname, '../../src/CutSheet.Cli/bin/Debug/net10.0/cutsheet.dll');
}

/** A started server with a connection, the stderr text, and the diagnostics it published, by URI. */
async function start({ initializationOptions, capabilities, workspace } = {}) {
  const dll = serverDll();
  if (!fs.existsSync(dll)) throw new Error(`server not built: ${dll}`);
  // A published native build (Native AOT) is started directly, so the shipped binary can be tested too.
  const [program, args] = dll.endsWith('.dll') ? ['dotnet', ['exec', dll, 'lsp']] : [dll, ['lsp']];
  const child = spawn(program, args, { stdio: ['pipe', 'pipe', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (d) => { stderr += d.toString(); });
  const connection = rpc.createProtocolConnection(
    new rpc.StreamMessageReader(child.stdout),
    new rpc.StreamMessageWriter(child.stdin));
  const diagnostics = new Map();
  const waiters = [];
  connection.onNotification(rpc.PublishDiagnosticsNotification.type, (p) => {
    diagnostics.set(p.uri, p);
    for (const w of waiters.slice()) if (w.test(p)) { waiters.splice(waiters.indexOf(w), 1); w.resolve(p); }
  });
  const logs = [];
  connection.onNotification(rpc.LogMessageNotification.type, (p) => logs.push(p));
  connection.listen();
  const folder = workspace ?? fs.mkdtempSync(path.join(os.tmpdir(), 'cutsheet-e2e-'));
  const init = await connection.sendRequest(rpc.InitializeRequest.type, {
    processId: process.pid,
    rootUri: pathToFileURL(folder).href,
    workspaceFolders: [{ uri: pathToFileURL(folder).href, name: 'e2e' }],
    capabilities: capabilities ?? { textDocument: { inlayHint: {} }, general: { positionEncodings: ['utf-16'] } },
    initializationOptions,
  });
  await connection.sendNotification(rpc.InitializedNotification.type, {});

  /** Waits for published diagnostics that satisfy test (checks those already received first). */
  function waitForDiagnostics(uri, test = () => true, timeoutMs = 10000) {
    const have = diagnostics.get(uri);
    if (have && test(have)) return Promise.resolve(have);
    return new Promise((resolve, reject) => {
      // The timer is cleared on success and never keeps the process alive.
      const timer = setTimeout(() => {
        const i = waiters.indexOf(w);
        if (i >= 0) { waiters.splice(i, 1); reject(new Error(`no diagnostics for ${uri} in ${timeoutMs} ms; stderr: ${stderr}`)); }
      }, timeoutMs);
      timer.unref();
      const w = { test: (p) => p.uri === uri && test(p), resolve: (p) => { clearTimeout(timer); resolve(p); } };
      waiters.push(w);
    });
  }

  let version = 0;
  async function open(name, text) {
    const file = path.join(folder, name);
    fs.mkdirSync(path.dirname(file), { recursive: true });
    fs.writeFileSync(file, text);
    const uri = pathToFileURL(file).href;
    diagnostics.delete(uri);
    await connection.sendNotification(rpc.DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: 'cutsheet', version: ++version, text },
    });
    return uri;
  }

  async function change(uri, changes) {
    const v = ++version;
    await connection.sendNotification(rpc.DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: v }, contentChanges: changes,
    });
    return v;
  }

  async function stop() {
    const exited = new Promise((resolve) => child.on('exit', (code) => resolve(code)));
    await connection.sendRequest(rpc.ShutdownRequest.type);
    await connection.sendNotification(rpc.ExitNotification.type);
    const code = await exited;
    connection.dispose();
    return code;
  }

  return { connection, child, init, folder, open, change, stop, waitForDiagnostics, diagnostics, logs, stderr: () => stderr };
}

module.exports = { start, rpc };
