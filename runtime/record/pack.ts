// One self-contained .html record: the app shell (its code, styles and fonts inline)
// with the record's parts fenced in: a strict Content-Security-Policy, the document
// as embedded data with its SHA-256, the print styles, and the static rendering.

import type { DocMeta } from '../document';
import { APP_ID, PACKED_IDS, packedBlock, unpackApp } from './app-payload';
import { encodeDataBlock, escapeHtml } from './escape';
import { DOC_ID, DOC_TYPE, FENCES, RECORD_VERSION, recordCsp, runnableScripts, shellOf } from './layout';
import { sha256Base64, sha256Hex } from './seal';
import { STATIC_CSS, pageCss } from './static-css';

export interface PackInput {
  /** The single-file app, or a record to take the app from (its record parts are replaced). */
  shell: string;
  /** The document in the Loadtrace text format, exactly as it will be read back. */
  docText: string;
  /** The static rendering (staticHtml), one element. */
  staticHtml: string;
  meta: DocMeta;
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

export async function pack(input: PackInput): Promise<string> {
  const shell = shellOf(input.shell);
  if (/<script\b[^>]*\bsrc\s*=/i.test(shell)) throw new PackError('the app shell loads a script from a file; a record needs every script inline');
  const code = runnableScripts(shell).map((s) => s.code);
  for (const id of PACKED_IDS) {
    const packed = packedBlock(shell, id);
    if (packed === undefined) continue;
    try {
      code.push(await unpackApp(packed));
    } catch (e) {
      throw new PackError(`the ${id === APP_ID ? 'app' : 'editor'} code in the shell cannot be unpacked (${(e as Error).message})`);
    }
  }
  const hashes = await Promise.all(code.map((c) => sha256Base64(c)));
  const digest = input.digest ?? (await sha256Hex(input.docText));
  const head = `${FENCES.head[0]}<meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="${escapeHtml(recordCsp([...new Set(hashes)]))}">
<meta name="referrer" content="no-referrer">
<meta http-equiv="x-dns-prefetch-control" content="off">
<meta name="loadtrace-record" content="${RECORD_VERSION}">
<title>${escapeHtml(recordTitle(input.meta))}</title>
<script type="${DOC_TYPE}" id="${DOC_ID}" data-sha256="${digest}">${encodeDataBlock(input.docText)}</script>
${FENCES.head[1]}`;
  const style = `${FENCES.style[0]}<style id="lt-static-style">${STATIC_CSS}\n${pageCss(input.meta)}</style>${FENCES.style[1]}`;
  const body = `${FENCES.body[0]}${input.staticHtml}${FENCES.body[1]}`;
  let out = insertAt(shell, '<head\\b[^>]*>', head, true, '<head>');
  out = insertAt(out, '<\\/head\\s*>', style, false, '</head>');
  return insertAt(out, '<body\\b[^>]*>', body, true, '<body>');
}
