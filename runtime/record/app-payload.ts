// The app code inside a record shell: gzip-compressed and base64-encoded in a data
// block, and a small loader script (cells/record/loader.ts) that unpacks it and runs it
// as an inline classic script. The record's CSP lists the hash of the loader and of the
// unpacked code, so nothing else can run: no eval, no blob: URLs.

export const APP_ID = 'lt-app';
export const APP_TYPE = 'application/x-loadtrace-app';
/** The id of the script element the loader adds; the shell is recovered without it. */
export const RUN_ID = 'lt-app-run';

/** The unpacked app code of a shell's data block (base64 of gzip). */
export async function unpackApp(base64: string): Promise<string> {
  const bin = atob(base64.trim());
  const bytes = new Uint8Array(bin.length);
  for (let i = 0; i < bin.length; i++) bytes[i] = bin.charCodeAt(i);
  const stream = new Blob([bytes]).stream().pipeThrough(new DecompressionStream('gzip'));
  return new Response(stream).text();
}

/** The packed app code in a shell, if it has one. */
export function appBlock(html: string): string | undefined {
  const m = new RegExp(`<script\\b[^>]*\\bid=["']?${APP_ID}["']?[^>]*>([^<]*)<\\/script>`, 'i').exec(html);
  return m?.[1];
}

/** The page as a browser serialised it, less the script element the loader added. */
export function withoutRunScript(html: string): string {
  const start = html.search(new RegExp(`<script\\b[^>]*\\bid=["']?${RUN_ID}["']?[^>]*>`, 'i'));
  if (start < 0) return html;
  const end = html.toLowerCase().indexOf('</script>', start);
  return end < 0 ? html.slice(0, start) : html.slice(0, start) + html.slice(end + '</script>'.length);
}
