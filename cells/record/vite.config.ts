// `npm run build:record`: the app shell for calc records, as one file
// (dist-record/record-shell.html). The app's own config is the base; this adds
// inlining of code, styles and woff2 fonts, and the record entry point.

import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig, mergeConfig, type ConfigEnv, type UserConfig } from 'vite';
import base from '../../vite.config';
import { inlineAll, katexWoff2Only, recordEntry } from './vite-plugin';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');

export default defineConfig((env) => {
  const given = base as UserConfig | ((e: ConfigEnv) => UserConfig);
  const app = typeof given === 'function' ? given(env) : given;
  return mergeConfig(app, {
    plugins: [katexWoff2Only(), recordEntry(), inlineAll()],
    // The source editor is not in the app bundle: the record carries it as its own block.
    // KaTeX likewise: a block of its own, run when the app first typesets.
    resolve: {
      alias: [
        { find: /^\.\/source-editor-load$/, replacement: resolve(ROOT, 'cells/record/editor-load.ts') },
        { find: /^katex$/, replacement: resolve(ROOT, 'cells/record/katex-proxy.ts') },
      ],
    },
    build: {
      outDir: 'dist-record',
      emptyOutDir: true,
      assetsInlineLimit: () => true,
      cssCodeSplit: false,
      modulePreload: false,
      reportCompressedSize: false,
      rolldownOptions: { output: { codeSplitting: false } },
    },
  } satisfies UserConfig);
});
