'use strict';
// End-to-end: the real 'cutsheet lsp' process driven by vscode-languageserver-protocol over stdio.
const { test, before, after } = require('node:test');
const assert = require('node:assert/strict');
const { start, rpc } = require('./harness');

const HOLD = [
  'use screws',
  '## Hold',
  'F_axial = 1.1 kN',
  'P_h = lead(pitch: 5 mm)',
  'η′ = 0.9',
  'T_hold = F_axial * P_h * η′ / (2 * pi) as N·m',
  'r_grip = 60 mm',
  'F_rim = T_hold / r_grip as N',
  'check F_rim <= 25 N',
  '',
].join('\n');

let server;
let uri;

before(async () => {
  server = await start();
  uri = await server.open('hold.cutsheet', HOLD);
});

after(async () => {
  if (server) assert.equal(await server.stop(), 0, 'exit code after shutdown and exit');
  assert.doesNotMatch(server.stderr(), /Unhandled exception/);
});

test('handshake: capabilities and server info', () => {
  const caps = server.init.capabilities;
  assert.equal(server.init.serverInfo.name, 'cutsheet');
  assert.equal(caps.positionEncoding, 'utf-16');
  assert.equal(caps.textDocumentSync.change, 2);
  for (const c of ['hoverProvider', 'definitionProvider', 'referencesProvider', 'inlayHintProvider', 'documentFormattingProvider', 'foldingRangeProvider', 'documentSymbolProvider']) {
    assert.equal(caps[c], true, c);
  }
  assert.equal(caps.renameProvider.prepareProvider, true);
  assert.equal(caps.completionProvider.resolveProvider, true);
  assert.ok(caps.semanticTokensProvider.legend.tokenTypes.includes('type'));
});

test('open: a clean sheet publishes empty diagnostics for its version', async () => {
  const d = await server.waitForDiagnostics(uri);
  assert.equal(d.version, 1);
  assert.deepEqual(d.diagnostics, []);
});

test('edit: a unit error appears with its code and position, then clears when fixed', async () => {
  // Line 6: "r_grip = 60 mm" → "r_grip = 60 kg"
  const broken = await server.change(uri, [{ range: { start: { line: 6, character: 12 }, end: { line: 6, character: 14 } }, text: 'kg' }]);
  const bad = await server.waitForDiagnostics(uri, (p) => p.version === broken);
  assert.ok(bad.diagnostics.length >= 1, JSON.stringify(bad));
  const codes = bad.diagnostics.map((x) => x.code);
  assert.ok(codes.some((c) => /^CUT2/.test(c)), codes.join(','));
  assert.ok(bad.diagnostics.every((x) => x.source === 'cutsheet'));

  const fixed = await server.change(uri, [{ range: { start: { line: 6, character: 12 }, end: { line: 6, character: 14 } }, text: 'mm' }]);
  const clean = await server.waitForDiagnostics(uri, (p) => p.version === fixed);
  assert.deepEqual(clean.diagnostics, []);
});

test('edit: a failed check is an error, a caution a warning', async () => {
  // Line 8 "check F_rim <= 25 N": the limit "25" is at characters 15-17.
  const v = await server.change(uri, [{ range: { start: { line: 8, character: 15 }, end: { line: 8, character: 17 } }, text: '10' },
    { range: { start: { line: 9, character: 0 }, end: { line: 9, character: 0 } }, text: 'caution "the screw runs back" when η′ > 0.5\n' }]);
  const d = await server.waitForDiagnostics(uri, (p) => p.version === v);
  const check = d.diagnostics.find((x) => x.code === 'CUT4001');
  assert.ok(check, JSON.stringify(d.diagnostics));
  assert.equal(check.severity, rpc.DiagnosticSeverity.Error);
  const caution = d.diagnostics.find((x) => x.code === 'CUT4102');
  assert.ok(caution, JSON.stringify(d.diagnostics));
  assert.equal(caution.severity, rpc.DiagnosticSeverity.Warning);
  const back = await server.change(uri, [{ range: { start: { line: 8, character: 0 }, end: { line: 10, character: 0 } }, text: 'check F_rim <= 25 N\n' }]);
  const clean = await server.waitForDiagnostics(uri, (p) => p.version === back);
  assert.deepEqual(clean.diagnostics, []);
});

