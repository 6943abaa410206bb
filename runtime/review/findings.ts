// What a checker should know before signing: the NOT OK checks, the cells in error and
// the open comments within what the sign-off covers, and a fingerprint of the inputs
// and results as the checker saw them, so the sign-off names exactly the state it covers.

import { cellName, type CalcDocument, type Cell } from '../document';
import { canonical, fingerprint, sectionCells, upstreamCells } from './fingerprint';
import type { ResultLookup } from './revision';
import type { SignOffException } from './types';

/** The cells a sign-off of `scope` covers: the whole sheet, or one section's cells; undefined for no such section. */
export function scopeCells(doc: CalcDocument, scope: 'document' | string): Cell[] | undefined {
  return scope === 'document' ? doc.cells : sectionCells(doc, scope);
}

const shortText = (cell: Cell): string => {
  const name = cellName(cell);
  const label = cell.label?.trim();
  const words = [name, label].filter((s): s is string => !!s).join(': ');
  return (words || cell.id).slice(0, 120);
};

/** NOT OK checks, cells in error and open comments within the scope, in sheet order. */
export function signoffFindings(doc: CalcDocument, results: ResultLookup, scope: 'document' | string): SignOffException[] {
  const cells = scopeCells(doc, scope) ?? [];
  const out: SignOffException[] = [];
  for (const c of cells) {
    const s = results(c.id);
    if (c.kind === 'check' && s?.status === 'fail') out.push({ kind: 'not-ok', id: c.id, text: shortText(c) });
  }
  for (const c of cells) {
    if (results(c.id)?.status === 'error') out.push({ kind: 'error', id: c.id, text: shortText(c) });
  }
  const inside = new Set(cells.map((c) => c.id));
  for (const cm of doc.review?.comments ?? []) {
    if (cm.status !== 'open' || (scope !== 'document' && !inside.has(cm.cellId))) continue;
    out.push({ kind: 'open-comment', id: cm.id, text: `on ${cm.cellId}: ${cm.text.replace(/\s+/g, ' ').slice(0, 100)}` });
  }
  return out;
}

/**
 * Fingerprint of the inputs and results a sign-off saw: each covered cell's value as
 * typed (inputs) or status, shown text and ratio (formulas, checks), and those of the
 * cells it reads from elsewhere. Undefined for a section that does not exist.
 */
export function seenFingerprint(doc: CalcDocument, results: ResultLookup, scope: 'document' | string): string | undefined {
  const own = scopeCells(doc, scope);
  if (!own) return undefined;
  const cells = scope === 'document' ? own : [...own, ...upstreamCells(doc, own)];
  const seen = cells.map((c) => {
    if (c.kind === 'input') return [c.id, c.value];
    const s = results(c.id);
    if (!s) return [c.id];
    return [c.id, s.status, s.display?.text ?? null, s.ratio ?? null];
  });
  return fingerprint(canonical(seen));
}
