// Pure edits of figure and sweep cells, and the one-line source a person types for a
// sweep: `h from 6 in to 12 in steps 12 plot punch_ok, phiVc`.

import type { CalcDocument, FigureCell, SweepCell } from '../document';
import { EditError, updateCell } from '../edit/index';
import { isName, NAME_PATTERN } from '../formula/tokens';

export function setFigureExpr(doc: CalcDocument, id: string, expr: string): CalcDocument {
  return updateCell<FigureCell>(doc, id, (c) => {
    if (c.kind !== 'figure') throw new EditError(`a ${c.kind} cell is not a figure`);
    return c.expr === expr ? c : { ...c, expr };
  });
}

export type SweepFields = Pick<SweepCell, 'input' | 'from' | 'to' | 'outputs'> & { steps?: number };

export function setSweep(doc: CalcDocument, id: string, fields: SweepFields): CalcDocument {
  return updateCell<SweepCell>(doc, id, (c) => {
    if (c.kind !== 'sweep') throw new EditError(`a ${c.kind} cell is not a sweep`);
    const next: SweepCell = { ...c, input: fields.input, from: fields.from, to: fields.to, outputs: fields.outputs.slice() };
    if (fields.steps === undefined) delete next.steps;
    else next.steps = fields.steps;
    return JSON.stringify(next) === JSON.stringify(c) ? c : next;
  });
}

export function sweepSource(c: Pick<SweepCell, 'input' | 'from' | 'to' | 'steps' | 'outputs'>): string {
  return `${c.input} from ${c.from} to ${c.to}${c.steps === undefined ? '' : ` steps ${c.steps}`} plot ${c.outputs.join(', ')}`;
}

const SOURCE = new RegExp(String.raw`^\s*(${NAME_PATTERN})\s+from\s+(.+?)\s+to\s+(.+?)(?:\s+steps\s+(\d+))?\s+plot\s+(.+?)\s*$`);

/** Reads the sweep source, or says what is missing (column 1-based). */
export function parseSweepSource(source: string): { ok: true; value: SweepFields } | { ok: false; message: string; column: number } {
  const m = SOURCE.exec(source);
  if (!m) {
    const missing = !/^\s*[A-Za-z_]/.test(source) ? 'start with the input to vary'
      : !/\sfrom\s/.test(source) ? 'write "from" and the first value'
      : !/\sto\s/.test(source) ? 'write "to" and the last value'
      : 'write "plot" and the results or checks to plot';
    return { ok: false, message: `${missing}, e.g. h from 6 in to 12 in steps 12 plot punch_ok, phiVc`, column: 1 };
  }
  const outputs = m[5].split(',').map((s) => s.trim()).filter(Boolean);
  const bad = outputs.find((o) => !isName(o));
  if (bad !== undefined) return { ok: false, message: `"${bad}" is not a cell name`, column: source.indexOf(bad) + 1 };
  const value: SweepFields = { input: m[1], from: m[2], to: m[3], outputs };
  if (m[4] !== undefined) value.steps = Number(m[4]);
  return { ok: true, value };
}
