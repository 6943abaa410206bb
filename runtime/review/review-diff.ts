// Two records' title blocks and review notes side by side, for `npm run calc -- A --diff B`:
// the title-block fields that differ, comments added, removed, resolved, reopened, edited
// or answered, and sign-offs given, withdrawn, or gone stale (or current again) because
// what they cover changed. Comments and sign-offs are paired by id and what they are on
// (one record over its revisions); a sign-off's state is read against its own record.

import { cellName, type CalcDocument, type DocMeta } from '../document';
import { META_LINES } from '../format/meta';
import { isStale } from './signoff';
import type { Comment, SignOff } from './types';

export interface MetaChange {
  /** The text format's keyword (project, job, subject, prepared, checked, revision, date). */
  key: string;
  field: keyof DocMeta;
  before: string;
  after: string;
}

export interface CommentChange {
  id: string;
  /** The cell it is on, as people call it. */
  on: string;
  author: string;
  text: string;
  /** What happened between the two: added, removed, resolved, reopened, edited, "N replies added", replies changed. */
  changes: string[];
}

export interface SignOffChange {
  id: string;
  /** "the whole record" or the section's title. */
  covers: string;
  by: string;
  date: string;
  /** given, withdrawn, now stale, current again, signed again. */
  change: string;
  /** In the second record: current or stale (absent when withdrawn). */
  state?: 'current' | 'stale';
}

export interface ReviewDiff {
  titleBlock: MetaChange[];
  comments: CommentChange[];
  signoffs: SignOffChange[];
}

/** A cell as people call it: its name, its label, a section's title, else its id. */
function cellCalled(id: string, docs: CalcDocument[]): string {
  for (const d of docs) {
    const c = d.cells.find((x) => x.id === id);
    if (!c) continue;
    return cellName(c) ?? (c.label?.trim() || (c.kind === 'section' ? c.title : '') || c.id);
  }
  return `${id} (no longer in the sheet)`;
}

/**
 * Items keyed so that the same one pairs up across the two records: ids are reused once
 * freed (a withdrawn sign-off's id goes to the next), so the id alone does not say.
 */
const keyed = <T,>(list: readonly T[] | undefined, key: (x: T) => string): Map<string, T> => new Map((list ?? []).map((x) => [key(x), x]));
const commentKey = (c: Comment) => JSON.stringify([c.id, c.cellId, c.author, c.time]);
const signoffKey = (s: SignOff) => JSON.stringify([s.id, s.scope]);

function commentChanges(a: Comment | undefined, b: Comment | undefined): string[] {
  if (!a) return ['added'];
  if (!b) return ['removed'];
  const out: string[] = [];
  if (a.status !== b.status) out.push(b.status === 'resolved' ? 'resolved' : 'reopened');
  if (a.text !== b.text) out.push('edited');
  const added = b.replies.length - a.replies.length;
  if (added > 0) out.push(`${added} repl${added === 1 ? 'y' : 'ies'} added`);
  else if (added < 0 || b.replies.some((r, i) => JSON.stringify(r) !== JSON.stringify(a.replies[i]))) out.push('replies changed');
  return out;
}

function signoffChange(a: SignOff | undefined, b: SignOff | undefined, da: CalcDocument, db: CalcDocument): Omit<SignOffChange, 'covers'> | undefined {
  const s = (b ?? a)!;
  const base = { id: s.id, by: s.by, date: s.date };
  const staleIn = (x: SignOff, d: CalcDocument) => isStale(x, d);
  if (!b) return { ...base, change: 'withdrawn' };
  const state = staleIn(b, db) ? 'stale' : 'current';
  if (!a) return { ...base, change: 'given', state };
  const was = staleIn(a, da) ? 'stale' : 'current';
  if (was === state && a.covered === b.covered && a.by === b.by && a.date === b.date) return undefined;
  return { ...base, change: was !== state ? (state === 'stale' ? 'now stale' : 'current again') : 'signed again', state };
}

/** Everything outside the cells that differs between record `a` and record `b`. */
export function diffReview(a: CalcDocument, b: CalcDocument): ReviewDiff {
  const titleBlock = META_LINES.filter(([, f]) => a.meta[f] !== b.meta[f])
    .map(([key, field]) => ({ key, field, before: a.meta[field], after: b.meta[field] }));

  const ca = keyed(a.review?.comments, commentKey);
  const cb = keyed(b.review?.comments, commentKey);
  const comments: CommentChange[] = [];
  for (const k of new Set([...cb.keys(), ...ca.keys()])) {
    const changes = commentChanges(ca.get(k), cb.get(k));
    if (changes.length === 0) continue;
    const c = (cb.get(k) ?? ca.get(k))!;
    comments.push({ id: c.id, on: cellCalled(c.cellId, [b, a]), author: c.author, text: c.text, changes });
  }

  const sa = keyed(a.review?.signoffs, signoffKey);
  const sb = keyed(b.review?.signoffs, signoffKey);
  const signoffs: SignOffChange[] = [];
  for (const k of new Set([...sb.keys(), ...sa.keys()])) {
    const ch = signoffChange(sa.get(k), sb.get(k), a, b);
    if (!ch) continue;
    const scope = (sb.get(k) ?? sa.get(k))!.scope;
    signoffs.push({ ...ch, covers: scope === 'document' ? 'the whole record' : cellCalled(scope, [b, a]) });
  }
  return { titleBlock, comments, signoffs };
}

export function isEmptyReviewDiff(d: ReviewDiff): boolean {
  return d.titleBlock.length === 0 && d.comments.length === 0 && d.signoffs.length === 0;
}

/** A line a change, under a heading per part; no lines when nothing differs. */
export function reviewDiffLines(d: ReviewDiff, a: string, b: string): { titleBlock: string[]; notes: string[] } {
  const head = (title: string, n: number) => `${title} (${n} differ${n === 1 ? 's' : ''})`;
  const clip = (s: string) => (s.length > 70 ? `${s.slice(0, 69)}…` : s);
  const width = Math.max(0, ...d.titleBlock.map((m) => m.key.length));
  const titleBlock = d.titleBlock.length
    ? [head('Title block', d.titleBlock.length), ...d.titleBlock.map((m) =>
      `  ${m.key.padEnd(width)}  ${a}: ${m.before || '(empty)'}  →  ${b}: ${m.after || '(empty)'}`)]
    : [];
  const notes = [
    ...(d.comments.length ? [head('Comments', d.comments.length), ...d.comments.map((c) =>
      `  ${c.changes.join(', ')}: on ${c.on}, ${c.author}: "${clip(c.text)}"`)] : []),
    ...(d.signoffs.length ? [head('Sign-offs', d.signoffs.length), ...d.signoffs.map((s) =>
      `  ${s.change}: ${s.covers}, by ${s.by} on ${s.date}${s.state && s.change === 'given' ? ` (${s.state})` : ''}`)] : []),
  ];
  return { titleBlock, notes };
}