test('hover: value in both unit systems, kind and the formula with values', async () => {
  const h = await server.connection.sendRequest(rpc.HoverRequest.type, { textDocument: { uri }, position: { line: 7, character: 2 } });
  const text = h.contents.value;
  assert.match(text, /\*\*F_rim\*\* = 13\.13 N \(2\.952 lbf\)/);
  assert.match(text, /force/);
  assert.match(text, /F_rim = 0\.7878 N·m \/ 60\.00 mm as N/);
  assert.deepEqual(h.range, { start: { line: 7, character: 0 }, end: { line: 7, character: 5 } });
});

test('hover: a library function shows its signature, validity and source', async () => {
  const h = await server.connection.sendRequest(rpc.HoverRequest.type, { textDocument: { uri }, position: { line: 3, character: 7 } });
  assert.match(h.contents.value, /lead\(pitch: length, starts: number = 1\): length_per_revolution/);
  assert.match(h.contents.value, /requires `pitch > 0 mm`/);
  assert.match(h.contents.value, /ISO 3408-1/);
});

test('inlay hints: computed values and the check outcome', async () => {
  const hints = await server.connection.sendRequest(rpc.InlayHintRequest.type, {
    textDocument: { uri }, range: { start: { line: 0, character: 0 }, end: { line: 20, character: 0 } },
  });
  const labels = hints.map((h) => h.label);
  assert.ok(labels.includes('→ 0.7878 N·m'), labels.join(' | '));
  assert.ok(labels.includes('→ 13.13 N'), labels.join(' | '));
  assert.ok(labels.some((l) => l.startsWith('✓ passed · 52.5 % of limit · margin 11.87 N')), labels.join(' | '));
  assert.ok(!labels.includes('→ 1.100 kN'), 'inputs are not labelled by default');
  const rim = hints.find((h) => h.label === '→ 13.13 N');
  assert.deepEqual(rim.position, { line: 7, character: 28 });
});

