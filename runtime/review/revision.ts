// Issuing a revision: the preparer freezes every input value and every result as
// the issued baseline, with who and when, and the log notes what changed since
// the previous issue.

import { cellName, type CalcDocument } from '../document';
import { EditError } from '../edit/ops';
import type { CellState } from '../engine-types';
import { tableInputs } from './table-inputs';
import { sheetFingerprint } from './fingerprint';
import { emptyReview, type Baseline, type InputRevised, type IssuedResult, type Revision, type ReviewState } from './types';

/** Engine results by cell id: `engine.state` fits, so does a map's `get`. */
export type ResultLookup = (id: string) => CellState | undefined;

const LABEL = /^[A-Za-z0-9_-]+$/;

/** Inputs and results of the sheet as they stand now, in sheet order. */
export function snapshot(doc: CalcDocument, results: ResultLookup): Baseline {
  const baseline: Baseline = { inputs: [], results: [] };
  for (const cell of doc.cells) {
    if (cell.kind === 'input') {
      baseline.inputs.push({ id: cell.id, name: cell.name, value: cell.value });
    } else if (cell.kind === 'table') {
      baseline.inputs.push(...tableInputs(cell));
    } else if (cell.kind === 'formula' || cell.kind === 'check') {
      const s = results(cell.id);
      const r: IssuedResult = { id: cell.id, kind: cell.kind, status: s?.status ?? 'pending' };
      const name = cellName(cell);
      if (name !== undefined) r.name = name;
      if (s?.display && s.status !== 'error') {
        r.value = s.display.value;
        if (s.display.unit !== '') r.unit = s.display.unit; // a pure number has none
        r.text = s.display.text;
      }
      if (s?.ratio !== undefined && s.status !== 'error') r.ratio = s.ratio;
      baseline.results.push(r);
    }
  }
  return baseline;
}

/** The inputs whose value differs between two baselines, then added and removed ones, in sheet order. */
export function changedInputs(previous: Baseline | undefined, next: Baseline): InputRevised[] {
  if (!previous) return [];
  const before = new Map(previous.inputs.map((i) => [i.id, i]));
  const now = new Set(next.inputs.map((i) => i.id));
  const out: InputRevised[] = [];
  for (const i of next.inputs) {
    const b = before.get(i.id);
    if (b && b.value === i.value) continue;
    out.push(b ? { id: i.id, name: i.name, from: b.value, to: i.value } : { id: i.id, name: i.name, to: i.value });
  }
  for (const b of previous.inputs) if (!now.has(b.id)) out.push({ id: b.id, name: b.name, from: b.value });
  return out;
}

export function latestRevision(doc: CalcDocument): Revision | undefined {
  const list = doc.review?.revisions;
  return list && list.length ? list[list.length - 1] : undefined;
}

/** "0" first; then one on from the last label's trailing number ("P1" → "P2") or letter ("A" → "B"). */
export function nextRevisionLabel(review: ReviewState | undefined): string {
  const used = new Set(review?.revisions.map((r) => r.label) ?? []);
  const last = review?.revisions[review.revisions.length - 1]?.label;
  let next: string;
  const digits = last ? /^(.*?)(\d+)$/.exec(last) : null;
  if (last === undefined) next = '0';
  else if (digits) next = digits[1] + String(Number(digits[2]) + 1);
  else if (/^[A-Y]$/.test(last)) next = String.fromCharCode(last.charCodeAt(0) + 1);
  else next = `${last}-1`;
  while (used.has(next)) next = `${next}-1`;
  return next;
}

export interface IssueOptions {
  /** The revision label; default nextRevisionLabel. */
  label?: string;
  /** Who checked it; default the title block's "checked by". */
  checkedBy?: string;
}

/**
 * The document issued as a new revision: the baseline is frozen from `results` (let the
 * engine settle first), and the title block shows the new label and date.
 */
export function issueRevision(
  doc: CalcDocument,
  results: ResultLookup,
  who: string,
  when: string,
  description: string,
  options: IssueOptions = {},
): CalcDocument {
  const review = doc.review ?? emptyReview();
  const label = options.label ?? nextRevisionLabel(review);
  if (!LABEL.test(label)) throw new EditError(`revision label "${label}" must be letters, digits, _ or -`);
  if (review.revisions.some((r) => r.label === label)) throw new EditError(`revision ${label} was already issued`);
  const baseline = snapshot(doc, results);
  const revision: Revision = {
    label,
    date: when,
    by: who,
    checkedBy: options.checkedBy ?? doc.meta.checkedBy,
    description,
    changedInputs: changedInputs(latestRevision(doc)?.baseline, baseline),
    baseline,
  };
  const meta = { ...doc.meta, revision: label, date: when };
  revision.sheet = sheetFingerprint({ meta, cells: doc.cells });
  return { ...doc, meta, review: { ...review, revisions: [...review.revisions, revision] } };
}
