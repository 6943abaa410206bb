// Which cells of a sheet show the working of their library calls, and how: the calls a
// formula makes (read from its text, no computing), and the sheet's choice for the record
// (FORMAT.md "Settings"): every working open, every one folded, or by default open where it
// feeds a governing check — the checks with the worst ratios — and folded elsewhere.

import type { CalcDocument, Cell } from '../document';
import { cellName } from '../document';
import type { CellState } from '../engine-types';
import type { MathNode } from 'mathjs';
import { nameUses } from '../formula/tokens';
import { parseForDisplay } from '../handcalc/formula';
import type { WorkingSetting } from '../format/settings';
import { libraryFunctions } from '../library/index';
import type { LibraryCall } from './calls';
import { callTitle, foldedCallHtml, workingHtml, type WorkingFace } from './html';

const LIBRARY = new Set(libraryFunctions.map((f) => f.name));
const calledCache = new Map<string, string[]>();

/**
 * The library functions a formula or check calls, in the order the engine calls them (an
 * argument's call before the call it is given to), repeats kept; [] when it does not parse.
 */
export function calledFunctions(expr: string): string[] {
  let hit = calledCache.get(expr);
  if (!hit) {
    const out: string[] = [];
    const walk = (n: MathNode) => {
      n.forEach((child) => walk(child));
      const name = (n as unknown as { fn?: { name?: string } }).fn?.name;
      if (n.type === 'FunctionNode' && name && LIBRARY.has(name)) out.push(name);
    };
    // Words only: a formula that names no library function is not parsed here.
    const node = nameUses(expr).some((u) => u.call && LIBRARY.has(u.name)) ? parseForDisplay(expr) : undefined;
    if (node) walk(node);
    hit = out;
    if (calledCache.size > 4000) calledCache.clear();
    calledCache.set(expr, hit);
  }
  return hit;
}

/** The formula or check expression of a cell, if it has one. */
function exprOf(cell: Cell): string | undefined {
  return cell.kind === 'formula' || cell.kind === 'check' ? cell.expr : undefined;
}

/** How many checks count as governing: the worst few by ratio, and every one that fails. */
export const GOVERNING_CHECKS = 3;

/** The checks with the worst ratios (and every failing check): the governing checks. */
export function governingChecks(doc: CalcDocument, state: (id: string) => CellState | undefined): string[] {
  const rated = doc.cells
    .filter((c) => c.kind === 'check')
    .map((c) => ({ id: c.id, s: state(c.id) }))
    .filter((r) => r.s?.ratio !== undefined && (r.s.status === 'ok' || r.s.status === 'fail'))
    .sort((a, b) => b.s!.ratio! - a.s!.ratio!);
  return rated.filter((r, i) => i < GOVERNING_CHECKS || r.s!.status === 'fail').map((r) => r.id);
}

/** How far upstream of a governing check (formulas read, then theirs, ...) workings open. */
export const GOVERNING_DEPTH = 3;

/**
 * The cells whose working a governing check rests on: the check itself when it calls the
 * library, and the formulas that do within GOVERNING_DEPTH reads upstream of it.
 */
export function governingWorkings(doc: CalcDocument, state: (id: string) => CellState | undefined): Set<string> {
  const byName = new Map<string, Cell>();
  for (const c of doc.cells) {
    const n = cellName(c);
    if (n !== undefined && !byName.has(n)) byName.set(n, c);
  }
  const open = new Set<string>();
  const seen = new Set<string>();
  let level = governingChecks(doc, state).map((id) => doc.cells.find((c) => c.id === id)!);
  for (let depth = 0; depth <= GOVERNING_DEPTH && level.length; depth++) {
    const next: Cell[] = [];
    for (const cell of level) {
      if (seen.has(cell.id)) continue;
      seen.add(cell.id);
      const expr = exprOf(cell);
      if (expr === undefined) continue;
      if (calledFunctions(expr).length) open.add(cell.id);
      for (const name of state(cell.id)?.reads ?? []) {
        const up = byName.get(name);
        if (up?.kind === 'formula') next.push(up);
      }
    }
    level = next;
  }
  return open;
}

/** Whether each cell's workings show open in the record, by the sheet's setting. */
export function recordOpen(doc: CalcDocument, state: (id: string) => CellState | undefined): (id: string) => boolean {
  const setting: WorkingSetting = doc.working ?? 'governing';
  if (setting === 'open') return () => true;
  if (setting === 'folded') return () => false;
  const open = governingWorkings(doc, state);
  return (id) => open.has(id);
}

/**
 * The record's workings of a cell's calls; '' when it calls no library function. Open ones
 * carry every step. A folded one is its title and a line on how to see it: the steps of every
 * call on a sheet would more than double the record (and its time to open), so the sheet's
 * setting (`working open`) asks for them all.
 */
export function cellWorkingsHtml(calls: readonly LibraryCall[], face: WorkingFace, open: boolean): string {
  if (calls.length === 0) return '';
  const folded = (c: LibraryCall) => `<details class="lt-working lt-wk-top"><summary>${callTitle(c)}</summary>` +
    '<p class="lt-wk-method">Folded in this record: open the file with JavaScript on to see these steps, or set the sheet to print every working (working open).</p></details>';
  return `<div class="lt-workings">${calls.map((c) => (open ? workingHtml(c, face, true) : folded(c))).join('')}</div>`;
}

/** The call a fold stands for: the k-th call of its function among those the engine made. */
export function callFor(calls: readonly LibraryCall[], expr: string, index: number): LibraryCall | undefined {
  const names = calledFunctions(expr);
  const name = names[index];
  const k = names.slice(0, index).filter((n) => n === name).length;
  return calls.filter((c) => c.lib.name === name)[k];
}

/** The live sheet's folds for a formula's calls, by name only: made when a fold is opened. */
export function foldedWorkingsHtml(expr: string): string {
  const names = calledFunctions(expr);
  if (names.length === 0) return '';
  return `<div class="lt-workings">${names.map((name, i) => foldedCallHtml({ lib: { name } }, i)).join('')}</div>`;
}
