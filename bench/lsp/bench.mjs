// Language-server benchmark: the published `cutsheet lsp` driven over stdio by the real client library
// (vscode-languageserver-protocol 3.18.5 / vscode-jsonrpc 10.0.0, from tests/lsp-e2e/node_modules).
// A benchmark, not a timed test: it prints figures and verdicts, and fails only when the server misbehaves.
//
//   node bench/lsp/bench.mjs [--server bench/out/publish/r2r/cutsheet] [--edits 500] [--seed 1]
import { createRequire } from 'node:module';
import { spawn } from 'node:child_process';
import { performance } from 'node:perf_hooks';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, '../..');
const require = createRequire(path.join(root, 'tests/lsp-e2e/package.json'));
const rpc = require('vscode-languageserver-protocol/node');
const pkgVersion = (name) => JSON.parse(fs.readFileSync(path.join(root, 'tests/lsp-e2e/node_modules', name, 'package.json'), 'utf8')).version;
const clientVersion = pkgVersion('vscode-languageserver-protocol');
const jsonrpcVersion = pkgVersion('vscode-jsonrpc');

const args = process.argv.slice(2);
const opt = (name, def) => { const i = args.indexOf(name); return i >= 0 ? args[i + 1] : def; };
const server = path.resolve(root, opt('--server', 'bench/out/publish/r2r/cutsheet'));
const EDITS = Number(opt('--edits', 500));
const QUERIES = Number(opt('--queries', 100));
const SPAWNS = Number(opt('--spawns', 10));
let seed = Number(opt('--seed', 1));
const rand = () => { seed = (seed * 1103515245 + 12345) % 2147483648; return seed / 2147483648; };
if (!fs.existsSync(server)) { console.error(`server not published: ${server}\n  dotnet publish src/CutSheet.Cli -c Release -o bench/out/publish/r2r -r linux-x64 --self-contained false -p:PublishAot=false -p:PublishReadyToRun=true`); process.exit(2); }

// ---- the sheets --------------------------------------------------------------------------------
/** A sheet of n lines of unit arithmetic; returns the text and the line numbers of the chain steps. */
function sheet(n) {
  const lines = ['# Language-server benchmark sheet (generated)', 'use screws', 'x0 = 16 mm', 'F0 = 1.2 kN'];
  const chain = [];
  let j = 0, m = 0, k = 0;
  while (lines.length < n) {
    const r = lines.length % 20;
    if (r === 0) lines.push(k % 2 === 0 ? `## Block ${++k}` : (k++, `// block ${k}: feed chain with side results`));
    else if (r === 10) { lines.push(`F${m + 1} = F${m} * 0.9999 + 2 lbf`); m++; }
    else if (r === 15) {
      const side = [
        `y${j} = x${j} as in`,
        `T${j} = F${m} * 5 mm/rev / (2 * pi) as N·m`,
        `lam${j} = lead_angle(lead: 5 mm/rev, d: x${j}) as deg`,
        `n${j} = 200 m/min / (pi * x${j}) as rpm`,
        `p${j} = F${m} / (x${j} * x${j}) as MPa`,
        `check x${j} <= 10 m`,
      ];
      lines.push(side[Math.floor(lines.length / 20) % side.length]);
    } else {
      chain.push(lines.length);
      lines.push(`x${j + 1} = x${j} * 1.0001 + 0.25 mm` + (j % 4 === 0 ? '   // feed step' : ''));
      j++;
    }
  }
  return { text: lines.join('\n') + '\n', lines, chain };
}

