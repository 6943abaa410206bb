// The loader in a record shell: unpacks the app code (gzip + base64, see
// runtime/record/app-payload.ts) with DecompressionStream, a web standard, and runs it
// as an inline classic script; on failure the static rendering stays in view.

import { APP_ID, PART_OF, RUN_ID } from '../../runtime/record/app-payload';

/** Runs the app; on failure leaves the static rendering in view and says why. */
export const LOADER = `
try {
  performance.mark('loadtrace:loader');
  // The block and its later parts, in page order (runtime/record/app-payload.ts).
  const packed = [document.getElementById('${APP_ID}'), ...document.querySelectorAll('script[${PART_OF}="${APP_ID}"]')]
    .map((el) => el.textContent.trim()).join('');
  // Native base64 where the browser has it; else a loop in a function (top-level code is not optimised).
  const decode = (text) => {
    const bin = atob(text);
    const out = new Uint8Array(bin.length);
    for (let i = 0; i < bin.length; i++) out[i] = bin.charCodeAt(i);
    return out;
  };
  const bytes = typeof Uint8Array.fromBase64 === 'function' ? Uint8Array.fromBase64(packed) : decode(packed);
  const code = await new Response(new Blob([bytes]).stream().pipeThrough(new DecompressionStream('gzip'))).text();
  const run = document.createElement('script');
  run.id = '${RUN_ID}';
  run.textContent = code;
  performance.mark('loadtrace:unpacked');
  document.body.append(run);
  performance.mark('loadtrace:app-started');
} catch (e) {
  const p = document.createElement('p');
  p.setAttribute('role', 'alert');
  p.textContent = 'The app in this record could not start (' + e + '); the record below is the issued, static copy.';
  document.body.prepend(p);
}
`.trim();

