// The record build's `katex` (cells/record/vite.config.ts aliases it here): KaTeX
// travels in the record as its own packed block, which the loader unpacks as text
// beside the app; this runs it, as an inline script the record's CSP lists by hash,
// the first time anything is typeset. Opening a record whose screen shows no equation
// then does not compile KaTeX; the page preloads it once idle (cells/main.ts).

import type Katex from 'katex';
import { KATEX_CODE, KATEX_GLOBAL, KATEX_RUN_ID } from '../../runtime/record/app-payload';
import { runBlock } from './run-block';

type KatexApi = typeof Katex;
let real: KatexApi | undefined;

function run(): KatexApi {
  const g = globalThis as Record<string, unknown>;
  const code = g[KATEX_CODE];
  if (typeof code !== 'string') throw new Error('this record carries no typesetting code');
  const loaded = (runBlock(KATEX_RUN_ID, code, KATEX_GLOBAL) as { katex?: KatexApi } | undefined)?.katex;
  if (!loaded) throw new Error('the typesetting code in this record did not start');
  g[KATEX_CODE] = undefined; // run once; the text is no longer needed
  return loaded;
}

const katex: Pick<KatexApi, 'renderToString'> = {
  renderToString: (tex, options) => (real ??= run()).renderToString(tex, options),
};

export default katex;