// ---- a server session --------------------------------------------------------------------------
function startServer() {
  const t0 = performance.now();
  const child = spawn(server, ['lsp'], { stdio: ['pipe', 'pipe', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (d) => { stderr += d.toString(); });
  let stopping = false;
  child.on('exit', (code, signal) => {
    if (stopping) return;
    console.error(`the server exited unasked (code ${code}, signal ${signal}); stderr:\n${stderr}`);
    process.exit(3);
  });
  const connection = rpc.createProtocolConnection(new rpc.StreamMessageReader(child.stdout), new rpc.StreamMessageWriter(child.stdin));
  const waiters = [];
  const last = new Map();
  connection.onNotification(rpc.PublishDiagnosticsNotification.type, (p) => {
    const t = performance.now();
    last.set(p.uri, p);
    for (const w of waiters.slice()) if (w.test(p)) { waiters.splice(waiters.indexOf(w), 1); w.resolve({ p, t }); }
  });
  connection.onRequest(() => null); // refresh requests and the like
  connection.listen();
  const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'cutsheet-lspbench-'));
  function waitFor(test, ms = 30000) {
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error(`no diagnostics in ${ms} ms; stderr: ${stderr}`)), ms);
      waiters.push({ test, resolve: (x) => { clearTimeout(timer); resolve(x); } });
    });
  }
  async function initialize() {
    const init = await connection.sendRequest(rpc.InitializeRequest.type, {
      processId: process.pid, rootUri: pathToFileURL(folder).href,
      workspaceFolders: [{ uri: pathToFileURL(folder).href, name: 'bench' }],
      capabilities: { textDocument: { hover: { contentFormat: ['markdown'] }, completion: {}, publishDiagnostics: { versionSupport: true } }, general: { positionEncodings: ['utf-16'] } },
    });
    const ms = performance.now() - t0;
    await connection.sendNotification(rpc.InitializedNotification.type, {});
    return { init, ms };
  }
  let version = 0;
  async function open(name, text) {
    const file = path.join(folder, name);
    fs.writeFileSync(file, text);
    const uri = pathToFileURL(file).href;
    const v = ++version;
    const done = waitFor((p) => p.uri === uri && p.version === v);
    const t = performance.now();
    await connection.sendNotification(rpc.DidOpenTextDocumentNotification.type, { textDocument: { uri, languageId: 'cutsheet', version: v, text } });
    return { uri, done: done.then((x) => ({ ...x, ms: x.t - t })) };
  }
  async function change(uri, changes) {
    const v = ++version;
    const done = waitFor((p) => p.uri === uri && p.version === v);
    const t = performance.now();
    await connection.sendNotification(rpc.DidChangeTextDocumentNotification.type, { textDocument: { uri, version: v }, contentChanges: changes });
    const x = await done;
    return { ...x, ms: x.t - t };
  }
  function rss() {
    const s = fs.readFileSync(`/proc/${child.pid}/status`, 'utf8');
    const kb = (k) => Number(new RegExp(`^${k}:\\s+(\\d+) kB`, 'm').exec(s)[1]);
    return { rss: kb('VmRSS') / 1024, hwm: kb('VmHWM') / 1024 };
  }
  async function stop() {
    stopping = true;
    const exited = new Promise((resolve) => child.on('exit', (code) => resolve(code)));
    await connection.sendRequest(rpc.ShutdownRequest.type);
    await connection.sendNotification(rpc.ExitNotification.type);
    const code = await exited;
    connection.dispose();
    fs.rmSync(folder, { recursive: true, force: true });
    if (code !== 0) throw new Error(`server exit code ${code}; stderr: ${stderr}`);
    return code;
  }
  return { connection, child, initialize, open, change, rss, stop, stderr: () => stderr };
}

// ---- statistics --------------------------------------------------------------------------------
const pct = (xs, q) => { const s = [...xs].sort((a, b) => a - b); return s[Math.min(s.length - 1, Math.ceil(q * s.length) - 1)]; };
const median = (xs) => { const s = [...xs].sort((a, b) => a - b); const h = s.length >> 1; return s.length % 2 ? s[h] : (s[h - 1] + s[h]) / 2; };
const f = (ms) => (ms >= 100 ? ms.toFixed(0) : ms >= 10 ? ms.toFixed(1) : ms.toFixed(2));
const load = () => os.loadavg().map((x) => x.toFixed(2)).join(', ');

// ---- the run -----------------------------------------------------------------------------------
const started = new Date();
const loadStart = load();
console.log(`# cutsheet lsp benchmark — ${started.toISOString().slice(0, 16).replace('T', ' ')} UTC`);
console.log(`server ${path.relative(root, server)} (${(fs.statSync(server).size / 1048576).toFixed(1)} MiB); client vscode-languageserver-protocol ${clientVersion} / vscode-jsonrpc ${jsonrpcVersion}; node ${process.version}`);
console.log(`${os.cpus().length} cores (${os.cpus()[0].model.trim()}), ${(os.totalmem() / 2 ** 30).toFixed(1)} GiB; load average at start ${loadStart}`);

