// The storeys as rows, roof first: each level with the storey height below it (down to
// the next level, or to the footing for the lowest), its slab thickness, superimposed dead
// load and live load — Lr and snow on the roof; Lo, occupancy and whether it may be
// reduced on a floor. Checked here once; the per-mark takedown reads the prepared numbers.

import { OCCUPANCIES, type Occupancy } from '../library/loads-reduction';
import { type InputIssue, showNumber, throwIfAny } from './issues';

export const MAX_STOREYS = 60;

export interface StoreyInput {
  level: string;
  /** Storey height below the level, m. */
  height: number;
  /** Slab thickness, m. */
  slab: number;
  /** Superimposed dead load, Pa. */
  sdl: number;
  /** Floor: unreduced live load Lo; roof: roof live load Lr. Pa. */
  live: number;
  /** Floors only (the roof's is ignored). */
  occupancy: Occupancy;
  /** Floors only: whether the engineer allows reduction of this floor's live load. */
  reducible: boolean;
  /** Roof only: snow load S, Pa (0 on floors). */
  snow: number;
}

/** Per-level numbers shared by every mark, computed once. */
export interface PreparedStoreys {
  rows: readonly StoreyInput[];
  /** Dead load per area of each level: slab self-weight + superimposed, Pa. */
  deadArea: Float64Array;
}

const TABLE = 'storeys';

export function storeyIssues(rows: readonly StoreyInput[]): InputIssue[] {
  const out: InputIssue[] = [];
  if (rows.length < 1 || rows.length > MAX_STOREYS) {
    out.push({ table: TABLE, message: `give 1 to ${MAX_STOREYS} storeys, roof first (there are ${rows.length})` });
  }
  const seen = new Map<string, number>();
  rows.forEach((s, k) => {
    const row = k + 1;
    const name = s.level.trim();
    if (name === '') out.push({ table: TABLE, row, column: 'level', message: 'the level has no name' });
    else if (seen.has(name)) out.push({ table: TABLE, row, column: 'level', message: `level "${name}" is already row ${seen.get(name)}` });
    else seen.set(name, row);
    const need = (column: keyof StoreyInput, v: number, positive: boolean, what: string) => {
      if (!Number.isFinite(v) || v < 0 || (positive && v === 0)) {
        out.push({ table: TABLE, row, column, message: `${what} must be ${positive ? 'greater than 0' : '0 or more'} (got ${showNumber(v)})` });
      }
    };
    need('height', s.height, true, 'storey height');
    need('slab', s.slab, true, 'slab thickness');
    need('sdl', s.sdl, false, 'superimposed dead load');
    need('live', s.live, false, k === 0 ? 'roof live load Lr' : 'live load Lo');
    need('snow', s.snow, false, 'snow load');
    if (k > 0 && s.snow !== 0) out.push({ table: TABLE, row, column: 'snow', message: 'snow is a roof load: give it on the first row (the roof)' });
    if (k > 0 && !(OCCUPANCIES as readonly string[]).includes(s.occupancy)) {
      out.push({ table: TABLE, row, column: 'occupancy', message: `unknown occupancy "${s.occupancy}"; expected one of ${OCCUPANCIES.join(', ')}` });
    }
    if (Number.isFinite(s.slab) && Number.isFinite(s.height) && s.slab >= s.height) {
      out.push({ table: TABLE, row, column: 'slab', message: 'the slab is as thick as the storey is high' });
    }
  });
  return out;
}

/** Checks the rows (throws BuildingInputError naming each problem) and computes what every mark shares. */
export function prepareStoreys(rows: readonly StoreyInput[], wc: number): PreparedStoreys {
  const issues = storeyIssues(rows);
  if (!Number.isFinite(wc) || wc <= 0) issues.push({ table: 'materials', column: 'wc', message: `unit weight of concrete must be greater than 0 (got ${showNumber(wc)})` });
  throwIfAny(issues);
  const deadArea = new Float64Array(rows.length);
  rows.forEach((s, k) => (deadArea[k] = s.slab * wc + s.sdl));
  return { rows, deadArea };
}
