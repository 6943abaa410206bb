// The app code inside a record shell: gzip-compressed and base64-encoded in a data
// block, and a small loader script that unpacks it (DecompressionStream, a web
// standard) and runs it as an inline classic script. The record's CSP lists the hash of the
// loader and of the unpacked code, so nothing else can run: no eval, no blob: URLs.

export const APP_ID = 'lt-app';
export const APP_TYPE = 'application/x-loadtrace-app';
/** The id of the script element the loader adds; the shell is recovered without it. */
export const RUN_ID = 'lt-app-run';

/** Runs the app; on failure leaves the static rendering in view and says why. */
export const LOADER = `
try {
  const bin = atob(document.getElementById('${APP_ID}').textContent.trim());
  const bytes = new Uint8Array(bin.length);
  for (let i = 0; i < bin.length; i++) bytes[i] = bin.charCodeAt(i);
  const code = await new Response(new Blob([bytes]).stream().pipeThrough(new DecompressionStream('gzip'))).text();
  const run = document.createElement('script');
  run.id = '${RUN_ID}';
  run.textContent = code;
  document.body.append(run);
} catch (e) {
  const p = document.createElement('p');
  p.setAttribute('role', 'alert');
  p.textContent = 'The app in this record could not start (' + e + '); the record below is the issued, static copy.';
  document.body.prepend(p);
}
`.trim();

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