// 1. spawn → initialize response: one warm-up spawn (file cache), then SPAWNS fresh ones.
const spawnMs = [];
for (let i = 0; i <= SPAWNS; i++) {
  const s = startServer();
  const { ms } = await s.initialize();
  if (i > 0) spawnMs.push(ms);
  await s.stop();
}

// 2-4. one server: open the 2,000-line sheet, then edits, hover and completion.
const big = sheet(2000);
const s = startServer();
const { init } = await s.initialize();
if (!init.capabilities.hoverProvider || !init.capabilities.completionProvider) throw new Error('server lacks hover or completion');
const { uri, done } = await s.open('big.cutsheet', big.text);
const first = await done;
if (first.p.diagnostics.length) throw new Error(`the generated sheet has diagnostics: ${JSON.stringify(first.p.diagnostics.slice(0, 3))}`);
const openMs = first.ms;

// Edits: change the last digit of the step 0.2d mm (d = 0..5) on a random chain line, wait for that version.
// The steps never exceed the generated 0.25 mm, so every check keeps passing and no diagnostic is expected.
const editMs = [];
let nonEmpty = 0;
for (let i = 0; i < EDITS; i++) {
  const line = big.chain[Math.floor(rand() * big.chain.length)];
  const col = big.lines[line].indexOf('+ 0.2') + 5;
  const digit = String(Math.floor(rand() * 6));
  const r = await s.change(uri, [{ range: { start: { line, character: col }, end: { line, character: col + 1 } }, text: digit }]);
  big.lines[line] = big.lines[line].slice(0, col) + digit + big.lines[line].slice(col + 1);
  if (r.p.diagnostics.length) nonEmpty++;
  editMs.push(r.ms);
}

// Typing: insert a 0 after the step's last digit on a random chain line (0.2d → 0.2d0, the same value),
// then delete it again. Unlike the replacements above these change the length of the text, so every
// statement after the edit moves and is parsed again; the figure shows what typing costs.
const typeMs = [];
for (let i = 0; i < EDITS; i += 2) {
  const line = big.chain[Math.floor(rand() * big.chain.length)];
  const col = big.lines[line].indexOf('+ 0.2') + 6;
  const insert = await s.change(uri, [{ range: { start: { line, character: col }, end: { line, character: col } }, text: '0' }]);
  const remove = await s.change(uri, [{ range: { start: { line, character: col }, end: { line, character: col + 1 } }, text: '' }]);
  if (insert.p.diagnostics.length || remove.p.diagnostics.length) nonEmpty++;
  typeMs.push(insert.ms, remove.ms);
}

// Hover on the defined name of a random chain line; completion after the "x" that starts its right side,
// then (when the server offers it) completionItem/resolve of the first item, as an editor does for the selected one.
const hoverMs = [], completionMs = [], resolveMs = [];
const resolves = Boolean(init.capabilities.completionProvider.resolveProvider);
let hoverEmpty = 0, completionEmpty = 0, completionItems = 0, completionBytes = 0, completionIncomplete = 0;
const td = { uri };
for (let i = 0; i < QUERIES; i++) {
  const line = big.chain[Math.floor(rand() * big.chain.length)];
  let t = performance.now();
  const h = await s.connection.sendRequest(rpc.HoverRequest.type, { textDocument: td, position: { line, character: 1 } });
  hoverMs.push(performance.now() - t);
  if (!h) hoverEmpty++;
  const col = big.lines[line].indexOf('= x') + 3;
  t = performance.now();
  const c = await s.connection.sendRequest(rpc.CompletionRequest.type, { textDocument: td, position: { line, character: col } });
  completionMs.push(performance.now() - t);
  const items = Array.isArray(c) ? c : c?.items ?? [];
  if (!items.length) completionEmpty++;
  completionItems += items.length;
  completionBytes += JSON.stringify(c).length;
  if (c?.isIncomplete) completionIncomplete++;
  if (resolves && items.length) {
    t = performance.now();
    const r = await s.connection.sendRequest(rpc.CompletionResolveRequest.type, items[0]);
    resolveMs.push(performance.now() - t);
    if (r.label !== items[0].label) throw new Error(`resolve changed the label ${items[0].label} to ${r.label}`);
  }
}
const bigMem = s.rss();
await s.stop();

