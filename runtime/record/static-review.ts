// The review state in the static record: revision log, comments and sign-offs.
// The review model is runtime/review (issue 7); a record is untrusted data, so its
// `review` field is read defensively here and only its texts are shown. Nothing is
// printed when the document has no review.

import type { CalcDocument } from '../document';
import { isStale, type ResultLookup, type SignOff } from '../review/index';
import { findingWord, signedStateText } from '../present/record-state';
import { escapeHtml } from './escape';

type Obj = Record<string, unknown>;

const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null && !Array.isArray(v);
const list = (v: unknown): Obj[] => (Array.isArray(v) ? v.filter(isObj) : []);

/** A field as short text: strings as they are, numbers and yes/no as words, anything else dropped. */
function text(v: unknown, max = 2000): string {
  if (typeof v === 'string') return escapeHtml(v.length > max ? `${v.slice(0, max)}…` : v);
  if (typeof v === 'number' || typeof v === 'boolean') return escapeHtml(String(v));
  return '';
}

function revisionsHtml(revisions: Obj[]): string {
  if (revisions.length === 0) return '';
  const rows = revisions.map((r) => {
    const changed = list(r.changedInputs)
      .map((c) => `${text(c.name ?? c.id)}${c.from !== undefined || c.to !== undefined ? `: ${text(c.from) || '—'} → ${text(c.to) || '—'}` : ''}`)
      .filter(Boolean).join('; ');
    return `<tr><td>${text(r.label)}</td><td>${text(r.date)}</td><td>${text(r.by)}</td><td>${text(r.checkedBy)}</td><td>${
      text(r.description)}</td><td>${changed || '—'}</td></tr>`;
  });
  return `<h3>Revision log</h3><table class="lt-revlog"><thead><tr><th>Rev.</th><th>Date</th><th>By</th><th>Checked</th><th>Description</th><th>Inputs changed</th></tr></thead><tbody>${
    rows.join('')}</tbody></table>`;
}

function commentsHtml(comments: Obj[]): string {
  if (comments.length === 0) return '';
  const open = comments.filter((c) => c.status !== 'resolved').length;
  const items = comments.map((c) => {
    const replies = list(c.replies)
      .map((r) => `<li><span class="lt-who">${text(r.author)}</span> <span class="lt-when">${text(r.time)}</span>: ${text(r.text)}</li>`)
      .join('');
    return `<li class="lt-comment lt-${c.status === 'resolved' ? 'resolved' : 'open'}"><span class="lt-cstat">${
      c.status === 'resolved' ? 'resolved' : 'open'}</span> on <a href="#lt-c-${text(c.cellId)}">${text(c.cellId)}</a> — <span class="lt-who">${
      text(c.author)}</span> <span class="lt-when">${text(c.time)}</span>: ${text(c.text)}${replies ? `<ul>${replies}</ul>` : ''}</li>`;
  });
  return `<h3>Comments <small>${open} open of ${comments.length}</small></h3><ul class="lt-comments">${items.join('')}</ul>`;
}

/** Whether what a sign-off covers changed since it was given; undefined when that cannot be told. */
function stale(s: Obj, doc: CalcDocument, results?: ResultLookup): boolean | undefined {
  if (typeof s.scope !== 'string' || typeof s.covered !== 'string') return undefined;
  try {
    return isStale(s as unknown as SignOff, doc, results);
  } catch {
    return undefined;
  }
}

/** The state a sign-off names: "Rev 0", "Rev 0 + unissued changes", or a draft never issued. */
function signedText(s: Obj): string {
  return text(signedStateText({ revision: typeof s.revision === 'string' ? s.revision : undefined, unissued: s.unissued === true }));
}

/** The NOT OK checks, errors and open comments it was given with, as a short list. */
function exceptionsText(s: Obj): string {
  const list = Array.isArray(s.exceptions) ? s.exceptions.filter(isObj) : [];
  return list.map((x) => `${findingWord(String(x.kind)) ?? text(x.kind)} ${text(x.id)}${x.text ? ` (${text(x.text, 120)})` : ''}`).join('; ') || 'none';
}

function signoffsHtml(signoffs: Obj[], doc: CalcDocument, results?: ResultLookup): string {
  if (signoffs.length === 0) return '';
  const rows = signoffs.map((s) => {
    const st = stale(s, doc, results);
    return `<tr><td>${s.scope === 'document' ? 'whole record' : `section ${text(s.scope)}`}</td><td>${signedText(s)}</td><td>${text(s.by)}</td><td>${
      text(s.date)}</td><td>${exceptionsText(s)}</td><td>${st === undefined ? '—' : st ? '⚠ stale: changed since signed' : '✓ current'}</td></tr>`;
  });
  return `<h3>Sign-offs</h3><table class="lt-signoffs"><thead><tr><th>Covers</th><th>Signed state</th><th>By</th><th>Date</th><th>Signed with</th><th>Now</th></tr></thead><tbody>${
    rows.join('')}</tbody></table>`;
}

/** HTML for the document's review state, or '' when it has none. */
export function reviewHtml(doc: CalcDocument, results?: ResultLookup): string {
  const review = (doc as { review?: unknown }).review;
  if (!isObj(review)) return '';
  const body = revisionsHtml(list(review.revisions)) + signoffsHtml(list(review.signoffs), doc, results) + commentsHtml(list(review.comments));
  return body ? `<section class="lt-review" aria-label="Review">${body}</section>` : '';
}
