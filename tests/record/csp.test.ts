// The record's Content-Security-Policy lets exactly the shell's own code run: the loader,
// the packed app, the packed source editor (run on first edit) and KaTeX (run when the
// app first typesets), each by its SHA-256.
// Hash sources: CSP Level 3 §2.3.1 (common practice: base64 of the SHA-256 of the script text).

import { createHash } from 'node:crypto';
import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { APP_ID, APP_TYPE, EDITOR_ID, KATEX_ID } from '../../runtime/record/app-payload';
import { pack, PackError } from '../../runtime/record/index';
import { parseWithParse5 } from '../../runtime/record/node';
import { DIGEST_PLACEHOLDER } from '../../runtime/record/record-lines';

const LOADER = 'document.getElementById("lt-app");';
const APP = 'globalThis.appRan = true;';
const EDITOR = 'var __loadtraceEditor = { SourceEditor: class {} };';
const packed = (code: string) => gzipSync(Buffer.from(code)).toString('base64');
const block = (id: string, data: string) => `<script type="${APP_TYPE}" id="${id}" data-encoding="gzip base64">${data}</script>`;
const KATEX = 'var __loadtraceKatex = { katex: { renderToString: () => "" } };';
const shell = (editor: string | undefined, katex?: string) => `<!doctype html><html><head><title>s</title></head><body><p>app</p>${block(APP_ID, packed(APP))}${
  editor === undefined ? '' : block(EDITOR_ID, editor)}${katex === undefined ? '' : block(KATEX_ID, katex)}<script type="module" id="lt-loader">${LOADER}</script></body></html>`;
const hash = (code: string) => `'sha256-${createHash('sha256').update(code).digest('base64')}'`;
const meta = { project: 'p', job: 'j', subject: 's', preparedBy: '', checkedBy: '', revision: '', date: '' };
/** What every pack call needs besides the shell: a document, a static rendering with the digest's place, the state. */
const rest = {
  docText: 'loadtrace 1\n', meta, state: { kind: 'draft' as const }, written: '2026-12-01T00:00:00Z', parseHtml: parseWithParse5,
  staticHtml: `<div id="lt-static"><code id="lt-record-digest">${DIGEST_PLACEHOLDER}</code></div>`,
};

async function scriptSrc(html: string): Promise<string[]> {
  const csp = /<meta http-equiv="Content-Security-Policy" content="([^"]*)"/.exec(html)![1].replace(/&#39;/g, "'");
  return /script-src ([^;]*)/.exec(csp)![1].trim().split(/\s+/).sort();
}

describe('the record CSP and the packed source editor', () => {
  it('lists the loader, the app and the editor by hash, and nothing else', async () => {
    const html = await pack({ shell: shell(packed(EDITOR)), ...rest });
    expect(await scriptSrc(html)).toEqual([hash(LOADER), hash(APP), hash(EDITOR)].sort());
  });

  it('lists the KaTeX block by hash too, when the shell carries one', async () => {
    const html = await pack({ shell: shell(packed(EDITOR), packed(KATEX)), ...rest });
    expect(await scriptSrc(html)).toEqual([hash(LOADER), hash(APP), hash(EDITOR), hash(KATEX)].sort());
  });

  it('a shell without an editor block still packs (the editor then opens as plain text)', async () => {
    const html = await pack({ shell: shell(undefined), ...rest });
    expect(await scriptSrc(html)).toEqual([hash(LOADER), hash(APP)].sort());
  });

  it('an editor block that cannot be unpacked is refused, by name', async () => {
    await expect(pack({ shell: shell('not-gzip'), ...rest }))
      .rejects.toThrow(PackError);
    await expect(pack({ shell: shell('not-gzip'), ...rest }))
      .rejects.toThrow(/editor code/);
  });
});
