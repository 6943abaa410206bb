// Where the record's own parts sit inside the app shell. Each part is fenced by HTML
// comments, which survive a browser's re-serialisation of the page, so the shell can
// be recovered from a record (for exporting again) by cutting the fences out.
// Nothing inside a fence can contain "<!--": all document text in it is escaped.

/** 2: the whole file is sealed (verify.ts); 1: only the embedded document was. */
export const RECORD_VERSION = '2';
/** The element id and type of the embedded document. */
export const DOC_ID = 'lt-doc';
export const DOC_TYPE = 'application/x-loadtrace';
export const STATIC_ID = 'lt-static';

export const FENCES = {
  head: ['<!--lt-record:head-->', '<!--/lt-record:head-->'],
  style: ['<!--lt-record:style-->', '<!--/lt-record:style-->'],
  body: ['<!--lt-record:body-->', '<!--/lt-record:body-->'],
} as const;

/** The Content-Security-Policy of every record: no request of any kind leaves the file. */
export function recordCsp(scriptHashes: string[]): string {
  const scripts = scriptHashes.length ? scriptHashes.map((h) => `'sha256-${h}'`).join(' ') : "'none'";
  return [
    "default-src 'none'",
    `script-src ${scripts}`,
    "style-src 'unsafe-inline'", // KaTeX sets heights in style attributes
    'font-src data:',
    'img-src data:',
    "connect-src 'none'",
    "form-action 'none'",
    "base-uri 'none'",
    "object-src 'none'",
    "frame-src 'none'",
    "worker-src 'none'",
    "manifest-src 'none'",
    "media-src 'none'",
  ].join('; ');
}

/** The policy at the very top of a record's head, just before its head fence. */
const POLICY_BEFORE_FENCE = new RegExp(`<meta http-equiv="Content-Security-Policy" content="[^"]*">(?=${FENCES.head[0]})`, 'i');

/** The app shell inside a record (or a shell as it is): every fenced record part cut out. */
export function shellOf(html: string): string {
  let out = html.replace(POLICY_BEFORE_FENCE, '');
  for (const [open, close] of Object.values(FENCES)) {
    for (;;) {
      const a = out.indexOf(open);
      if (a < 0) break;
      const b = out.indexOf(close, a);
      out = b < 0 ? out.slice(0, a) : out.slice(0, a) + out.slice(b + close.length);
    }
  }
  return out;
}

/** Inline scripts the browser would run: no src, and a JavaScript type (or none). Read from Loadtrace's own shell. */
export function runnableScripts(html: string): { attrs: string; code: string }[] {
  const out: { attrs: string; code: string }[] = [];
  const re = /<script\b([^>]*)>([\s\S]*?)<\/script\s*>/gi;
  for (let m = re.exec(html); m; m = re.exec(html)) {
    const attrs = m[1];
    const type = /\btype\s*=\s*["']?([^"'\s>]+)/i.exec(attrs)?.[1]?.toLowerCase();
    if (type && type !== 'module' && type !== 'text/javascript' && type !== 'application/javascript') continue;
    out.push({ attrs, code: m[2] });
  }
  return out;
}
