// The checker's review as plain data carried in the record: issued revisions with
// their frozen baselines, comments on cells, and sign-offs. Travels with the
// document (CalcDocument.review) and through the text format.

import type { CellStatus } from '../cell-status';

/** An input as it stood when a revision was issued. */
export interface IssuedInput {
  id: string;
  /** The input's name then, so a log still reads after a rename or a delete. */
  name: string;
  /** Exactly as typed. */
  value: string;
}

/** A formula's or a check's result as it stood when a revision was issued. */
export interface IssuedResult {
  id: string;
  kind: 'formula' | 'check';
  /** Absent for an unnamed check. */
  name?: string;
  status: CellStatus;
  /** Number in the display unit, or the text/boolean value (absent on an error). */
  value?: number | string | boolean;
  unit?: string;
  /** Formatted for people, e.g. "528 ft^2". */
  text?: string;
  /** Demand/capacity, for a check that has one. */
  ratio?: number;
}

/** What an issue freezes: every input value and every result, in sheet order. */
export interface Baseline {
  inputs: IssuedInput[];
  results: IssuedResult[];
}

/**
 * One issue of the record. Labels: issues are numbered "0", "1", "2", ... (Rev 0 is
 * the first issue); a label written by hand may be any [A-Za-z0-9_-]+ word ("P1",
 * "A") and the next one counts on from it (see nextRevisionLabel).
 */
export interface Revision {
  label: string;
  date: string;
  by: string;
  /** '' until someone checks it. */
  checkedBy: string;
  description: string;
  /** Inputs changed, added or removed since the previous issue ([] for the first). */
  changedInputs: InputRevised[];
  baseline: Baseline;
  /** Fingerprint of the sheet as issued (sheetFingerprint); absent in revisions written before it was kept. */
  sheet?: string;
}

/** One line of the revision log: an input's value at the previous issue and at this one. */
export interface InputRevised {
  id: string;
  name: string;
  /** Absent for an input new in this issue. */
  from?: string;
  /** Absent for an input removed in this issue. */
  to?: string;
}

export interface Reply {
  author: string;
  time: string;
  text: string;
}

/** A comment on one cell (it stays if the cell is later deleted). */
export interface Comment {
  id: string;
  cellId: string;
  author: string;
  time: string;
  text: string;
  status: 'open' | 'resolved';
  replies: Reply[];
}

/**
 * A checker's sign-off of the whole record ('document') or of one section (its cell
 * id; a section whose id is "document" can only be signed with the whole record).
 */
export interface SignOff {
  id: string;
  scope: 'document' | string;
  by: string;
  date: string;
  /** Fingerprint of what the sign-off covers when signed (see coverFingerprint). */
  covered: string;
  /** The latest issued revision when signed, if any. */
  revision?: string;
  /** The sheet differed from that revision when signed: the working state was signed, not the revision. */
  unissued?: boolean;
  /** Fingerprint of the inputs and results the checker saw (seenFingerprint); absent in older sign-offs. */
  seen?: string;
  /** NOT OK checks, cells in error and open comments the checker signed with, knowingly. */
  exceptions?: SignOffException[];
}

/** Something within a sign-off's scope that was not in order when it was given. */
export interface SignOffException {
  kind: 'not-ok' | 'error' | 'open-comment';
  /** The cell id (a check or a cell in error) or the comment id. */
  id: string;
  /** Name and label, or the comment's opening words, as they were. */
  text: string;
}

export interface ReviewState {
  revisions: Revision[];
  comments: Comment[];
  signoffs: SignOff[];
}

export function emptyReview(): ReviewState {
  return { revisions: [], comments: [], signoffs: [] };
}

export function isEmptyReview(r: ReviewState | undefined): boolean {
  return !r || (r.revisions.length === 0 && r.comments.length === 0 && r.signoffs.length === 0);
}
