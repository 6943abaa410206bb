// The loader in a record shell: unpacks the app code (gzip + base64, see
// runtime/record/app-payload.ts) with DecompressionStream, a web standard, and runs it
// as an inline classic script (KaTeX is unpacked too, and run by the app when first
// needed); on failure the static rendering stays in view, with the static page's own
// "the app did not start" message.

import { APP_ID, KATEX_CODE, KATEX_ID, PART_OF, RUN_ID } from '../../runtime/record/app-payload';

/** Runs the app; on failure leaves the static rendering in view and says why. */
export const LOADER = `
try {
  performance.mark('loadtrace:loader');
  // A refresh element put into the file would send the reader elsewhere once the page
  // loads (no policy stops it): stop that before it starts; the app reports it.
  if (document.querySelector('meta[http-equiv="refresh" i]')) window.stop();
  // Native base64 where the browser has it; else a loop in a function (top-level code is not optimised).
  const decode = (text) => {
    const bin = atob(text);
    const out = new Uint8Array(bin.length);
    for (let i = 0; i < bin.length; i++) out[i] = bin.charCodeAt(i);
    return out;
  };
  // A block and its later parts, in page order (runtime/record/app-payload.ts), unpacked.
  const unpack = async (id) => {
    const first = document.getElementById(id);
    if (!first) throw new Error('no ' + id + ' block');
    const packed = [first, ...document.querySelectorAll('script[${PART_OF}="' + id + '"]')].map((el) => el.textContent.trim()).join('');
    const bytes = typeof Uint8Array.fromBase64 === 'function' ? Uint8Array.fromBase64(packed) : decode(packed);
    // Written straight into the inflater: a Blob's stream is read through the browser
    // process (~20 ms more a block in a test page, more while the page is loading).
    const inflate = new DecompressionStream('gzip');
    const writer = inflate.writable.getWriter();
    writer.write(bytes).catch(() => {});
    writer.close().catch(() => {});
    return new Response(inflate.readable).text().catch(() => { throw new Error('its packed code (' + id + ') is damaged'); });
  };
  // The static rendering's frame first: unpacking starts with ~50 ms of work that would
  // hold it back. (A frame, or 100 ms where the page draws none, e.g. a hidden tab.)
  await new Promise((done) => { requestAnimationFrame(() => setTimeout(done)); setTimeout(done, 100); });
  // KaTeX is kept as text for the app to run when it first typesets (cells/record/katex-proxy.ts).
  const [code, katex] = await Promise.all([unpack('${APP_ID}'), unpack('${KATEX_ID}').catch(() => undefined)]);
  globalThis['${KATEX_CODE}'] = katex;
  const run = document.createElement('script');
  run.id = '${RUN_ID}';
  run.textContent = code;
  performance.mark('loadtrace:unpacked');
  document.body.append(run);
  performance.mark('loadtrace:app-started');
} catch (e) {
  const p = document.createElement('p');
  p.setAttribute('role', 'alert');
  p.className = 'lt-load-failed';
  p.textContent = 'The app in this record could not start: ' + (e && e.message ? e.message : e) + '. What follows is the static copy written into the file; it has not been checked.';
  document.body.prepend(p);
}
`.trim();

