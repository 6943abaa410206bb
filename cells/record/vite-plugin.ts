// Build plugins for the record shell: the app as ONE html file that runs from file://
// under the record's Content-Security-Policy (inline code, fonts as data: URIs).

import { resolve } from 'node:path';
import { gzipSync } from 'node:zlib';
import { build, type Plugin, type Rolldown } from 'vite';
import { APP_CSS_ID, APP_ID, APP_TYPE, EDITOR_GLOBAL, EDITOR_ID, KATEX_GLOBAL, KATEX_ID, packedElements } from '../../runtime/record/app-payload';
import { LOADER } from './loader';
import { LOADER_ID } from '../../runtime/record/seal-parts';

/** KaTeX's CSS lists woff2, woff and ttf for every font; browsers all take woff2, so the others go. */
export function katexWoff2Only(): Plugin {
  return {
    name: 'loadtrace-katex-woff2-only',
    enforce: 'pre',
    transform(code, id) {
      if (!/katex(\.min)?\.css$/.test(id.split('?')[0])) return undefined;
      return { code: code.replace(/,\s*url\([^)]*\.(?:woff|ttf)\)\s*format\(["'](?:woff|truetype)["']\)/g, ''), map: null };
    },
  };
}

/** The page starts from cells/record/entry.ts, which snapshots the page before the app runs. */
export function recordEntry(): Plugin {
  return {
    name: 'loadtrace-record-entry',
    transformIndexHtml: {
      order: 'pre',
      handler: (html) => html.replace(/(<script\b[^>]*\bsrc=["'])\/?cells\/main\.ts(["'])/, '$1/cells/record/entry.ts$2'),
    },
  };
}

/**
 * Code that must not appear raw inside an inline <script>: "</script" would end it and
 * "<!--" changes how the parser reads it. Both are only ever inside strings, regular
 * expressions or comments in built code, where these escapes mean the same.
 */
export function scriptSafe(code: string): string {
  return code.replace(/<\/(script)/gi, '<\\/$1').replace(/<!--/g, '\\x3C!--');
}

/** gzip + base64, as the record's data blocks carry code. */
function packCode(code: string): string {
  return gzipSync(Buffer.from(scriptSafe(code), 'utf8'), { level: 9 }).toString('base64');
}

/**
 * A module on its own, as a classic script that sets globalThis[name]: the source editor
 * (cells/source-editor.ts with CodeMirror), run only when a source is first edited
 * (cells/record/editor-load.ts), and KaTeX, run when the app first typesets
 * (cells/record/katex-proxy.ts); so opening a record compiles neither.
 */
async function iifeCode(root: string, entry: string, name: string): Promise<string> {
  const built = await build({
    configFile: false,
    root,
    logLevel: 'warn',
    build: {
      write: false,
      target: 'es2022',
      minify: true,
      reportCompressedSize: false,
      lib: { entry: resolve(root, entry), formats: ['iife'], name, fileName: () => 'block.js' },
    },
  });
  const outputs = (Array.isArray(built) ? built : [built]) as Rolldown.RolldownOutput[];
  const chunks = outputs.flatMap((o) => o.output).filter((f): f is Rolldown.OutputChunk => f.type === 'chunk');
  if (chunks.length !== 1) throw new Error(`the build of ${entry} gave ${chunks.length} chunks, not one`);
  return chunks[0].code;
}

/**
 * Puts the CSS inline, and the JS chunk as a gzip+base64 data block with a small
 * loader that runs it (a third of the size: the record must stay under 1.5 MB), and the
 * source editor as a second block run on first use, at the end of the body; names the
 * file record-shell.html.
 */
export function inlineAll(): Plugin {
  let root = process.cwd();
  return {
    name: 'loadtrace-inline-all',
    enforce: 'post',
    configResolved(config) {
      root = config.root;
    },
    async generateBundle(_options, bundle) {
      const html = Object.values(bundle).find((f) => f.type === 'asset' && f.fileName.endsWith('.html'));
      if (!html || html.type !== 'asset') return;
      let page = String(html.source);
      const scripts: string[] = [];
      const styles: string[] = [];
      for (const [name, file] of Object.entries(bundle)) {
        if (file.type === 'chunk') {
          const tag = new RegExp(`<script\\b[^>]*\\bsrc=["'][^"']*${escapeRe(name)}["'][^>]*></script>\\s*`);
          if (!tag.test(page)) continue;
          page = page.replace(tag, '');
          // Run as a classic script in an async function (Chromium may not run a large inline
          // module added by script under a hash-only CSP; a classic script it runs every time).
          if (/\bimport\.meta\b|^(?:import|export)\s*[{*"'`]/m.test(file.code)) this.error('the record bundle must be one chunk with no import/export');
          const classic = `(async () => {'use strict';\n${file.code}\n})().catch((e) => console.error('Loadtrace could not start:', e));`;
          scripts.push(packedElements(APP_ID, APP_TYPE, packCode(classic)));
          scripts.push(packedElements(EDITOR_ID, APP_TYPE, packCode(await iifeCode(root, 'cells/source-editor.ts', EDITOR_GLOBAL))));
          scripts.push(packedElements(KATEX_ID, APP_TYPE, packCode(await iifeCode(root, 'cells/record/katex-entry.ts', KATEX_GLOBAL))));
          scripts.push(`<script type="module" id="${LOADER_ID}">${LOADER}</script>`);
          delete bundle[name];
        } else if (name.endsWith('.css')) {
          // In an inert template at the end of the body, not in the head: the static rendering
          // does not need the app's styles (KaTeX with its fonts, ~0.4 MB) and paints without
          // the browser parsing them first; the app adds them when it starts (app-css.ts).
          const tag = new RegExp(`<link\\b[^>]*\\bhref=["'][^"']*${escapeRe(name)}["'][^>]*>\\s*`);
          page = page.replace(tag, '');
          // As several style elements (about a font each): the parser reads small tokens faster.
          for (const part of splitCss(String(file.source), CSS_PART_CHARS)) styles.push(`<style>${part.replace(/<\/(style)/gi, '<\\/$1')}</style>`);
          delete bundle[name];
        }
      }
      page = page.replace(/<link\b[^>]*rel=["']modulepreload["'][^>]*>\s*/g, '');
      const css = styles.length ? [`<template id="${APP_CSS_ID}">${styles.join('\n')}</template>`] : [];
      page = page.replace(/<\/body>/i, () => `${[...css, ...scripts].join('\n')}\n</body>`);
      delete bundle[html.fileName];
      this.emitFile({ type: 'asset', fileName: 'record-shell.html', source: page });
      // The same bytes under a name no dev server rewrites (it would inject its client into .html).
      this.emitFile({ type: 'asset', fileName: 'record-shell.txt', source: page });
    },
  };
}

/** Style elements of the app's CSS are cut at top-level rule ends once longer than this. */
const CSS_PART_CHARS = 16_384;

/**
 * CSS cut into pieces of whole top-level rules, each cut made once a piece is at least
 * `min` characters long (a single rule, e.g. a font with its data, may be longer). Strings
 * and comments are skipped, so a brace in them does not count.
 */
export function splitCss(css: string, min: number): string[] {
  const out: string[] = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i < css.length; i++) {
    const c = css[i];
    if (c === '"' || c === "'") {
      for (i++; i < css.length && css[i] !== c; i++) if (css[i] === '\\') i++;
    } else if (c === '/' && css[i + 1] === '*') {
      const end = css.indexOf('*/', i + 2);
      i = end < 0 ? css.length : end + 1;
    } else if (c === '{') depth++;
    else if (c === '}' && depth > 0 && --depth === 0 && i + 1 - start >= min) {
      out.push(css.slice(start, i + 1));
      start = i + 1;
    }
  }
  if (start < css.length) out.push(css.slice(start));
  return out;
}

function escapeRe(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
