// The title-block lines at the top of a file, in the order they are written.

import { META_KEYS, type DocMeta } from '../document';

export const FORMAT_TAG = 'loadtrace';
export const FORMAT_VERSION = 1;

/** The keyword of each field in the file. */
const META_WORDS: { [K in keyof DocMeta]: string } = {
  project: 'project', job: 'job', subject: 'subject', preparedBy: 'prepared', checkedBy: 'checked', revision: 'revision', date: 'date',
};

/** Keyword in the file → field of DocMeta, in the order they are written. */
export const META_LINES: readonly (readonly [string, keyof DocMeta])[] = META_KEYS.map((k) => [META_WORDS[k], k] as const);

/** Values start in column 11: the longest keyword plus two spaces. */
export const META_KEY_WIDTH = 10;

export function metaField(word: string): keyof DocMeta | undefined {
  return META_LINES.find(([w]) => w === word)?.[1];
}
