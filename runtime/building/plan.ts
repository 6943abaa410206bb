// The building in plan, as an engineer types it, and the checked plan the other
// functions read. Plain SI numbers (m).
//
//   x-lines   name, spacing        grid lines across x (e.g. 1, 2, 3 ...), each spacing
//   y-lines   name, spacing        measured from the previous line; the first line's is 0
//   overhang  left right bottom top   slab edge beyond the outer grid lines, per side; an
//                                   edge facing that way inside the plan (at bays without
//                                   slab) stands off its grid line by the same distance
//   no-slab   x-from x-to y-from y-to  bays between these lines have no slab
//                                   (a re-entrant corner, a court)
//   marks     mark, x, y           a column at grid intersection x/y; an intersection
//                                   beside slab that has no mark has its column omitted
//
// x grows to the right of the key plan, y upwards.

import { type InputIssue, showNumber, throwIfAny } from './issues';

export interface GridLine {
  name: string;
  /** Distance from the previous line, m (0 for the first line). */
  spacing: number;
}

export interface Overhang {
  left: number;
  right: number;
  bottom: number;
  top: number;
}

export const SIDES = ['left', 'right', 'bottom', 'top'] as const;
export type Side = (typeof SIDES)[number];

export interface NoSlabRegion {
  xFrom: string;
  xTo: string;
  yFrom: string;
  yTo: string;
}

export interface MarkAt {
  mark: string;
  x: string;
  y: string;
}

export interface PlanInput {
  xLines: GridLine[];
  yLines: GridLine[];
  overhang: Overhang;
  noSlab: NoSlabRegion[];
  marks: MarkAt[];
}

/** A mark placed on the grid: i, j index the x and y lines; x, y its coordinates (m). */
export interface PlacedMark {
  mark: string;
  i: number;
  j: number;
  x: number;
  y: number;
}

/** The checked plan: line coordinates, which bays have slab, the marks placed. */
export interface Plan {
  xNames: string[];
  yNames: string[];
  xs: number[];
  ys: number[];
  overhang: Overhang;
  /** slab[i][j]: the bay between x lines i, i+1 and y lines j, j+1 has slab. */
  slab: boolean[][];
  marks: PlacedMark[];
  /** Intersections beside slab with no mark, as "x/y" names. */
  omitted: string[];
}

function checkLines(table: string, lines: GridLine[], out: InputIssue[]): void {
  if (lines.length < 2) out.push({ table, message: `give at least two grid lines (there ${lines.length === 1 ? 'is one' : 'are none'})` });
  const seen = new Map<string, number>();
  lines.forEach((l, k) => {
    const row = k + 1;
    const name = l.name.trim();
    if (name === '') out.push({ table, row, column: 'name', message: 'the grid line has no name' });
    else if (seen.has(name)) out.push({ table, row, column: 'name', message: `line "${name}" is already row ${seen.get(name)}` });
    else seen.set(name, row);
    if (!Number.isFinite(l.spacing)) out.push({ table, row, column: 'spacing', message: `spacing must be a finite length (got ${showNumber(l.spacing)})` });
    else if (k === 0 && l.spacing !== 0) out.push({ table, row, column: 'spacing', message: 'the first line has nothing before it: its spacing must be 0' });
    else if (k > 0 && l.spacing <= 0) out.push({ table, row, column: 'spacing', message: `spacing from line "${lines[k - 1].name}" must be greater than 0` });
  });
}

function lineIndex(lines: GridLine[], name: string): number {
  return lines.findIndex((l) => l.name.trim() === name.trim());
}

function unknownLine(dir: 'x' | 'y', name: string, lines: GridLine[]): string {
  return `"${name}" is not a ${dir} line (${dir} lines: ${lines.map((l) => l.name).join(', ')})`;
}

function slabBays(input: PlanInput, out: InputIssue[]): boolean[][] {
  const nx = Math.max(0, input.xLines.length - 1);
  const ny = Math.max(0, input.yLines.length - 1);
  const slab = Array.from({ length: nx }, () => new Array<boolean>(ny).fill(true));
  input.noSlab.forEach((r, k) => {
    const row = k + 1;
    const at = (col: keyof NoSlabRegion, dir: 'x' | 'y') => {
      const lines = dir === 'x' ? input.xLines : input.yLines;
      const idx = lineIndex(lines, r[col]);
      if (idx < 0) out.push({ table: 'no-slab', row, column: col, message: unknownLine(dir, r[col], lines) });
      return idx;
    };
    const [a, b, c, d] = [at('xFrom', 'x'), at('xTo', 'x'), at('yFrom', 'y'), at('yTo', 'y')];
    if (a < 0 || b < 0 || c < 0 || d < 0) return;
    if (a === b) out.push({ table: 'no-slab', row, column: 'xTo', message: 'x-from and x-to are the same line: the region has no width' });
    if (c === d) out.push({ table: 'no-slab', row, column: 'yTo', message: 'y-from and y-to are the same line: the region has no depth' });
    for (let i = Math.min(a, b); i < Math.max(a, b); i++) for (let j = Math.min(c, d); j < Math.max(c, d); j++) slab[i][j] = false;
  });
  return slab;
}

