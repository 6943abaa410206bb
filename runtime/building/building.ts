// The whole building at once, and one mark at a time. Work every mark shares (the plan, the
// tributary split, the storey numbers) is done once in `prepareBuilding`; `computeMark` is
// the plain, cheap per-mark chain — position, KLL, takedown, punching class per level,
// footing — that a per-row run calls for the one mark whose inputs changed.

import { barDia } from '../library/rebar';
import { buildPlan, type GridLine, type NoSlabRegion, type Overhang, type Plan, type PlacedMark } from './plan';
import { tributary, type Tributary } from './tributary';
import { kllClass, planPosition, punchingPosition, type KllClass, type PlanPosition, type PunchingPosition } from './position';
import { prepareStoreys, type PreparedStoreys, type StoreyInput } from './storeys';
import { baseWithOverride, takedown, type TakedownRow } from './takedown';
import { sizeFooting, checkFooting, type FootingResult, type FootingShape, type SizingOutcome, type SizingRules } from './footing-size';
import { groupFootings, type GroupRules, type Grouping, type SizedMark } from './footing-group';
import type { FootingDesign, FootingSite } from './footing-checks';
import type { ScheduleRow } from './schedule-csv';
import type { AsceEdition } from '../library/loads-combinations';

export interface BuildingInput {
  xLines: GridLine[];
  yLines: GridLine[];
  overhang: Overhang;
  noSlab: NoSlabRegion[];
  /** The column schedule: marks, grid positions, sizes, loads that override. */
  columns: ScheduleRow[];
  storeys: StoreyInput[];
  /** ASCE 7 edition of the load combinations ('7-22' when not given). */
  asce?: AsceEdition;
  /** Slab cover and bar, for the slab's effective depth d = h − cover − bar (as the template). */
  slabCover: number;
  slabBar: string;
  site: FootingSite;
  rules: GroupRules;
  /** Plan shape sought for a mark's footing, by mark (rules.shape, or square, for the rest). */
  footingShape?: ReadonlyMap<string, FootingShape>;
  /** Footings the engineer fixed, by mark: checked, not sized. */
  fixed?: ReadonlyMap<string, Omit<FootingDesign, 'bar' | 'nx' | 'ny'> & Partial<FootingDesign>>;
}

export interface PreparedBuilding {
  input: BuildingInput;
  plan: Plan;
  trib: Tributary;
  storeys: PreparedStoreys;
  /** Index of each mark in plan.marks and trib.marks. */
  index: Map<string, number>;
  columnOf: Map<string, ScheduleRow>;
}

export interface MarkResult {
  mark: string;
  placed: PlacedMark;
  /** Tributary area of one level, m². */
  AT: number;
  position: PlanPosition;
  kll: KllClass;
  /** Punching class under each level's slab, roof first. */
  punching: PunchingPosition[];
  takedown: TakedownRow[];
  /** Loads at the top of the footing (the engineer's where given). */
  base: TakedownRow;
  footing: SizingOutcome | ({ sized: false; checked: true } & FootingResult);
}

/** The work every mark shares (throws BuildingInputError naming every problem). */
export function prepareBuilding(input: BuildingInput): PreparedBuilding {
  const plan = buildPlan({ ...input, marks: input.columns.map(({ mark, x, y }) => ({ mark, x, y })) });
  const trib = tributary(plan);
  const storeys = prepareStoreys(input.storeys, input.site.wc);
  const index = new Map(plan.marks.map((m, k) => [m.mark, k]));
  const columnOf = new Map(input.columns.map((c) => [c.mark.trim(), c]));
  return { input, plan, trib, storeys, index, columnOf };
}

/** The chain for one mark. */
export function computeMark(b: PreparedBuilding, mark: string): MarkResult {
  const k = b.index.get(mark);
  if (k === undefined) throw new Error(`unknown mark "${mark}"`);
  const placed = b.plan.marks[k];
  const col = b.columnOf.get(mark)!;
  const position = planPosition(b.plan, placed);
  const kll = kllClass(b.plan, position);
  const AT = b.trib.marks[k].area;
  const bar = barDia(b.input.slabBar);
  const punching = b.input.storeys.map((s) => punchingPosition(b.plan, position, col.c1, col.c2, s.slab - b.input.slabCover - bar));
  const asce = b.input.asce ?? '7-22';
  const rows = takedown(b.storeys, { AT, KLL: kll.KLL, c1: col.c1, c2: col.c2 }, b.input.site.wc, asce);
  const base = baseWithOverride(rows[rows.length - 1], col.loads, asce);
  const demand = { Pu: base.Pu, Ps: base.Ps, c1: col.c1, c2: col.c2 };
  const fixed = b.input.fixed?.get(mark);
  const footing = fixed
    ? { sized: false as const, checked: true as const, ...checkFooting(b.input.site, demand, fixed, b.input.rules.bars, b.input.rules.dowelBar) }
    : sizeFooting(b.input.site, demand, { ...(b.input.rules as SizingRules), shape: b.input.footingShape?.get(mark) ?? b.input.rules.shape });
  return { mark, placed, AT, position, kll, punching, takedown: rows, base, footing };
}

/** Every mark, then the footing types of the sized ones. */
export function computeBuilding(input: BuildingInput): { prepared: PreparedBuilding; marks: MarkResult[]; grouping: Grouping } {
  const prepared = prepareBuilding(input);
  const marks = prepared.plan.marks.map((m) => computeMark(prepared, m.mark));
  const sized: SizedMark[] = [];
  for (const r of marks) {
    const col = prepared.columnOf.get(r.mark)!;
    if (r.footing.sized) sized.push({ mark: r.mark, demand: { Pu: r.base.Pu, Ps: r.base.Ps, c1: col.c1, c2: col.c2 }, footing: r.footing.design });
  }
  return { prepared, marks, grouping: groupFootings(input.site, sized, input.rules) };
}
