// What is wrong with a building's input, said at the place it was typed: the table, the row
// (1-based, as the engineer counts) and the column. Every check collects all it finds, so
// one pass shows the engineer everything to fix.

export interface InputIssue {
  /** The table the value sits in: 'x-lines', 'y-lines', 'overhang', 'no-slab', 'marks', 'storeys', ... */
  table: string;
  /** Row, counted from 1 (absent for a value that is not in a row). */
  row?: number;
  /** Column (field) name. */
  column?: string;
  message: string;
}

/** Where an issue sits, in words: "marks row 3, column x". */
export function issuePlace(i: InputIssue): string {
  const row = i.row !== undefined ? ` row ${i.row}` : '';
  const column = i.column !== undefined ? `${row ? ',' : ''} column ${i.column}` : '';
  return `${i.table}${row}${column}`;
}

/** Thrown when the input cannot be used; carries every issue found. */
export class BuildingInputError extends Error {
  override name = 'BuildingInputError';
  constructor(readonly issues: readonly InputIssue[]) {
    super(issues.map((i) => `${issuePlace(i)}: ${i.message}`).join('\n'));
  }
}

/** Throws a BuildingInputError when there is anything in `issues`. */
export function throwIfAny(issues: readonly InputIssue[]): void {
  if (issues.length > 0) throw new BuildingInputError(issues);
}

/** Short number text for messages. */
export function showNumber(v: unknown): string {
  return typeof v === 'number' ? String(Number(v.toPrecision(4))) : JSON.stringify(v);
}
