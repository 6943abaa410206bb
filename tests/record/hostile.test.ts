// Hostile records (issue 5): markup, event handlers and javascript: links in every
// text a document carries; tampered seals; cut-off files; 1 MB strings. Nothing may
// become live markup, the reader must say what is wrong, and keep what it can.

import { describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { serialize } from '../../runtime/format/index';
import { looksLikeRecord, readDocumentSource, unpack } from '../../runtime/record/index';
import { exportComputed } from '../../runtime/record/node';
import { STUB_SHELL, hostileDocument } from './fixtures';

/** Every start tag in the HTML, with its name and attribute text. */
function tags(html: string): { name: string; attrs: string }[] {
  // Data blocks and the stub shell's script are skipped: their text is not markup.
  const body = html.replace(/(<script\b[^>]*>)[\s\S]*?<\/script>/gi, '$1</script>').replace(/(<style\b[^>]*>)[\s\S]*?<\/style>/gi, '$1</style>');
  return [...body.matchAll(/<([a-zA-Z][a-zA-Z0-9-]*)([^>]*)>/g)].map((m) => ({ name: m[1].toLowerCase(), attrs: m[2] }));
}

describe('hostile text in every field', () => {
  it('becomes no markup: no scripts, handlers, javascript: links, frames, objects or images', async () => {
    const doc = hostileDocument();
    const { html, docText } = await exportComputed(doc, STUB_SHELL, '2026-12-01T00:00:00Z');
    const all = tags(html);
    // The stub shell has one script; the record adds exactly two data blocks, the seal and the document
    // (common practice: HTML §4.12.1.2 data blocks do not run).
    expect(all.filter((t) => t.name === 'script').map((t) => /type="([^"]*)"/.exec(t.attrs)?.[1])).toEqual(['application/x-loadtrace-seal', 'application/x-loadtrace', 'module']);
    expect(all.filter((t) => /\son[a-z]+\s*=/i.test(t.attrs))).toEqual([]);
    expect(all.filter((t) => /javascript:/i.test(t.attrs))).toEqual([]);
    expect(all.filter((t) => ['img', 'svg', 'iframe', 'object', 'embed', 'link', 'base', 'form'].includes(t.name))).toEqual([]);
    // The only links are the summary's, to cells of the sheet.
    expect(all.filter((t) => t.name === 'a' && !/^ href="#lt-c-[\w-]+"$/.test(t.attrs))).toEqual([]);
    // Style elements end where we end them.
    expect((html.match(/<\/style/gi) ?? []).length).toBe((html.match(/<style\b/gi) ?? []).length);
    expect((html.match(/<!--/g) ?? []).length).toBe(6); // the three pairs of record fences only
    // The text itself is all there, as text.
    const back = await unpack(html);
    expect(back.ok).toBe(true);
    expect(back.docText).toBe(docText);
    expect(back.docText).toBe(serialize(doc));
  });

  it('keeps a real https link in a note as a link, and only that', async () => {
    const doc: CalcDocument = { meta: hostileDocument().meta, cells: [{ id: 'n1', kind: 'note', text: 'See [ACI](https://www.concrete.org/) and [bad](javascript:alert(1))' }] };
    const { html } = await exportComputed(doc, STUB_SHELL);
    const links = tags(html).filter((t) => t.name === 'a' && /href=/.test(t.attrs));
    expect(links.map((t) => /href="([^"]*)"/.exec(t.attrs)?.[1])).toEqual(['https://www.concrete.org/']);
  });
});

describe('damaged records', () => {
  it('a tampered document says it was edited outside Loadtrace and still gives the text', async () => {
    const { html, docText } = await exportComputed(hostileDocument(), STUB_SHELL);
    const edited = html.replace('value="9 in"', 'x').replace(/input i1 {2}h = 9 in/, 'input i1  h = 10 in');
    expect(edited).not.toBe(html);
    const back = await unpack(edited);
    expect(back.ok).toBe(false);
    expect(back.sealOk).toBe(false);
    expect(back.problems.join(' ')).toMatch(/edited outside Loadtrace/);
    expect(back.docText).toBe(docText.replace('input i1  h = 9 in', 'input i1  h = 10 in'));
  });

  it('a changed or missing digest is reported', async () => {
    const { html, digest } = await exportComputed(hostileDocument(), STUB_SHELL);
    const wrong = await unpack(html.replace(digest, digest.replace(/^./, (c) => (c === '0' ? '1' : '0'))));
    expect(wrong.sealOk).toBe(false);
    const none = await unpack(html.replace(` data-sha256="${digest}"`, ''));
    expect(none.sealOk).toBe(false);
    expect(none.problems.join(' ')).toMatch(/no digest/);
  });

  it('a file cut anywhere never throws, always says so, and keeps the document when the cut is after it', async () => {
    const { html, docText } = await exportComputed(hostileDocument(), STUB_SHELL);
    const dataEnd = html.indexOf('</script>', html.indexOf('id="lt-doc"'));
    for (let cut = 0; cut < html.length; cut += Math.max(1, Math.floor(html.length / 400))) {
      const part = html.slice(0, cut);
      const back = await unpack(part);
      expect(back.ok).toBe(false);
      expect(back.problems.length).toBeGreaterThan(0);
      if (cut > dataEnd + 9) expect(back.docText).toBe(docText);
      else if (back.docText !== undefined) expect(docText.startsWith(back.docText.replace(/&[a-z#0-9]*$/i, '').slice(0, 50))).toBe(true);
    }
  });

  it('a file that is not a record is told apart from a text document', async () => {
    expect(looksLikeRecord('loadtrace 1\nproject x\n')).toBe(false);
    const page = await readDocumentSource('<!doctype html><html><body>hello</body></html>');
    expect(page.record).toBe(true);
    expect(page.docText).toBe('');
    expect(page.problems.join(' ')).toMatch(/holds no Loadtrace document/);
  });
});

describe('1 MB strings', () => {
  it('export and read back in bounded time, losing nothing', async () => {
    const big = 'x<y>&"'.repeat(175_000); // 1.05 MB
    const base = hostileDocument();
    const doc: CalcDocument = {
      meta: { ...base.meta, subject: big },
      cells: [
        { id: 'n1', kind: 'note', text: `$${big}$ ${big}`, label: big },
        { id: 'i1', kind: 'input', name: 'h', value: '9 in', label: big },
        { id: 'f1', kind: 'formula', name: 'd', expr: `h + ${'1 in + '.repeat(150_000)}1 in`, unit: 'in' },
        { id: 'k1', kind: 'check', expr: 'h <= 12 in', label: big },
      ],
    };
    const t0 = performance.now();
    const { html, docText } = await exportComputed(doc, STUB_SHELL);
    const back = await unpack(html);
    expect(performance.now() - t0).toBeLessThan(90_000); // a hang guard, not a speed target
    expect(back.ok).toBe(true);
    expect(back.docText).toBe(docText);
    expect(tags(html).filter((t) => t.name === 'script')).toHaveLength(3); // the seal, the document, the stub's loader
  }, 180_000);
});
