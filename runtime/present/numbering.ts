// Reference numbers: sections count 1, 2, 3; the cells under a section count 1.1, 1.2,
// ... (cells before the first section 0.1, 0.2); kinds numbered 'none' (notes) get ''.
// Each kind says which it is (its description's `numbering`).

import type { Cell } from '../document';
import { describe } from '../kinds/index';

export function numberCells(cells: readonly Cell[]): Map<string, string> {
  const out = new Map<string, string>();
  let section = 0;
  let item = 0;
  for (const cell of cells) {
    const numbering = describe(cell.kind).numbering;
    if (numbering === 'section') {
      section++;
      item = 0;
      out.set(cell.id, String(section));
    } else if (numbering === 'none') out.set(cell.id, '');
    else out.set(cell.id, `${section}.${++item}`);
  }
  return out;
}
