// Sign-off of a section or of the whole record by the checker. Each records a
// fingerprint of what it covers; when that no longer matches the sheet, the
// sign-off is stale and the section needs checking again.

import type { CalcDocument } from '../document';
import { EditError } from '../edit/ops';
import { coverFingerprint } from './fingerprint';
import { latestRevision } from './revision';
import { emptyReview, type SignOff } from './types';

export interface SignOffRequest {
  /** 'document' for the whole record, else a section cell id. */
  scope: 'document' | string;
  by: string;
  date: string;
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
  return { doc: { ...doc, review: { ...review, signoffs: [...review.signoffs, s] } }, id };
}

/** True when anything the sign-off covers changed since it was signed (or its section is gone). */
export function isStale(s: SignOff, doc: CalcDocument): boolean {
  return coverFingerprint(doc, s.scope) !== s.covered;
}

/** Withdraws a sign-off (e.g. a stale one before signing again). */
export function withdrawSignOff(doc: CalcDocument, id: string): CalcDocument {
  const list = doc.review?.signoffs ?? [];
  if (!list.some((s) => s.id === id)) throw new EditError(`no sign-off with id "${id}"`);
  return { ...doc, review: { ...(doc.review ?? emptyReview()), signoffs: list.filter((s) => s.id !== id) } };
}
