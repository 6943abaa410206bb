// A small sheet of our own for the review tests: floor loads, a factored load and
// a check against an invented capacity, in two sections.

import type { CalcDocument } from '../../runtime/document';
import { emptyMeta } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import type { ResultLookup } from '../../runtime/review/index';

export function sheet(): CalcDocument {
  return {
    meta: { ...emptyMeta(), project: 'Review fixture', preparedBy: 'A. Preparer', checkedBy: 'B. Checker' },
    cells: [
      { id: 's1', kind: 'section', title: 'Loads' },
      { id: 'i1', kind: 'input', name: 'D', value: '100 psf', label: 'Dead load' },
      { id: 'i2', kind: 'input', name: 'L', value: '50 psf', label: 'Live load' },
      { id: 'f1', kind: 'formula', name: 'qu', expr: '1.2 D + 1.6 L', unit: 'psf', clause: 'ASCE 7-22 §2.3.1' },
      { id: 's2', kind: 'section', title: 'Capacity' },
      { id: 'i3', kind: 'input', name: 'q_cap', value: '250 psf', label: 'Capacity (invented)' },
      { id: 'k1', kind: 'check', name: 'q_ok', expr: 'qu <= q_cap', label: 'Factored load within capacity' },
      { id: 's3', kind: 'section', title: 'Notes' },
      { id: 'n1', kind: 'note', text: 'Nothing computes here.' },
      { id: 'i4', kind: 'input', name: 'span', value: '20 ft' },
    ],
  };
}

/** Runs the engine on `doc` and hands back its results by id. */
export async function resultsOf(doc: CalcDocument): Promise<ResultLookup> {
  const engine = createEngine(doc);
  await engine.settled();
  const states = new Map(doc.cells.map((c) => [c.id, engine.state(c.id)]));
  engine.dispose();
  return (id) => states.get(id);
}