// 5. a fresh server with 50 copies of a 200-line sheet open.
const small = sheet(200);
const m = startServer();
await m.initialize();
const idle = m.rss();
const opened = [];
for (let i = 0; i < 50; i++) opened.push((await m.open(`sheet${String(i).padStart(2, '0')}.cutsheet`, small.text)).done);
const smallResults = await Promise.all(opened);
if (smallResults.some((x) => x.p.diagnostics.length)) throw new Error('the 200-line sheet has diagnostics');
await new Promise((r) => setTimeout(r, 500));
const fifty = m.rss();
await m.stop();

// ---- report ------------------------------------------------------------------------------------
const loadEnd = load();
const verdict = (ok, miss) => (ok ? 'met' : `**missed** (${miss})`);
const e50 = pct(editMs, 0.5), e99 = pct(editMs, 0.99), h99 = pct(hoverMs, 0.99), c99 = pct(completionMs, 0.99);
const rows = [
  ['spawn → initialize response, median of ' + SPAWNS, `${f(median(spawnMs))} ms (min ${f(Math.min(...spawnMs))}, max ${f(Math.max(...spawnMs))})`, '≤ 150 ms', verdict(median(spawnMs) <= 150, `${f(median(spawnMs))} ms`)],
  [`didOpen → first publishDiagnostics, ${big.lines.length}-line sheet`, `${f(openMs)} ms`, '—', '—'],
  [`didChange → publishDiagnostics, p50 of ${EDITS}`, `${f(e50)} ms`, '≤ 5 ms', verdict(e50 <= 5, `${(e50 / 5).toFixed(1)}× over`)],
  [`didChange → publishDiagnostics, p99 of ${EDITS}`, `${f(e99)} ms (max ${f(Math.max(...editMs))})`, '≤ 20 ms', verdict(e99 <= 20, `${(e99 / 20).toFixed(1)}× over`)],
  [`hover, p50 / p99 of ${QUERIES}`, `${f(pct(hoverMs, 0.5))} / ${f(h99)} ms`, 'p99 ≤ 10 ms', verdict(h99 <= 10, `${(h99 / 10).toFixed(1)}× over`)],
  [`completion, p50 / p99 of ${QUERIES}`, `${f(pct(completionMs, 0.5))} / ${f(c99)} ms`, 'p99 ≤ 10 ms', verdict(c99 <= 10, `${(c99 / 10).toFixed(1)}× over`)],
  ['resident memory (VmRSS), 50 × 200-line sheets open', `${fifty.rss.toFixed(1)} MiB (peak VmHWM ${fifty.hwm.toFixed(1)} MiB; idle after initialize ${idle.rss.toFixed(1)} MiB)`, '≤ 150 MB', verdict(fifty.rss * 1.048576 <= 150, `${(fifty.rss * 1.048576).toFixed(0)} MB`)],
];
console.log('\n| what | figure | target | verdict |\n|---|---:|---|---|');
for (const r of rows) console.log(`| ${r.join(' | ')} |`);
console.log(`\nload average at end ${loadEnd}`);
console.log(`edits: min ${f(Math.min(...editMs))}, p10 ${f(pct(editMs, 0.1))}, p90 ${f(pct(editMs, 0.9))} ms; ${nonEmpty} of ${EDITS} publications had diagnostics (expected 0)`);
console.log(`typing (${typeMs.length} edits that insert or delete a character, moving every later statement): p50 ${f(pct(typeMs, 0.5))}, p90 ${f(pct(typeMs, 0.9))}, p99 ${f(pct(typeMs, 0.99))} ms (max ${f(Math.max(...typeMs))})`);
console.log(`hover: ${hoverEmpty} empty answers; completion: ${completionEmpty} empty answers (of ${QUERIES} each), ${Math.round(completionItems / QUERIES)} items and ${(completionBytes / QUERIES / 1024).toFixed(1)} KiB of JSON per answer on average, ${completionIncomplete} marked incomplete`);
console.log(resolves
  ? `completionItem/resolve (advertised): first item of each answer resolved, p50 / p99 ${f(pct(resolveMs, 0.5))} / ${f(pct(resolveMs, 0.99))} ms`
  : 'completionItem/resolve: not advertised; details travel in the list');
console.log(`the 2,000-line server after the edits and queries: VmRSS ${bigMem.rss.toFixed(1)} MiB, VmHWM ${bigMem.hwm.toFixed(1)} MiB`);
console.log(`50 opens: first publishDiagnostics of the last of them ${f(smallResults.at(-1).ms)} ms after its didOpen`);