/** Slab in the four bays around intersection (i, j): lower-left, lower-right, upper-left, upper-right. */
export function quadrants(slab: boolean[][], i: number, j: number): [boolean, boolean, boolean, boolean] {
  const bay = (a: number, b: number) => a >= 0 && b >= 0 && a < slab.length && b < (slab[0]?.length ?? 0) && slab[a][b];
  return [bay(i - 1, j - 1), bay(i, j - 1), bay(i - 1, j), bay(i, j)];
}

/** A slab that meets itself only at a corner point (two diagonal bays) cannot be read. */
function touchesOnlyAtCorner(q: [boolean, boolean, boolean, boolean]): boolean {
  const [ll, lr, ul, ur] = q;
  return (ll && ur && !lr && !ul) || (lr && ul && !ll && !ur);
}

function placeMarks(input: PlanInput, slab: boolean[][], xs: number[], ys: number[], out: InputIssue[]): PlacedMark[] {
  const placed: PlacedMark[] = [];
  const byName = new Map<string, number>();
  const bySpot = new Map<string, number>();
  input.marks.forEach((m, k) => {
    const row = k + 1;
    const mark = m.mark.trim();
    if (mark === '') out.push({ table: 'marks', row, column: 'mark', message: 'the column has no mark' });
    else if (byName.has(mark)) out.push({ table: 'marks', row, column: 'mark', message: `mark "${mark}" is already row ${byName.get(mark)}` });
    else byName.set(mark, row);
    const i = lineIndex(input.xLines, m.x);
    const j = lineIndex(input.yLines, m.y);
    if (i < 0) out.push({ table: 'marks', row, column: 'x', message: unknownLine('x', m.x, input.xLines) });
    if (j < 0) out.push({ table: 'marks', row, column: 'y', message: unknownLine('y', m.y, input.yLines) });
    if (i < 0 || j < 0) return;
    const spot = `${input.xLines[i].name}/${input.yLines[j].name}`;
    if (bySpot.has(spot)) {
      out.push({ table: 'marks', row, column: 'x', message: `row ${bySpot.get(spot)} already has a column at ${spot}` });
      return;
    }
    bySpot.set(spot, row);
    if (!quadrants(slab, i, j).some(Boolean)) {
      out.push({ table: 'marks', row, column: 'x', message: `no slab bay touches ${spot}: the column would carry nothing` });
      return;
    }
    placed.push({ mark, i, j, x: xs[i], y: ys[j] });
  });
  return placed;
}

function coordinates(lines: GridLine[]): number[] {
  const out: number[] = [];
  lines.forEach((l, k) => out.push(k === 0 ? 0 : out[k - 1] + l.spacing));
  return out;
}

/** Every issue with the plan input (empty when it can be used). */
export function planIssues(input: PlanInput): InputIssue[] {
  return checkedPlan(input).issues;
}

function checkedPlan(input: PlanInput): { plan: Plan; issues: InputIssue[] } {
  const out: InputIssue[] = [];
  checkLines('x-lines', input.xLines, out);
  checkLines('y-lines', input.yLines, out);
  for (const side of SIDES) {
    const v = input.overhang[side];
    if (!Number.isFinite(v) || v < 0) out.push({ table: 'overhang', column: side, message: `overhang must be a length of 0 or more (got ${showNumber(v)})` });
  }
  const slab = slabBays(input, out);
  const xs = coordinates(input.xLines);
  const ys = coordinates(input.yLines);
  if (slab.length > 0 && !slab.some((col) => col.some(Boolean))) out.push({ table: 'no-slab', message: 'every bay is marked as having no slab' });
  const omitted: string[] = [];
  for (let i = 0; i < xs.length; i++) {
    for (let j = 0; j < ys.length; j++) {
      const q = quadrants(slab, i, j);
      const spot = `${input.xLines[i].name}/${input.yLines[j].name}`;
      if (touchesOnlyAtCorner(q)) out.push({ table: 'no-slab', message: `the slab meets itself only at the corner point ${spot}; add or remove a bay there` });
    }
  }
  const marks = placeMarks(input, slab, xs, ys, out);
  if (input.marks.length === 0) out.push({ table: 'marks', message: 'give at least one column mark' });
  const taken = new Set(marks.map((m) => `${m.i},${m.j}`));
  for (let i = 0; i < xs.length; i++) {
    for (let j = 0; j < ys.length; j++) {
      if (!taken.has(`${i},${j}`) && quadrants(slab, i, j).some(Boolean)) omitted.push(`${input.xLines[i].name}/${input.yLines[j].name}`);
    }
  }
  const plan: Plan = {
    xNames: input.xLines.map((l) => l.name.trim()), yNames: input.yLines.map((l) => l.name.trim()),
    xs, ys, overhang: { ...input.overhang }, slab, marks, omitted,
  };
  return { plan, issues: out };
}

/** The checked plan; throws BuildingInputError naming every problem. */
export function buildPlan(input: PlanInput): Plan {
  const { plan, issues } = checkedPlan(input);
  throwIfAny(issues);
  return plan;
}
