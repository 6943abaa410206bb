// Sign-off of a section or of the whole record by the checker. Each records a
// fingerprint of the cells it covers and, when the engine's results are given, of the
// inputs and results the checker saw, whether the sheet then differed from the latest
// revision (the working state was signed, not the revision), and the NOT OK checks,
// errors and open comments signed with. When what it covers changes, it is stale.

import type { CalcDocument } from '../document';
import { EditError } from '../edit/ops';
import { signoffFindings, seenFingerprint } from './findings';
import { coverFingerprint } from './fingerprint';
import { latestRevision, type ResultLookup } from './revision';
import { changedSinceIssue } from './state';
import { emptyReview, type SignOff } from './types';

export interface SignOffRequest {
  /** 'document' for the whole record, else a section cell id. */
  scope: 'document' | string;
  by: string;
  date: string;
  /** The engine's results as the checker sees them (let it settle first). */
  results?: ResultLookup;
}

export function signOff(doc: CalcDocument, request: SignOffRequest): { doc: CalcDocument; id: string } {
  const covered = coverFingerprint(doc, request.scope);
  if (covered === undefined) throw new EditError(`no section with id "${request.scope}"`);
  if (request.by.trim() === '') throw new EditError('a sign-off needs a name');
  const review = doc.review ?? emptyReview();
  const used = new Set(review.signoffs.map((s) => s.id));
  let n = 1;
  while (used.has(`so${n}`)) n++;
  const id = `so${n}`;
  const s: SignOff = { id, scope: request.scope, by: request.by, date: request.date, covered };
  const rev = latestRevision(doc)?.label;
  if (rev !== undefined) s.revision = rev;
  if (rev !== undefined && changedSinceIssue(doc, request.results)) s.unissued = true;
  if (request.results) {
    s.seen = seenFingerprint(doc, request.results, request.scope);
    const found = signoffFindings(doc, request.results, request.scope);
    if (found.length) s.exceptions = found;
  }
  return { doc: { ...doc, review: { ...review, signoffs: [...review.signoffs, s] } }, id };
}

/**
 * True when anything the sign-off covers changed since it was signed (or its section
 * is gone); with `results`, also when the inputs and results it saw differ now.
 */
export function isStale(s: SignOff, doc: CalcDocument, results?: ResultLookup): boolean {
  if (coverFingerprint(doc, s.scope) !== s.covered) return true;
  return results !== undefined && s.seen !== undefined && seenFingerprint(doc, results, s.scope) !== s.seen;
}

/** Withdraws a sign-off (e.g. a stale one before signing again). */
export function withdrawSignOff(doc: CalcDocument, id: string): CalcDocument {
  const list = doc.review?.signoffs ?? [];
  if (!list.some((s) => s.id === id)) throw new EditError(`no sign-off with id "${id}"`);
  return { ...doc, review: { ...(doc.review ?? emptyReview()), signoffs: list.filter((s) => s.id !== id) } };
}
