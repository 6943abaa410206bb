// The cell kinds, one description each (types.ts says what a description holds). A new
// kind adds its cell type to the Cell union (runtime/document.ts), its description
// module beside these and one line here: until then the table below does not compile.

import type { CellKind } from '../document';
import { check } from './check';
import { figure } from './figure';
import { formula } from './formula';
import { input } from './input';
import { note } from './note';
import { section } from './section';
import { sweep } from './sweep';
import { table } from './table';
import { run } from './run';
import type { KindDescription, KindTable } from './types';

export const KINDS: KindTable = { section, note, input, formula, check, figure, sweep, table, run };

/** Every kind's word, in the table's order. */
export const KIND_WORDS = Object.keys(KINDS) as readonly CellKind[];

/** The description of a kind. */
export function describe<K extends CellKind>(kind: K): KindDescription<K> {
  return KINDS[kind];
}

/** Is `word` the word of a cell kind? */
export function isCellKind(word: string): word is CellKind {
  return Object.prototype.hasOwnProperty.call(KINDS, word);
}

export type { CellOf, KindDescription, LiveView, ParsedSource, SourceProblem, CellFields, AnyFieldKey, FieldSpec } from './types';
