// The review part of a file: `issue`, `remark`, `reply` and `signoff` blocks after
// the cells (FORMAT.md, "Review"). The table of block formats, the collector the
// reader fills, and the writer.

import type { Comment, ReviewState, Revision, SignOff } from '../../review/types';
import { encodeNoteLine, encodeValue, isCellId } from '../quote';
import type { ReviewBlockFormat } from './block';
import { issueFormat, newRevision } from './issue';
import { readRemarkTail, remarkFormat, replyFormat } from './remark';
import { readSignoffTail, signoffFormat } from './signoff';

/* eslint-disable @typescript-eslint/no-explicit-any */
export const REVIEW_FORMATS: Record<string, ReviewBlockFormat<any>> = {
  issue: issueFormat,
  remark: remarkFormat,
  reply: replyFormat,
  signoff: signoffFormat,
};

export const REVIEW_KEYWORDS = Object.keys(REVIEW_FORMATS);

export function reviewBlockFormat(word: string): ReviewBlockFormat<any> | undefined {
  return Object.prototype.hasOwnProperty.call(REVIEW_FORMATS, word) ? REVIEW_FORMATS[word] : undefined;
}

export type Opened = { ok: true; target: object; keep(): void } | { ok: false; message: string; column: number };

export interface BlockHead {
  keyword: string;
  id: string;
  idColumn: number;
  tail: string;
  tailColumn: number;
  line: number;
}

/** Gathers the review blocks as the reader meets them. */
export class ReviewCollector {
  private readonly revisions: Revision[] = [];
  private readonly comments: Comment[] = [];
  private readonly signoffs: SignOff[] = [];
  /** Per keyword: id → line it was first used on. */
  private readonly lines = new Map<string, Map<string, number>>();
  private readonly remarks = new Map<string, Comment>();

  private claim(h: BlockHead, what: string): Opened | undefined {
    let used = this.lines.get(h.keyword);
    if (!used) this.lines.set(h.keyword, (used = new Map()));
    const first = used.get(h.id);
    if (first !== undefined) return { ok: false, message: `duplicate ${what} "${h.id}" (first on line ${first})`, column: h.idColumn };
    used.set(h.id, h.line);
    return undefined;
  }

  private noTail(h: BlockHead): Opened | undefined {
    return h.tail === '' ? undefined : { ok: false, message: `nothing may follow the id of ${h.keyword === 'issue' ? 'an' : 'a'} ${h.keyword}`, column: h.tailColumn };
  }

  open(h: BlockHead): Opened {
    switch (h.keyword) {
      case 'issue': {
        const fault = this.noTail(h) ?? this.claim(h, 'revision');
        if (fault) return fault;
        const rev = newRevision(h.id);
        return { ok: true, target: rev, keep: () => this.revisions.push(rev) };
      }
      case 'remark': {
        const cellId = readRemarkTail(h.tail);
        if (cellId === undefined) return { ok: false, message: 'expected the id of the cell commented on after the remark id', column: h.tailColumn };
        const fault = this.claim(h, 'remark id');
        if (fault) return fault;
        const c: Comment = { id: h.id, cellId, author: '', time: '', text: '', status: 'open', replies: [] };
        return { ok: true, target: c, keep: () => {
          this.comments.push(c);
          this.remarks.set(c.id, c);
        } };
      }
      case 'reply': {
        const fault = this.noTail(h);
        if (fault) return fault;
        const to = this.remarks.get(h.id);
        if (!to) return { ok: false, message: `reply to remark "${h.id}", which is not written before it`, column: h.idColumn };
        const r = { author: '', time: '', text: '' };
        return { ok: true, target: r, keep: () => to.replies.push(r) };
      }
      default: {
        const scope = readSignoffTail(h.tail);
        if (scope === undefined) return { ok: false, message: 'expected "record" or "section <section id>" after the sign-off id', column: h.tailColumn };
        const fault = this.claim(h, 'sign-off id');
        if (fault) return fault;
        const s: SignOff = { id: h.id, scope, by: '', date: '', covered: '' };
        return { ok: true, target: s, keep: () => this.signoffs.push(s) };
      }
    }
  }

  /** The review read, or undefined when the file has none (an empty review is no review). */
  result(): ReviewState | undefined {
    if (!this.revisions.length && !this.comments.length && !this.signoffs.length) return undefined;
    return { revisions: this.revisions, comments: this.comments, signoffs: this.signoffs };
  }
}

function block<T>(format: ReviewBlockFormat<T>, id: string, item: T): string[] {
  if (!isCellId(id)) throw new Error(`${format.keyword} id ${JSON.stringify(id)} is not [A-Za-z0-9_-]+`);
  const head = format.writeHeader(item);
  const out = [head === '' ? `${format.keyword} ${id}` : `${format.keyword} ${id}  ${head}`];
  const width = Math.max(0, ...format.attrs.map((a) => a.key.length)) + 1;
  for (const [key, value] of format.writeAttrs(item)) out.push(`  ${key.padEnd(width)}${encodeValue(value)}`);
  for (const line of format.text?.write(item) ?? []) out.push(encodeNoteLine(line));
  return out;
}

/** The review's blocks, each as its lines: issues, then remarks each followed by its replies, then sign-offs. */
export function reviewBlocks(review: ReviewState | undefined): string[][] {
  if (!review) return [];
  return [
    ...review.revisions.map((r) => block(issueFormat, r.label, r)),
    ...review.comments.flatMap((c) => [block(remarkFormat, c.id, c), ...c.replies.map((r) => block(replyFormat, c.id, r))]),
    ...review.signoffs.map((s) => block(signoffFormat, s.id, s)),
  ];
}
