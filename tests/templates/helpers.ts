// Running a shipped template headless, as the browser and the CLI do, and reading
// its results by cell name in the cell's own display unit.

import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';
import type { CalcDocument, Cell } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import type { CellState, Engine } from '../../runtime/engine-types';
import { setInputValue } from '../../runtime/edit/index';
import { parse, serialize } from '../../runtime/format/index';
import { runCalc } from '../../runtime/cli/main';
import { parseFormula } from '../../runtime/formula/parse';
import { libraryFunctions } from '../../runtime/library/index';
import { FIGURE_FUNCTIONS } from '../../runtime/figures/functions';

export const CAUTION = "Results are an aid to, not a substitute for, a licensed engineer's judgement; local codes govern.";

export function templatePath(file: string): string {
  return fileURLToPath(new URL(`../../docs-templates/${file}`, import.meta.url));
}

export function templateText(file: string): string {
  return readFileSync(templatePath(file), 'utf8');
}

export interface Run {
  doc: CalcDocument;
  engine: Engine;
  /** Number in the cell's display unit (e.g. psf for a cell shown in psf). */
  num(name: string): number;
  /** Text or yes/no value of a cell. */
  val(name: string): string | boolean | number;
  /** Demand/capacity ratio of a named check. */
  ratio(name: string): number;
  state(name: string): CellState;
  dispose(): void;
}

function named(doc: CalcDocument, name: string): Cell {
  const cell = doc.cells.find((c) => 'name' in c && c.name === name);
  if (!cell) throw new Error(`the template has no cell named ${name}`);
  return cell;
}

/** Parse the template, override inputs by name, run the engine to the end. */
export async function runTemplate(file: string, sets: Record<string, string> = {}): Promise<Run> {
  const { doc: parsed, errors } = parse(templateText(file));
  expect(errors).toEqual([]);
  let doc = parsed;
  for (const [name, value] of Object.entries(sets)) {
    const cell = named(doc, name);
    if (cell.kind !== 'input') throw new Error(`${name} is not an input`);
    doc = setInputValue(doc, cell.id, value);
  }
  const engine = createEngine(doc);
  await engine.settled();
  const state = (name: string) => engine.state(named(doc, name).id)!;
  return {
    doc,
    engine,
    state,
    num(name) {
      const s = state(name);
      if (s.status === 'error' || typeof s.display?.value !== 'number') {
        throw new Error(`${name}: ${s.error?.message ?? `not a number (${String(s.display?.value)})`}`);
      }
      return s.display.value;
    },
    val(name) {
      const v = state(name).value;
      if (v === undefined) throw new Error(`${name} has no value`);
      return v;
    },
    ratio(name) {
      const r = state(name).ratio;
      if (r === undefined) throw new Error(`${name} has no ratio`);
      return r;
    },
    dispose: () => engine.dispose(),
  };
}

/** Every cell computed without error, every check passes. */
export function expectAllPass(run: Run): void {
  const bad = run.doc.cells
    .map((c) => ({ c, s: run.engine.state(c.id) }))
    .filter(({ c, s }) => (c.kind === 'check' ? s?.status !== 'ok' : s?.status === 'error' || s?.status === 'pending'))
    .map(({ c, s }) => `${c.id} ${'name' in c ? c.name ?? '' : ''}: ${s?.status} ${s?.error?.message ?? ''}`);
  expect(bad).toEqual([]);
}

/** The format's promises for a shipped template: labelled cells, caution first, lossless round trip. */
export function expectWellFormed(file: string): CalcDocument {
  const { doc, errors } = parse(templateText(file));
  expect(errors).toEqual([]);
  // The first cell is the note carrying the caution and the code editions.
  const first = doc.cells[0];
  expect(first.kind).toBe('note');
  const note = first.kind === 'note' ? first.text.replace(/\s+/g, ' ') : '';
  expect(note).toContain(CAUTION);
  expect(note).toMatch(/ACI 318-19|ASCE 7-22|IBC/);
  // Every input, formula and check carries a label.
  const unlabelled = doc.cells.filter((c) => c.kind !== 'note' && c.kind !== 'section' && !c.label).map((c) => c.id);
  expect(unlabelled).toEqual([]);
  // Every check names its clause or source.
  const noClause = doc.cells.filter((c) => c.kind === 'check' && !c.clause).map((c) => c.id);
  expect(noClause).toEqual([]);
  // parse ∘ serialize is the identity on the template.
  const again = parse(serialize(doc));
  expect(again.errors).toEqual([]);
  expect(again.doc).toEqual(doc);
  for (const param of ['edition', 'asce']) {
    if (doc.cells.some((c) => c.kind === 'input' && c.name === param)) {
      expect(expectEditionPassedThrough(doc, param)).toBeGreaterThan(0);
    }
  }
  return doc;
}

