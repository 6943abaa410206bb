// The record's seal covers every byte a reader sees or that runs (issue 14): each part
// of the file (policy, document, static rendering and its styles, the page around it,
// the app's styles, the packed app, editor and KaTeX, the loader) has its SHA-256 in a
// manifest whose own SHA-256 the static page shows. Read here as the CLI reads it, with
// parse5 (a WHATWG HTML parser). SHA-256: FIPS 180-4 (WebCrypto's, common practice).

import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { parse } from '../../runtime/format/index';
import { exportComputed, verifyRecordFile } from '../../runtime/record/node';
import { PARTS, partLabel, type PartName } from '../../runtime/record/seal-parts';
import { OLDER_RECORD } from '../../runtime/record/verify';
import { hostileDocument, partsShell } from './fixtures';

const shell = partsShell((code) => gzipSync(Buffer.from(code)).toString('base64'));
const doc = parse(`loadtrace 1
project   Seal fixture (invented)
subject   Footing check

section s1  Loads

input i1  P = 100 kip
  label  Service load

input i2  q_allow = 4 ksf
  label  Allowable soil pressure (invented)

formula f1  A_req = P / q_allow
  unit  ft^2
  label  Required footing area

check k1  A_req <= 36 ft^2
  label  Footing area within a 6 ft square
`).doc;

const record = exportComputed(doc, shell, '2026-12-01T00:00:00Z').then((r) => r.html);

/** The file with one character at `at` changed to another of its kind. */
function flip(html: string, at: number): string {
  const c = html[at];
  const to = /[0-9]/.test(c) ? String((Number(c) + 1) % 10) : /[a-z]/.test(c) ? (c === 'z' ? 'a' : String.fromCharCode(c.charCodeAt(0) + 1)) : c === 'A' ? 'B' : 'A';
  return html.slice(0, at) + to + html.slice(at + 1);
}

/** A place inside each part of the record written from `partsShell`. */
function inside(html: string, part: PartName): number {
  const after = (mark: string, skip = 0, from = 0) => {
    const i = html.indexOf(mark, from);
    if (i < 0) throw new Error(`no ${mark}`);
    return i + mark.length + skip;
  };
  switch (part) {
    case 'csp': return after('default-src', 2);
    case 'document': return after('id="lt-doc"', 90);
    case 'static-style': return after('<style id="lt-static-style">', 40);
    case 'static': return after('Required footing area', -5, html.indexOf('<div id="lt-static"'));
    case 'page': return after('class="brand">', 2);
    case 'app-css': return after('.toolbar{display:', 1);
    case 'app': return after('id="lt-app" data-encoding="gzip base64">', 20);
    case 'editor': return after('id="lt-editor" data-encoding="gzip base64">', 20);
    case 'katex': return after('id="lt-katex" data-encoding="gzip base64">', 20);
    case 'loader': return after('document.getElementById("lt-', 1);
  }
}

