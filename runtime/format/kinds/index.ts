// The format table. A new cell kind adds one module beside these and one line here;
// the type below fails to compile until every kind of the Cell union has an entry.

import type { Cell } from '../../document';
import type { KindFormat, KindTable } from '../types';
import { checkFormat } from './check';
import { figureFormat } from './figure';
import { formulaFormat } from './formula';
import { inputFormat } from './input';
import { noteFormat } from './note';
import { sectionFormat } from './section';
import { sweepFormat } from './sweep';

export const KIND_FORMATS: KindTable = {
  section: sectionFormat,
  note: noteFormat,
  input: inputFormat,
  formula: formulaFormat,
  check: checkFormat,
  figure: figureFormat,
  sweep: sweepFormat,
};

/** The format for a kind keyword, or undefined for a word that is no cell kind. */
export function kindFormat(word: string): KindFormat<Cell> | undefined {
  return Object.prototype.hasOwnProperty.call(KIND_FORMATS, word)
    ? (KIND_FORMATS[word as Cell['kind']] as unknown as KindFormat<Cell>)
    : undefined;
}

/** Attribute keys are padded to one width per kind, so adding a line never realigns the others. */
export function keyWidth(format: KindFormat<Cell>): number {
  return Math.max(0, ...format.attrs.map((a) => a.key.length)) + 1;
}
