// One self-contained .html record: the app shell (its code, styles and fonts inline)
// with the record's parts fenced in: a strict Content-Security-Policy as the head's
// first element, the document as embedded data with its SHA-256, the seal (a manifest
// of the SHA-256 of every part of the file, verify.ts), the print styles, and the
// static rendering, which shows the record's digest.

import type { DocMeta } from '../document';
import type { RecordState } from '../review/state';
import { APP_ID, PACKED_IDS, packedBlock, unpackApp } from './app-payload';
import { encodeDataBlock, escapeHtml } from './escape';
import { DOC_ID, DOC_TYPE, FENCES, RECORD_VERSION, recordCsp, runnableScripts, shellOf } from './layout';
import { pageParts, type HtmlParse } from './parsed';
import { DIGEST_PLACEHOLDER, RECORD_LINES_CSS } from './record-lines';
import { sha256Base64, sha256Hex } from './seal';
import { DIGEST_ID, LOADER_ID, SEAL_ID, SEAL_TYPE } from './seal-parts';
import { STATIC_CSS, pageCss } from './static-css';
import { SEAL_VERSION, manifestText, partDigests } from './verify';

export interface PackInput {
  /** The single-file app, or a record to take the app from (its record parts are replaced). */
  shell: string;
  /** The document in the Loadtrace text format, exactly as it will be read back. */
  docText: string;
  /** The static rendering (staticHtml), one element, showing DIGEST_PLACEHOLDER as the record's digest. */
  staticHtml: string;
  meta: DocMeta;
  /** What the record is, written into its seal. */
  state: RecordState;
  /** When it was written (ISO text). */
  written: string;
  /** An HTML parser (parse5 in Node, the browser's in the app): the seal lists the digests of the parsed parts. */
  parseHtml: HtmlParse;
  /** Digest of docText, when the caller has it already (it is computed otherwise). */
  digest?: string;
}

export class PackError extends Error {
  override name = 'PackError';
}

/** A browser-tab title for the record, e.g. "LT-26-101 · Interior column — calc record". */
export function recordTitle(meta: DocMeta): string {
  const head = [meta.job, meta.subject || meta.project].filter((s) => s.trim() !== '').join(' · ');
  return `${head.slice(0, 200) || 'Untitled'} — calc record`;
}

/** The first `tag` outside script and style contents and comments (a bundle may hold "</head>" in a string). */
function findTag(html: string, tag: string): { index: number; length: number } | undefined {
  const re = new RegExp(`<script\\b[^>]*>[\\s\\S]*?<\\/script\\s*>|<style\\b[^>]*>[\\s\\S]*?<\\/style\\s*>|<!--[\\s\\S]*?-->|(${tag})`, 'gi');
  for (let m = re.exec(html); m; m = re.exec(html)) if (m[1]) return { index: m.index, length: m[0].length };
  return undefined;
}

function insertAt(html: string, tag: string, what: string, after: boolean, name: string): string {
  const m = findTag(html, tag);
  if (!m) throw new PackError(`the app shell has no ${name} tag`);
  const at = after ? m.index + m.length : m.index;
  return html.slice(0, at) + what + html.slice(at);
}

/** The code the record's policy lets run: the loader and each packed block, unpacked. */
async function shellCode(shell: string): Promise<string[]> {
  if (/<script\b[^>]*\bsrc\s*=/i.test(shell)) throw new PackError('the app shell loads a script from a file; a record needs every script inline');
  const runnable = runnableScripts(shell);
  // Only the loader: any other inline script would be listed in the policy and run.
  if (runnable.length !== 1 || !new RegExp(`\\bid="${LOADER_ID}"`).test(runnable[0].attrs)) {
    throw new PackError(`the app shell must hold exactly one script that runs, its loader (id ${LOADER_ID}); it holds ${runnable.length}`);
  }
  const code = [runnable[0].code];
  for (const id of PACKED_IDS) {
    const packed = packedBlock(shell, id);
    if (packed === undefined) continue;
    try {
      code.push(await unpackApp(packed));
    } catch (e) {
      throw new PackError(`the ${id === APP_ID ? 'app' : id.replace(/^lt-/, '')} code in the shell cannot be unpacked (${(e as Error).message})`);
    }
  }
  return code;
}

/** Writes `text` in place of the only `placeholder` after `open`; the packer's own marks, so exactly one must exist. */
function fill(html: string, open: string, placeholder: string, text: string): string {
  const at = html.indexOf(open + placeholder);
  if (at < 0 || html.indexOf(open + placeholder, at + 1) >= 0) throw new PackError(`the record has no single place for ${open}`);
  const start = at + open.length;
  return html.slice(0, start) + text + html.slice(start + placeholder.length);
}

export async function pack(input: PackInput): Promise<string> {
  const shell = shellOf(input.shell);
  const code = await shellCode(shell);
  const hashes = await Promise.all(code.map((c) => sha256Base64(c)));
  const digest = input.digest ?? (await sha256Hex(input.docText));
  // The policy first: nothing before it in the head runs outside it. Its value escapes
  // only & and " (the quotes in it need none), so the charset below stays in the first 1024 bytes.
  const policy = recordCsp([...new Set(hashes)]).replace(/&/g, '&amp;').replace(/"/g, '&quot;');
  const sealOpen = `<script type="${SEAL_TYPE}" id="${SEAL_ID}">`;
  const head = `<meta http-equiv="Content-Security-Policy" content="${policy}">${FENCES.head[0]}<meta charset="utf-8">
<meta name="referrer" content="no-referrer">
<meta http-equiv="x-dns-prefetch-control" content="off">
<meta name="loadtrace-record" content="${RECORD_VERSION}">
<title>${escapeHtml(recordTitle(input.meta))}</title>
${sealOpen}{}</script>
<script type="${DOC_TYPE}" id="${DOC_ID}" data-sha256="${digest}">${encodeDataBlock(input.docText)}</script>
${FENCES.head[1]}`;
  const style = `${FENCES.style[0]}<style id="lt-static-style">${STATIC_CSS}\n${RECORD_LINES_CSS}\n${pageCss(input.meta)}</style>${FENCES.style[1]}`;
  const body = `${FENCES.body[0]}${input.staticHtml}${FENCES.body[1]}`;
  let out = insertAt(shell, '<head\\b[^>]*>', head, true, '<head>');
  out = insertAt(out, '<\\/head\\s*>', style, false, '</head>');
  out = insertAt(out, '<body\\b[^>]*>', body, true, '<body>');
  // The seal: the digest of every part as a browser parses it. The seal itself and the
  // digest shown are left out of the parts (seal-parts.ts), so they can be written after.
  const sha256 = await partDigests(pageParts(input.parseHtml(out)));
  const manifest = manifestText({ seal: `loadtrace-record ${SEAL_VERSION}`, written: input.written, state: input.state, sha256 });
  out = fill(out, sealOpen, '{}', manifest);
  return fill(out, `<code id="${DIGEST_ID}">`, DIGEST_PLACEHOLDER, await sha256Hex(manifest));
}
