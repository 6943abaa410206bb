// Export → import of calc records (runtime/record): the document comes back exactly
// and computes the same results. Packed into a stub shell here; the real single-file
// shell is exercised in tests/e2e/record.test.ts.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { resultRows } from '../../runtime/cli/report';
import type { CalcDocument } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import { parse, serialize } from '../../runtime/format/index';
import { decodeDataBlock, encodeDataBlock, sha256Hex, unpack } from '../../runtime/record/index';
import { exportComputed } from '../../runtime/record/node';
import { documents } from '../format/arbitraries';
import { computingDocuments } from './arbitraries';
import { STUB_SHELL } from './fixtures';


async function results(doc: CalcDocument) {
  const engine = createEngine(doc);
  await engine.settled();
  const rows = resultRows(doc, engine);
  engine.dispose();
  return rows;
}

describe('data block encoding', () => {
  it('gives back any string and never holds "<" or a character the HTML parser would change', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary' }), (s) => {
        const enc = encodeDataBlock(s);
        expect(decodeDataBlock(enc)).toBe(s); // lossless (issue 5: export is lossless)
        expect(enc).not.toMatch(/[<\r\0]/); // HTML §13.2.5.4 script data: "<" could end it; CR and NUL are rewritten
        expect(/[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/.test(enc)).toBe(false);
      }),
      { numRuns: 1000 },
    );
  });
});

describe('record round trip', () => {
  it('export → import gives the same document text, the same document and the same results', async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(documents, computingDocuments), async (doc) => {
        const record = await exportComputed(doc, STUB_SHELL, '2026-12-01T00:00:00Z');
        const back = await unpack(record.html);
        expect(back.problems).toEqual([]);
        expect(back.ok).toBe(true);
        expect(back.docText).toBe(serialize(doc));
        expect(back.digest).toBe(await sha256Hex(serialize(doc))); // FIPS 180-4 SHA-256 of the UTF-8 text
        const reread = parse(back.docText!);
        expect(reread.errors).toEqual([]);
        expect(reread.doc).toStrictEqual(doc);
        expect(await results(reread.doc)).toStrictEqual(await results(doc));
      }),
      { numRuns: 1000 },
    );
  }, 300_000);

  it('computes something in the generated computing documents (the property is not vacuous)', async () => {
    const docs = fc.sample(computingDocuments, { numRuns: 30, seed: 7 });
    let ok = 0;
    for (const d of docs) ok += (await results(d)).filter((r) => r.kind === 'formula' && r.status === 'ok').length;
    expect(ok).toBeGreaterThan(30);
  });
});