/**
 * With an `edition` input (ACI 318) or an `asce` input (ASCE 7), every call of a library
 * function that takes that parameter passes that input (so switching the edition reaches
 * every clause that depends on it). Returns the number of such calls.
 */
export function expectEditionPassedThrough(doc: CalcDocument, param = 'edition'): number {
  const takesEdition = new Map<string, number>();
  for (const f of [...libraryFunctions, ...FIGURE_FUNCTIONS]) {
    const i = f.params.findIndex((p) => p.name === param);
    if (i >= 0) takesEdition.set(f.name, i);
  }
  let calls = 0;
  const missing: string[] = [];
  for (const cell of doc.cells) {
    if (cell.kind !== 'formula' && cell.kind !== 'check' && cell.kind !== 'figure') continue;
    (parseFormula(cell.expr) as any).traverse((n: any) => {
      if (n.type !== 'FunctionNode') return;
      const i = takesEdition.get(n.fn.name);
      if (i === undefined) return;
      calls++;
      const arg = n.args[i];
      if (arg?.type !== 'SymbolNode' || arg.name !== param) missing.push(`${cell.id}: ${n.fn.name}`);
    });
  }
  expect(missing).toEqual([]);
  return calls;
}

/** `npm run calc -- docs-templates/FILE --json` in-process: exit code and the JSON rows. */
export async function calcJson(file: string): Promise<{ code: number; rows: { status: string; kind: string }[]; err: string }> {
  let out = '';
  let err = '';
  const code = await runCalc({ file: templatePath(file), sets: [], json: true }, (s) => (out += s), (s) => (err += s));
  return { code, rows: JSON.parse(out), err };
}

/** Agreement to the 4 significant figures a result is printed with. */
export function near(actual: number, expected: number, rel = 5e-4): void {
  const tol = Math.abs(expected) * rel + 1e-12;
  if (Math.abs(actual - expected) > tol) {
    expect.fail(`expected ${expected} (±${tol.toPrecision(2)}), got ${actual}`);
  }
}

/** Floor to a whole number of steps, as a spacing is rounded down (common practice). */
export function floorTo(x: number, step: number): number {
  return Math.floor(x / step + 1e-9) * step;
}

// ---- hand-calculation helpers (first principles, US units) ----------------------

/**
 * Tension steel of a rectangular section by the Whitney block (ACI 318-19 §22.2.2.4.1,
 * ACI 318-19 §22.2.2.4.1), φ = 0.90: Rn = Mu/(φ b d²),
 * ρ = 0.85f'c/fy·(1 − √(1 − 2Rn/(0.85f'c))), As = ρ b d. Mu in lb·in, lengths in in, psi.
 */
export function whitneyAs(MuLbIn: number, b: number, d: number, fc: number, fy: number): number {
  const Rn = MuLbIn / (0.9 * b * d * d);
  return ((0.85 * fc) / fy) * (1 - Math.sqrt(1 - (2 * Rn) / (0.85 * fc))) * b * d;
}

/** β1 = 0.85 to 4000 psi, −0.05 per 1000 psi, ≥ 0.65 (ACI 318-19 Table 22.2.2.4.3, CONFIRMED). */
export function beta1(fc: number): number {
  return Math.min(0.85, Math.max(0.65, 0.85 - (0.05 * (fc - 4000)) / 1000));
}

/**
 * φMn of tension steel As over width b (in, psi; lb·in): a = As fy/(0.85 f'c b), steel yielding,
 * φ = 0.90; asserts εt = 0.003(d − c)/c reaches the tension-controlled limit εty + 0.003
 * (ACI 318-19 Table 21.2.2, from memory; 318-14: 0.005, which it then also reaches).
 */
export function phiMnRect(As: number, b: number, d: number, fc: number, fy: number): number {
  const a = (As * fy) / (0.85 * fc * b);
  const c = a / beta1(fc);
  expect((0.003 * (d - c)) / c).toBeGreaterThan(fy / 29e6 + 0.003);
  return 0.9 * As * fy * (d - a / 2);
}
