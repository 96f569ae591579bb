'use strict';
// Negotiated UTF-8 positions: Greek letters and '·' take two bytes, so columns differ from UTF-16.
const { test } = require('node:test');
const assert = require('node:assert/strict');
const { start, rpc } = require('./harness');

test('utf-8 positions are negotiated and used for diagnostics and hints', async () => {
  const server = await start({ capabilities: { general: { positionEncodings: ['utf-8', 'utf-16'] }, textDocument: { inlayHint: {} } } });
  try {
    assert.equal(server.init.capabilities.positionEncoding, 'utf-8');
    // 'λ' and 'η' are 2 bytes in UTF-8; '·' too.
    const uri = await server.open('greek.cutsheet', 'λη = 2 N·m + 3 kg\nτ = 1 N·m\n');
    const d = await server.waitForDiagnostics(uri, (p) => p.diagnostics.length > 0);
    const err = d.diagnostics[0];
    assert.equal(err.code, 'CUT2101');
    // '+' is UTF-16 column 11, UTF-8 byte 14 ('λ', 'η', '·' add one byte each).
    assert.equal(err.range.start.character, 14);
    const hints = await server.connection.sendRequest(rpc.InlayHintRequest.type, {
      textDocument: { uri }, range: { start: { line: 0, character: 0 }, end: { line: 3, character: 0 } },
    });
    assert.deepEqual(hints, []);
    const hover = await server.connection.sendRequest(rpc.HoverRequest.type, { textDocument: { uri }, position: { line: 1, character: 1 } });
    assert.match(hover.contents.value, /τ/);
  } finally {
    assert.equal(await server.stop(), 0);
  }
});
