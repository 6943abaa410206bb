// The title-block lines at the top of a file, in the order they are written.

import type { DocMeta } from '../document';

export const FORMAT_TAG = 'loadtrace';
export const FORMAT_VERSION = 1;

/** Keyword in the file → field of DocMeta. */
export const META_LINES: readonly (readonly [string, keyof DocMeta])[] = [
  ['project', 'project'],
  ['job', 'job'],
  ['subject', 'subject'],
  ['prepared', 'preparedBy'],
  ['checked', 'checkedBy'],
  ['revision', 'revision'],
  ['date', 'date'],
];

/** Values start in column 11: the longest keyword plus two spaces. */
export const META_KEY_WIDTH = 10;

export function metaField(word: string): keyof DocMeta | undefined {
  return META_LINES.find(([w]) => w === word)?.[1];
}
