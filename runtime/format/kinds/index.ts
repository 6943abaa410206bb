// The format of each cell kind, as its description in runtime/kinds/ gives it: the
// reader and writer look a kind keyword up here.

import type { Cell } from '../../document';
import { describe, isCellKind, KIND_WORDS } from '../../kinds/index';
import type { KindFormat } from '../types';

/** The format for a kind keyword, or undefined for a word that is no cell kind. */
export function kindFormat(word: string): KindFormat<Cell> | undefined {
  return isCellKind(word) ? describe(word).format : undefined;
}

/** The kind keywords, for messages ("section, note, input, ..."). */
export function kindWords(): string {
  return `${KIND_WORDS.slice(0, -1).join(', ')} or ${KIND_WORDS[KIND_WORDS.length - 1]}`;
}

/** Attribute keys are padded to one width per kind, so adding a line never realigns the others. */
export function keyWidth(format: KindFormat<Cell>): number {
  return Math.max(0, ...format.attrs.map((a) => a.key.length)) + 1;
}
