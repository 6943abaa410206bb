// The templates shipped in docs-templates/, read at build time as text and parsed
// with the project's document format.

import type { CalcDocument } from '../runtime/document';
import { parse } from '../runtime/format/index';

export interface Template {
  /** File name without extension, e.g. "demo". */
  key: string;
  doc: CalcDocument;
  /** Problems the format reader found (the template still opens with what it read). */
  errors: { line: number; column: number; message: string }[];
}

const FILES = import.meta.glob('../docs-templates/*.lt', { query: '?raw', import: 'default', eager: true }) as Record<string, string>;

let cache: Template[] | undefined;

export function templates(): Template[] {
  if (!cache) {
    cache = Object.entries(FILES)
      .map(([path, text]) => {
        const key = path.replace(/^.*\//, '').replace(/\.lt$/, '');
        const { doc, errors } = parse(text);
        return { key, doc, errors };
      })
      .sort((a, b) => (a.key === 'demo' ? -1 : b.key === 'demo' ? 1 : a.key.localeCompare(b.key)));
  }
  return cache;
}

export function templateByKey(key: string): Template | undefined {
  return templates().find((t) => t.key === key);
}

/** A title for lists: subject, else project, else the file name. */
export function sheetTitle(doc: CalcDocument, fallback: string): string {
  return doc.meta.subject || doc.meta.project || fallback;
}
