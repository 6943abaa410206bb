// What changed against an issued baseline (or between two records): every input
// old → new, every result and check issued vs current with the change in
// demand/capacity ratio; and the one action that puts the issued inputs back.

import type { CalcDocument, Cell } from '../document';
import { tableAtIssue } from './table-inputs';
import { latestRevision, snapshot, type ResultLookup } from './revision';
import type { Baseline, IssuedInput, IssuedResult } from './types';

export interface InputChange {
  id: string;
  name: string;
  /** Issued (or first record's) value; absent when the input is new. */
  before?: string;
  /** Current (or second record's) value; absent when the input was removed. */
  after?: string;
  changed: boolean;
}

export interface ResultChange {
  id: string;
  kind: 'formula' | 'check';
  name?: string;
  /** For a check with no name: its label (or, with none, its condition), to call it by. */
  label?: string;
  before?: IssuedResult;
  after?: IssuedResult;
  /** Status or shown text differs, or the cell is new or gone. */
  changed: boolean;
  /** after.ratio − before.ratio, when both are finite. */
  deltaRatio?: number;
}

export interface Comparison {
  inputs: InputChange[];
  /** Formula results. */
  results: ResultChange[];
  checks: ResultChange[];
}

/**
 * Pairs items of `after` with items of `before`: by id first (the same record over
 * its revisions), then by name (two records written apart), in `after` order; the
 * unmatched `before` items follow.
 */
function pair<T extends { id: string; name?: string }>(before: T[], after: T[]): [T | undefined, T | undefined][] {
  const byId = new Map(before.map((b) => [b.id, b]));
  const used = new Set<T>();
  const out: [T | undefined, T | undefined][] = after.map((a) => {
    const b = byId.get(a.id);
    if (b) used.add(b);
    return [b, a];
  });
  const byName = new Map<string, T>();
  for (const b of before) if (!used.has(b) && b.name !== undefined && !byName.has(b.name)) byName.set(b.name, b);
  for (const row of out) {
    if (row[0] || row[1]!.name === undefined) continue;
    const b = byName.get(row[1]!.name);
    if (b && !used.has(b)) {
      row[0] = b;
      used.add(b);
    }
  }
  for (const b of before) if (!used.has(b)) out.push([b, undefined]);
  return out;
}

function resultChange(b: IssuedResult | undefined, a: IssuedResult | undefined): ResultChange {
  const ref = (a ?? b)!;
  const row: ResultChange = {
    id: ref.id,
    kind: ref.kind,
    before: b,
    after: a,
    changed: !a || !b || a.status !== b.status || a.text !== b.text,
  };
  if (ref.name !== undefined) row.name = ref.name;
  if (a?.ratio !== undefined && b?.ratio !== undefined && Number.isFinite(a.ratio) && Number.isFinite(b.ratio)) {
    row.deltaRatio = a.ratio - b.ratio;
  }
  return row;
}

/** Every input, result and check of `before` against `after`, marked changed or not. */
export function compareBaselines(before: Baseline, after: Baseline): Comparison {
  const inputs = pair<IssuedInput>(before.inputs, after.inputs).map(([b, a]): InputChange => {
    const ref = (a ?? b)!;
    const row: InputChange = { id: ref.id, name: ref.name, changed: !a || !b || a.value !== b.value };
    if (b) row.before = b.value;
    if (a) row.after = a.value;
    return row;
  });
  const kinds = (base: Baseline, kind: IssuedResult['kind']) => base.results.filter((r) => r.kind === kind);
  const rows = (kind: IssuedResult['kind']) =>
    pair<IssuedResult>(kinds(before, kind), kinds(after, kind)).map(([b, a]) => resultChange(b, a));
  return { inputs, results: rows('formula'), checks: rows('check') };
}

/** What people call a row: its name, else (an unnamed check) its label, else its id in brackets. */
export function changeName(r: { id: string; name?: string; label?: string }): string {
  return r.name ?? r.label ?? `(${r.id})`;
}

/** Unnamed checks get the label of their cell, looked up in `docs` in order. */
function labelled(c: Comparison, ...docs: CalcDocument[]): Comparison {
  const label = (r: ResultChange): ResultChange => {
    if (r.name !== undefined) return r;
    for (const d of docs) {
      const cell = d.cells.find((x) => x.id === r.id);
      if (cell?.kind === 'check') return { ...r, label: cell.label?.trim() || cell.expr };
    }
    return r;
  };
  return { ...c, checks: c.checks.map(label) };
}

/** The sheet now against an issued baseline (default: the latest revision's); undefined before any issue. */
export function compare(doc: CalcDocument, results: ResultLookup, baseline?: Baseline): Comparison | undefined {
  const issued = baseline ?? latestRevision(doc)?.baseline;
  return issued ? labelled(compareBaselines(issued, snapshot(doc, results)), doc) : undefined;
}

/** Two records (e.g. two revisions of one calc), each with its engine results. */
export function diffRecords(
  a: { doc: CalcDocument; results: ResultLookup },
  b: { doc: CalcDocument; results: ResultLookup },
): Comparison {
  return labelled(compareBaselines(snapshot(a.doc, a.results), snapshot(b.doc, b.results)), b.doc, a.doc);
}

/** Only the rows that differ. */
export function onlyChanged(c: Comparison): Comparison {
  return {
    inputs: c.inputs.filter((r) => r.changed),
    results: c.results.filter((r) => r.changed),
    checks: c.checks.filter((r) => r.changed),
  };
}

/**
 * The sheet with every input still in it set back to its issued value. Nothing else
 * changes: added cells, formulas, comments and sign-offs stay as they are. The same
 * document comes back when nothing differs.
 */
export function returnToBaseline(doc: CalcDocument, baseline?: Baseline): CalcDocument {
  const issued = baseline ?? latestRevision(doc)?.baseline;
  if (!issued) return doc;
  const values = new Map(issued.inputs.map((i) => [i.id, i.value]));
  let changed = false;
  const cells = doc.cells.map((c): Cell => {
    if (c.kind === 'table') {
      const t = tableAtIssue(c, values);
      if (t !== c) changed = true;
      return t;
    }
    if (c.kind !== 'input') return c;
    const v = values.get(c.id);
    if (v === undefined || v === c.value) return c;
    changed = true;
    return { ...c, value: v };
  });
  return changed ? { ...doc, cells } : doc;
}
