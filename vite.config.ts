import { defineConfig, type Plugin } from 'vite';
import { recordShellOnDemand } from './cells/record/dev-shell-plugin';

/**
 * mathjs gives three error classes their prototype with `new RangeError()` / `new Error()`
 * while its modules load. When a debugger or test driver is attached to the page, every
 * Error made captures a detailed stack, and with all app code in one function (as in a
 * record) V8 then re-parses the whole bundle for source positions: ~0.5 s more to open.
 * `Object.create(...)` gives the same prototype chain without making an Error.
 */
function mathjsErrorPrototypes(): Plugin {
  return {
    name: 'loadtrace-mathjs-error-prototypes',
    enforce: 'pre',
    transform(code, id) {
      if (!/mathjs[\\/]lib[\\/]esm[\\/]error[\\/]\w+Error\.js$/.test(id.split('?')[0])) return undefined;
      const out = code.replace(/\.prototype = new (RangeError|Error)\(\);/g, '.prototype = Object.create($1.prototype);');
      return out === code ? undefined : { code: out, map: null };
    },
  };
}

// The app is index.html + cells/ (page) + runtime/ (engine). Templates in
// docs-templates/ are imported as text at build time.
export default defineConfig({
  root: '.',
  // npm start builds the record shell itself (on start, and again when Export finds it stale).
  plugins: [mathjsErrorPrototypes(), recordShellOnDemand()],
  build: {
    outDir: 'dist',
    target: 'es2022',
    chunkSizeWarningLimit: 2500,
  },
  // The record shell's build output is no source of the page.
  server: { open: true, watch: { ignored: ['**/dist-record/**', '**/dist/**'] } },
});
