// The codes and references a package cites, gathered from the clauses its sheets actually
// use: each cell's own clause, the clauses of the library functions it called (the cell
// state carries them) and the clauses of the steps those functions took for the values
// they were given (their working), so an edition switched by an argument is the one cited.

import type { CalcDocument } from '../document';
import type { CellState } from '../engine-types';
import type { LibraryCall } from '../library/call';
import type { Entry } from '../working/recorder';
import { workingOf } from '../working/run';
import { SOURCE_PATTERNS, type Source } from './sources';

export interface Citation {
  source: Source;
  /** The clauses, tables, equations and sections cited, in code order. */
  items: string[];
  /** Which sheets cite it (1-based numbers of the package's sheets). */
  sheets: number[];
}

export interface SheetClauses {
  doc: CalcDocument;
  state: (id: string) => CellState | undefined;
  calls?: (id: string) => LibraryCall[];
}

const NUM = String.raw`\d+(?:\.\d+)*(?:-\d+)?(?:\([a-z0-9]+\))*`;
const ITEM = new RegExp(String.raw`§\s?(${NUM})|\bTables?\s+(${NUM}(?:(?:,\s*|\s+and\s+)${NUM})*)|\bEq\.\s*(${NUM}(?:-\d+)?(?:\([a-z]\))?)|\bFig\.\s*(${NUM})|\b(?:Ch\.|Chapter)\s*(\d+(?:\s+and\s+\d+)*)`, 'g');
const LIST_SPLIT = /,\s*|\s+and\s+/;

/** The clause items in a piece of text: "§22.6.4.1", "Table 21.2.2", "Eq. 4.7-1", "Fig. 8.7.4.1.3", "Ch. 13". */
export function clauseItems(text: string): string[] {
  const out: string[] = [];
  for (const m of text.matchAll(ITEM)) {
    if (m[1]) out.push(`§${m[1]}`);
    else if (m[2]) out.push(...m[2].split(LIST_SPLIT).map((n) => `Table ${n}`));
    else if (m[3]) out.push(`Eq. ${m[3]}`);
    else if (m[4]) out.push(`Fig. ${m[4]}`);
    else if (m[5]) out.push(...m[5].split(LIST_SPLIT).map((n) => `Ch. ${n}`));
  }
  return out;
}

/**
 * Each source a clause text names, with the items cited after it (up to the next source
 * named). A text that names two editions of one code cites the first: the other is named
 * as the alternative an argument selects ("ACI 318-19 Table 22.5.5.1(c) …; edition '318-14':
 * §22.5.5.1"), and the working of a call taken on that edition cites it on its own.
 */
export function citationsIn(text: string): { source: Source; items: string[] }[] {
  const plain = text;
  const hits: { at: number; end: number; source: Source }[] = [];
  for (const p of SOURCE_PATTERNS) {
    for (const m of plain.matchAll(p.re)) hits.push({ at: m.index!, end: m.index! + m[0].length, source: p.make(m as RegExpExecArray) });
  }
  hits.sort((a, b) => a.at - b.at);
  const edition = new Map<string, string | undefined>();
  const out: { source: Source; items: string[] }[] = [];
  hits.forEach((h, i) => {
    const { family, edition: ed } = h.source;
    if (family !== undefined && ed !== undefined) {
      if (edition.get(family) === undefined) edition.set(family, ed);
      else if (edition.get(family) !== ed) return;
    }
    out.push({ source: h.source, items: clauseItems(plain.slice(h.end, hits[i + 1]?.at ?? plain.length)) });
  });
  return out;
}

/** Every clause text in a working: the function's own, its steps' and its nested calls'. */
function workingClauses(entries: readonly Entry[], out: string[]): void {
  for (const e of entries) {
    if (e.kind === 'step' && e.clause) out.push(e.clause);
    else if (e.kind === 'group') {
      if (e.clause) out.push(e.clause);
      workingClauses(e.entries, out);
    } else if (e.kind === 'method') out.push(e.reference);
  }
}

/** The clause texts one sheet uses. */
export function sheetClauseTexts(sheet: SheetClauses): string[] {
  const out: string[] = [];
  for (const cell of sheet.doc.cells) {
    if ('clause' in cell && cell.clause) out.push(cell.clause);
    out.push(...(sheet.state(cell.id)?.clauses ?? []));
    for (const call of (cell.kind === 'formula' || cell.kind === 'check') && sheet.calls ? sheet.calls(cell.id) : []) {
      const w = workingOf(call.lib, call.args, call.units);
      if (w.root.clause) out.push(w.root.clause);
      workingClauses(w.root.entries, out);
    }
  }
  return out;
}

/** Orders clause items as a code's reader looks them up: chapters, sections, tables, equations, figures; by number within. */
function itemOrder(a: string, b: string): number {
  const rank = (s: string) => ['Ch.', '§', 'Table', 'Eq.', 'Fig.'].findIndex((p) => s.startsWith(p));
  const nums = (s: string) => (s.match(/\d+/g) ?? []).map(Number);
  const r = rank(a) - rank(b);
  if (r !== 0) return r;
  const x = nums(a);
  const y = nums(b);
  for (let i = 0; i < Math.max(x.length, y.length); i++) {
    if ((x[i] ?? -1) !== (y[i] ?? -1)) return (x[i] ?? -1) - (y[i] ?? -1);
  }
  return a.localeCompare(b);
}

/** The package's list of codes and references: codes first (by code, then edition), then references by author. */
export function gatherCitations(sheets: readonly SheetClauses[]): Citation[] {
  const byKey = new Map<string, { source: Source; items: Set<string>; sheets: Set<number> }>();
  sheets.forEach((sheet, i) => {
    for (const text of sheetClauseTexts(sheet)) {
      for (const { source, items } of citationsIn(text)) {
        const entry = byKey.get(source.key) ?? { source, items: new Set<string>(), sheets: new Set<number>() };
        byKey.set(source.key, entry);
        for (const item of items) entry.items.add(item);
        entry.sheets.add(i + 1);
      }
    }
  });
  // A code named without its edition is the edition named elsewhere, when only one is.
  for (const [key, e] of byKey) {
    if (e.source.family === undefined || e.source.edition !== undefined) continue;
    const editions = [...byKey.values()].filter((o) => o.source.family === e.source.family && o.source.edition !== undefined);
    if (editions.length !== 1) continue;
    for (const item of e.items) editions[0].items.add(item);
    for (const n of e.sheets) editions[0].sheets.add(n);
    byKey.delete(key);
  }
  return [...byKey.values()]
    .sort((a, b) => a.source.order - b.source.order || a.source.key.localeCompare(b.source.key))
    .map((e) => ({ source: e.source, items: [...e.items].sort(itemOrder), sheets: [...e.sheets].sort((a, b) => a - b) }));
}
