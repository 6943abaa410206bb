// Comments on cells: a checker marks what is questionable, the preparer replies,
// either resolves. Pure operations on the document; the ids are "cm1", "cm2", ...

import type { CalcDocument } from '../document';
import { EditError } from '../edit/ops';
import { emptyReview, type Comment, type ReviewState } from './types';

export interface Note {
  author: string;
  time: string;
  text: string;
}

function withReview(doc: CalcDocument, patch: Partial<ReviewState>): CalcDocument {
  return { ...doc, review: { ...(doc.review ?? emptyReview()), ...patch } };
}

function freshCommentId(comments: readonly Comment[]): string {
  const used = new Set(comments.map((c) => c.id));
  for (let n = 1; ; n++) if (!used.has(`cm${n}`)) return `cm${n}`;
}

/** A new open comment on cell `cellId`. */
export function addComment(doc: CalcDocument, cellId: string, note: Note): { doc: CalcDocument; id: string } {
  if (!doc.cells.some((c) => c.id === cellId)) throw new EditError(`no cell with id "${cellId}"`);
  if (note.text.trim() === '') throw new EditError('a comment needs some text');
  const comments = doc.review?.comments ?? [];
  const id = freshCommentId(comments);
  const comment: Comment = { id, cellId, author: note.author, time: note.time, text: note.text, status: 'open', replies: [] };
  return { doc: withReview(doc, { comments: [...comments, comment] }), id };
}

function updateComment(doc: CalcDocument, id: string, patch: (c: Comment) => Comment): CalcDocument {
  const comments = doc.review?.comments ?? [];
  const i = comments.findIndex((c) => c.id === id);
  if (i < 0) throw new EditError(`no comment with id "${id}"`);
  const next = patch(comments[i]);
  if (next === comments[i]) return doc;
  const list = comments.slice();
  list[i] = next;
  return withReview(doc, { comments: list });
}

export function reply(doc: CalcDocument, commentId: string, note: Note): CalcDocument {
  if (note.text.trim() === '') throw new EditError('a reply needs some text');
  return updateComment(doc, commentId, (c) => ({ ...c, replies: [...c.replies, { ...note }] }));
}

/** Resolves a comment, or opens it again with `resolved` false. */
export function resolve(doc: CalcDocument, commentId: string, resolved = true): CalcDocument {
  const status = resolved ? 'resolved' : 'open';
  return updateComment(doc, commentId, (c) => (c.status === status ? c : { ...c, status }));
}

/** Comments on one cell, or on all cells, that are still open. */
export function openComments(doc: CalcDocument, cellId?: string): Comment[] {
  return (doc.review?.comments ?? []).filter((c) => c.status === 'open' && (cellId === undefined || c.cellId === cellId));
}
