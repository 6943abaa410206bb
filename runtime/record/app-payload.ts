// The app code inside a record shell: gzip-compressed and base64-encoded in a data
// block, and a small loader script (cells/record/loader.ts) that unpacks it and runs it
// as an inline classic script. The source editor (CodeMirror) is a second block, run
// the first time a source is edited. The record's CSP lists the hash of the loader and
// of each unpacked block, so nothing else can run: no eval, no blob: URLs.

export const APP_ID = 'lt-app';
export const APP_TYPE = 'application/x-loadtrace-app';
/** The id of the script element the loader adds; the shell is recovered without it. */
export const RUN_ID = 'lt-app-run';
/** The editor's packed block, the script element that runs it, and the global it sets. */
export const EDITOR_ID = 'lt-editor';
export const EDITOR_RUN_ID = 'lt-editor-run';
export const EDITOR_GLOBAL = '__loadtraceEditor';
/**
 * KaTeX as its own block: the loader unpacks it beside the app, into the global named
 * here, and the app runs it (as the script KATEX_RUN_ID) the first time it typesets, so
 * opening a record whose screen shows no equation does not compile it.
 */
export const KATEX_ID = 'lt-katex';
export const KATEX_RUN_ID = 'lt-katex-run';
export const KATEX_CODE = '__loadtraceKatexCode';
export const KATEX_GLOBAL = '__loadtraceKatex';
/**
 * The app's styles (KaTeX's with its fonts, ~0.4 MB) sit in a template, inert: the
 * static rendering does not need them, and the browser then paints it without parsing
 * them first. The app adds a copy to the head when it starts (cells/record/app-css.ts).
 */
export const APP_CSS_ID = 'lt-app-css';
/** Every packed block a shell may carry. */
export const PACKED_IDS = [APP_ID, EDITOR_ID, KATEX_ID] as const;

/** The unpacked app code of a shell's data block (base64 of gzip). */
export async function unpackApp(base64: string): Promise<string> {
  const bin = atob(base64.trim());
  const bytes = new Uint8Array(bin.length);
  for (let i = 0; i < bin.length; i++) bytes[i] = bin.charCodeAt(i);
  // Written straight into the inflater, as the loader does (cells/record/loader.ts): a
  // Blob's stream is read through the browser process, slower on a page that is busy.
  const inflate = new DecompressionStream('gzip');
  const writer = inflate.writable.getWriter();
  writer.write(bytes).catch(() => {});
  writer.close().catch(() => {});
  return new Response(inflate.readable).text();
}

/**
 * A packed block is written as parts of at most this many characters, each its own
 * data element: Chromium's HTML parser reads many small text tokens 2–4 times faster
 * than one huge one (933 KB of base64 in a test page: ~96 ms as one element, 16–23 ms
 * in 16 KB parts).
 */
export const PART_CHARS = 16_384;
/** The attribute naming the block a later part belongs to (the first part carries the id). */
export const PART_OF = 'data-part-of';

/** The data elements for a packed block: the first with `id`, the rest marked as its parts. */
export function packedElements(id: string, type: string, data: string): string {
  const parts: string[] = [];
  for (let i = 0; i === 0 || i < data.length; i += PART_CHARS) {
    const text = data.slice(i, i + PART_CHARS);
    parts.push(i === 0
      ? `<script type="${type}" id="${id}" data-encoding="gzip base64">${text}</script>`
      : `<script type="${type}" ${PART_OF}="${id}">${text}</script>`);
  }
  return parts.join('\n');
}

/** The packed block `id` in a shell, if it has one: its first part and every later part, in order. */
export function packedBlock(html: string, id: string): string | undefined {
  const first = new RegExp(`<script\\b[^>]*\\bid=["']?${id}["']?[^>]*>([^<]*)<\\/script>`, 'i').exec(html);
  if (!first) return undefined;
  const rest = new RegExp(`<script\\b[^>]*\\b${PART_OF}=["']?${id}["']?[^>]*>([^<]*)<\\/script>`, 'gi');
  let out = first[1];
  for (const m of html.matchAll(rest)) out += m[1];
  return out;
}

/** The packed app code in a shell, if it has one. */
export function appBlock(html: string): string | undefined {
  return packedBlock(html, APP_ID);
}

/** The page as a browser serialised it, less the script elements the loaders added. */
export function withoutRunScript(html: string): string {
  let out = html;
  for (const id of [RUN_ID, EDITOR_RUN_ID, KATEX_RUN_ID]) {
    const start = out.search(new RegExp(`<script\\b[^>]*\\bid=["']?${id}["']?[^>]*>`, 'i'));
    if (start < 0) continue;
    const end = out.toLowerCase().indexOf('</script>', start);
    out = end < 0 ? out.slice(0, start) : out.slice(0, start) + out.slice(end + '</script>'.length);
  }
  return out;
}
