// `--meta KEY=VALUE`: the title block of what the CLI writes. The keys are the text
// format's title-block keywords (runtime/format/meta.ts), with `by` for `prepared`.

import type { CalcDocument, DocMeta } from '../document';
import { META_LINES } from '../format/meta';

export interface MetaSetting {
  /** As typed, for messages. */
  key: string;
  field: keyof DocMeta;
  value: string;
}

/** Command-line key → title-block field: the format's keywords, and `by` (the preparer). */
export const META_ARG_KEYS: ReadonlyMap<string, keyof DocMeta> = new Map<string, keyof DocMeta>([
  ...META_LINES.map(([word, field]) => [word, field] as [string, keyof DocMeta]),
  ['by', 'preparedBy'],
]);

/** "project, job, subject, by (or prepared), checked, revision, date" */
export const META_KEYS_TEXT = META_LINES.map(([w]) => (w === 'prepared' ? 'by (or prepared)' : w)).join(', ');

/** Reads `KEY=VALUE`; `fail` makes the error thrown for a bad one. */
export function parseMetaSpec(spec: string, fail: (message: string) => Error): MetaSetting {
  const eq = spec.indexOf('=');
  if (eq <= 0) throw fail(`--meta ${spec}: write it as KEY=VALUE, e.g. --meta job=LT-26-301; the keys are ${META_KEYS_TEXT}`);
  const key = spec.slice(0, eq).trim();
  const field = META_ARG_KEYS.get(key.toLowerCase());
  if (!field) throw fail(`--meta ${key}: no such title-block key; the keys are ${META_KEYS_TEXT}`);
  const value = spec.slice(eq + 1).trim();
  if (/[\r\n]/.test(value)) throw fail(`--meta ${key}: a title-block field is one line`);
  return { key, field, value };
}

/** The document with the given title-block fields set (the same document when there are none). */
export function withMeta(doc: CalcDocument, settings: readonly MetaSetting[]): CalcDocument {
  if (settings.length === 0) return doc;
  const meta = { ...doc.meta };
  for (const s of settings) meta[s.field] = s.value;
  return { ...doc, meta };
}