describe('a record as written', () => {
  it('verifies: every part as written, the digest shown is the seal\'s', async () => {
    const html = await record;
    const check = await verifyRecordFile(html);
    expect(check.problems).toEqual([]);
    expect(check.verified).toBe(true);
    expect(check.parts.map((p) => p.part)).toEqual(PARTS.map(([p]) => p));
    expect(check.recordDigest).toMatch(/^[0-9a-f]{64}$/);
    expect(html).toContain(`<code id="lt-record-digest">${check.recordDigest}</code>`);
    expect(check.manifest!.state).toEqual({ kind: 'draft' });
  });

  it('has its policy as the head\'s first element, and declares its charset within the first 1024 bytes (HTML §4.2.5.4)', async () => {
    const html = await record;
    expect(html).toMatch(/^<!doctype html>\s*<html lang="en">\s*<head><meta http-equiv="Content-Security-Policy" content="/);
    expect(html.indexOf('<meta charset="utf-8">')).toBeGreaterThan(0);
    expect(html.indexOf('<meta charset="utf-8">') + '<meta charset="utf-8">'.length).toBeLessThanOrEqual(1024);
  });

  it('the static page never says it is verified: it shows the digest and says how to check it', async () => {
    const html = await record;
    const page = html.slice(html.indexOf('<div id="lt-static"'), html.indexOf('<!--/lt-record:body-->'));
    expect(page).toContain('Not verified:</strong> this page cannot check itself');
    expect(page).toContain('npm run calc -- FILE --verify');
    expect(page).toContain('it is not a signature');
    expect(page).not.toMatch(/>\s*Verified|seal intact|issued calc record/i);
    // Plain HTML that needs no script says when the app did not start.
    expect(page).toContain('<p class="lt-noapp" id="lt-noapp" role="alert">If this message stays, the live Loadtrace app did not start');
  });

  it('a record of a document with hostile text in every field verifies too (nothing in the seal can end it)', async () => {
    const { html } = await exportComputed(hostileDocument(), shell, '2026-12-01T00:00:00Z');
    expect((await verifyRecordFile(html)).problems).toEqual([]);
  });
});

describe('an edit anywhere is caught, and the first part that differs is named', () => {
  it.each(PARTS.map(([p]) => p))('one character changed in %s', async (part) => {
    const html = await record;
    const check = await verifyRecordFile(flip(html, inside(html, part)));
    expect(check.verified).toBe(false);
    expect(check.parts.filter((p) => !p.ok).map((p) => p.part)).toEqual([part]);
    expect(check.problems[0]).toBe(`The file was altered in ${partLabel(part)}: it is not as Loadtrace wrote it.`);
  });

  it('the seal, or the digest the page shows, changed', async () => {
    const html = await record;
    const sealed = html.indexOf('"sha256":{"csp":"') + 20;
    const a = await verifyRecordFile(flip(html, sealed));
    expect(a.verified).toBe(false);
    expect(a.problems).toContain('The record digest shown in the page is not the digest of the record\'s seal: the seal or the page was altered.');
    const shown = html.indexOf('<code id="lt-record-digest">') + 40;
    const b = await verifyRecordFile(flip(html, shown));
    expect(b.problems).toEqual(['The record digest shown in the page is not the digest of the record\'s seal: the seal or the page was altered.']);
  });
});

describe('what a record never holds is reported as tampering', () => {
  const head = '<head><meta http-equiv="Content-Security-Policy"';
  it.each([
    ['a script before the policy', '<head><script>document.title = "x"</script><meta http-equiv="Content-Security-Policy"', /<script> element was placed before the Content-Security-Policy/],
    ['a comment before the policy', '<head><!-- x --><meta http-equiv="Content-Security-Policy"', /comment was placed before the Content-Security-Policy/],
    ['a script before <html>', '<script>1</script><html lang="en">\n<head><meta http-equiv="Content-Security-Policy"', /<script> element was placed before the Content-Security-Policy/],
    ['a refresh', `${head.replace('<head>', '<head><meta http-equiv="Content-Security-Policy" content="default-src \'none\'"><meta http-equiv="refresh" content="0; url=https://example.invalid/">')}`, /refresh element/],
  ])('%s', async (_what, replacement, message) => {
    const html = await record;
    const edited = _what === 'a script before <html>'
      ? html.replace(`<html lang="en">\n${head}`, replacement)
      : html.replace(head, replacement);
    expect(edited).not.toBe(html);
    const check = await verifyRecordFile(edited);
    expect(check.verified).toBe(false);
    expect(check.tampering.join(' ')).toMatch(message);
    expect(check.problems[0]).toMatch(message);
  });

  it('a base element and a second policy anywhere in the page', async () => {
    const html = await record;
    const check = await verifyRecordFile(html.replace('<main class="paper">', '<base href="https://example.invalid/"><meta http-equiv="content-security-policy" content="script-src *"><main class="paper">'));
    expect(check.tampering).toEqual([
      'The page holds a base element: it would send the page\'s links elsewhere.',
      'The page holds a second Content-Security-Policy.',
    ]);
  });
});

describe('a record written before whole files were sealed', () => {
  it('is said to be so and is never called verified', async () => {
    const html = (await record).replace(/<script type="application\/x-loadtrace-seal" id="lt-seal">[^<]*<\/script>/, '');
    const check = await verifyRecordFile(html);
    expect(check.version).toBe(1);
    expect(check.verified).toBe(false);
    expect(check.problems).toEqual([OLDER_RECORD]);
  });
});
