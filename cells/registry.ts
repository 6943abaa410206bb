// Cell kind → its module, so the view and the editors dispatch on kind in one place.

import type { CalcDocument, Cell, CellKind } from '../runtime/document';
import { checkKind } from './check';
import { formulaKind } from './formula';
import { inputKind } from './input';
import type { BindContext, CellKindModule, CellViewBase } from './kind';
import { noteKind } from './note';
import { sectionKind } from './section';
import { figureKind } from './figure';
import { sweepKind } from './sweep';

type AnyKind = CellKindModule<Cell, unknown, CellViewBase>;

const KINDS: Record<CellKind, AnyKind> = {
  section: sectionKind as unknown as AnyKind,
  note: noteKind as unknown as AnyKind,
  input: inputKind as unknown as AnyKind,
  formula: formulaKind as unknown as AnyKind,
  check: checkKind as unknown as AnyKind,
  figure: figureKind as unknown as AnyKind,
  sweep: sweepKind as unknown as AnyKind,
};

export function kindOf(cell: Cell): AnyKind {
  return KINDS[cell.kind];
}

export function bindCell(cell: Cell, ctx: BindContext): CellViewBase {
  return kindOf(cell).bind(cell, ctx);
}

export function renderView(cell: Cell, view: CellViewBase): string {
  return kindOf(cell).render(view);
}

export function cellSource(cell: Cell): string {
  return kindOf(cell).serialize(cell);
}

export function editSource(doc: CalcDocument, cell: Cell, source: string): CalcDocument {
  return kindOf(cell).edit(doc, cell.id, source);
}

/**
 * Reference numbers: sections count 1, 2, 3; computing cells under a section count
 * 1.1, 1.2, ... (cells before the first section count 0.1, 0.2). Notes get none.
 */
export function numberCells(cells: readonly Cell[]): Map<string, string> {
  const out = new Map<string, string>();
  let section = 0;
  let item = 0;
  for (const cell of cells) {
    if (cell.kind === 'section') {
      section++;
      item = 0;
      out.set(cell.id, String(section));
    } else if (cell.kind === 'note') {
      out.set(cell.id, '');
    } else {
      item++;
      out.set(cell.id, `${section}.${item}`);
    }
  }
  return out;
}