test('completion: units after a number, Greek from a backslash name, names filtered, values on resolve', async () => {
  const v = await server.change(uri, [{ range: { start: { line: 9, character: 0 }, end: { line: 9, character: 0 } }, text: 'd = 16 m' }]);
  await server.waitForDiagnostics(uri, (p) => p.version === v);
  const units = await server.connection.sendRequest(rpc.CompletionRequest.type, { textDocument: { uri }, position: { line: 9, character: 8 } });
  const unitLabels = units.items.map((i) => i.label);
  assert.ok(unitLabels.includes('mm') && unitLabels.includes('m'), unitLabels.slice(0, 10).join(','));
  assert.equal(units.items.find((i) => i.label === 'mm').kind, rpc.CompletionItemKind.Unit);

  const v2 = await server.change(uri, [{ range: { start: { line: 9, character: 0 }, end: { line: 9, character: 8 } }, text: 'x = \\et' }]);
  await server.waitForDiagnostics(uri, (p) => p.version === v2);
  const greek = await server.connection.sendRequest(rpc.CompletionRequest.type, { textDocument: { uri }, position: { line: 9, character: 7 } });
  const eta = greek.items.find((i) => i.label === 'η');
  assert.ok(eta, JSON.stringify(greek.items));
  assert.deepEqual(eta.textEdit.range, { start: { line: 9, character: 4 }, end: { line: 9, character: 7 } });

  const v3 = await server.change(uri, [{ range: { start: { line: 9, character: 0 }, end: { line: 9, character: 7 } }, text: 'x = F_' }]);
  await server.waitForDiagnostics(uri, (p) => p.version === v3);
  const names = await server.connection.sendRequest(rpc.CompletionRequest.type, { textDocument: { uri }, position: { line: 9, character: 6 } });
  assert.deepEqual(names.items.map((i) => i.label), ['F_rim', 'F_axial'], 'only names starting with F_, nearest above first');
  assert.equal(names.isIncomplete, false);
  const rim = names.items.find((i) => i.label === 'F_rim');
  assert.equal(rim.kind, rpc.CompletionItemKind.Variable);
  assert.equal(rim.detail, undefined, 'the value is left to completionItem/resolve');
  assert.ok(rim.data, 'an item to resolve carries data');
  // 13.13 N: the value the hover test above shows for F_rim.
  const resolved = await server.connection.sendRequest(rpc.CompletionResolveRequest.type, rim);
  assert.equal(resolved.detail, '13.13 N');
  assert.equal(resolved.label, 'F_rim');

  const v5 = await server.change(uri, [{ range: { start: { line: 9, character: 0 }, end: { line: 9, character: 6 } }, text: 'x = lea' }]);
  await server.waitForDiagnostics(uri, (p) => p.version === v5);
  const lib = await server.connection.sendRequest(rpc.CompletionRequest.type, { textDocument: { uri }, position: { line: 9, character: 7 } });
  const lead = lib.items.find((i) => i.label === 'lead');
  assert.match(lead.detail, /length_per_revolution/, 'a signature is cheap and stays in the list');
  const leadResolved = await server.connection.sendRequest(rpc.CompletionResolveRequest.type, lead);
  assert.ok(leadResolved.documentation && leadResolved.documentation.value.length > 0, JSON.stringify(leadResolved));

  const odd = await server.connection.sendRequest(rpc.CompletionResolveRequest.type, { label: 'x', data: 42 });
  assert.deepEqual(odd, { label: 'x', data: 42 }, 'unreadable data: the item comes back unchanged');

  // A library function the sheet does not import: the item also adds the use line after the last one.
  const v6 = await server.change(uri, [{ range: { start: { line: 9, character: 0 }, end: { line: 9, character: 7 } }, text: 'x = backdr' }]);
  await server.waitForDiagnostics(uri, (p) => p.version === v6);
  const more = await server.connection.sendRequest(rpc.CompletionRequest.type, { textDocument: { uri }, position: { line: 9, character: 10 } });
  const backdrive = more.items.find((i) => i.label === 'backdrive_torque');
  assert.ok(backdrive, JSON.stringify(more.items.map((i) => i.label)));
  assert.deepEqual(backdrive.additionalTextEdits, [{ range: { start: { line: 1, character: 0 }, end: { line: 1, character: 0 } }, newText: 'use ballscrews\n' }]);

  const v4 = await server.change(uri, [{ range: { start: { line: 9, character: 0 }, end: { line: 9, character: 10 } }, text: '' }]);
  await server.waitForDiagnostics(uri, (p) => p.version === v4);
});

test('rename: prepareRename, then edits at every use', async () => {
  const prepared = await server.connection.sendRequest(rpc.PrepareRenameRequest.type, { textDocument: { uri }, position: { line: 6, character: 2 } });
  assert.equal(prepared.placeholder, 'r_grip');
  const edit = await server.connection.sendRequest(rpc.RenameRequest.type, { textDocument: { uri }, position: { line: 6, character: 2 }, newName: 'r_wheel' });
  const edits = edit.changes[uri];
  assert.equal(edits.length, 2);
  assert.deepEqual(edits.map((e) => e.range.start.line).sort(), [6, 7]);
  await assert.rejects(
    server.connection.sendRequest(rpc.PrepareRenameRequest.type, { textDocument: { uri }, position: { line: 3, character: 7 } }),
    (e) => e.code === -32803 && /library/.test(e.message));
});

test('cancel: a cancelled request ends as cancelled or answers, and the server serves on', async () => {
  const source = new rpc.CancellationTokenSource();
  const pending = server.connection.sendRequest(rpc.DocumentSymbolRequest.type, { textDocument: { uri } }, source.token);
  source.cancel();
  try {
    const result = await pending;
    assert.ok(Array.isArray(result));
  } catch (e) {
    assert.equal(e.code, rpc.LSPErrorCodes.RequestCancelled);
  }
  const symbols = await server.connection.sendRequest(rpc.DocumentSymbolRequest.type, { textDocument: { uri } });
  assert.equal(symbols[0].name, 'use screws');
  assert.equal(symbols[1].name, 'Hold');
  assert.ok(symbols[1].children.some((c) => c.name === 'F_rim'));
});

test('unknown method: answered with method-not-found', async () => {
  await assert.rejects(server.connection.sendRequest('cutsheet/unknown', {}), (e) => e.code === rpc.ErrorCodes.MethodNotFound);
});
