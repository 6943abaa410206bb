// The review's HTML: the review-mode panel, comment threads, sign-off marks, the
// open-comment count for the title block and the revision log printed with the
// sheet. Strings from escaped text; the page (install.ts) places them.

import type { CalcDocument } from '../../runtime/document';
import type { Comparison, ResultLookup } from '../../runtime/review/index';
import { isStale } from '../../runtime/review/index';
import { findingsCount, signedStateText } from '../../runtime/present/record-state';
import type { Comment, Revision, SignOff } from '../../runtime/review/types';
import { escapeHtml } from '../../runtime/present/escape';
import { changeCount, comparisonHtml } from './tables';

/** Document text with its line breaks kept. */
const para = (text: string): string => escapeHtml(text).replace(/\n/g, '<br>');

function sectionTitle(doc: CalcDocument, id: string): string {
  const c = doc.cells.find((x) => x.id === id);
  return c?.kind === 'section' ? c.title : `(section ${id}, deleted)`;
}

export function scopeText(doc: CalcDocument, s: SignOff): string {
  return s.scope === 'document' ? 'the whole record' : `section “${sectionTitle(doc, s.scope)}”`;
}

/**
 * One sign-off as a line: who, when, the state it signed (Rev 0, or Rev 0 + unissued
 * changes), what it was given with, and whether what it covers changed since.
 */
export function signoffLine(doc: CalcDocument, s: SignOff, withScope: boolean, results?: ResultLookup): string {
  const stale = isStale(s, doc, results);
  const signed = s.revision !== undefined ? ` (${escapeHtml(signedStateText(s))})` : '';
  const given = s.exceptions?.length ? ` — with ${escapeHtml(findingsCount(s.exceptions))}` : '';
  const who = `${escapeHtml(s.by)}, ${escapeHtml(s.date)}${signed}${given}`;
  const scope = withScope ? escapeHtml(scopeText(doc, s)) : '';
  return stale
    ? `<span class="rv-signoff rv-stale" data-signoff="${escapeHtml(s.id)}"><span aria-hidden="true">⚠</span> Sign-off${scope ? ` of ${scope}` : ''} STALE: ${who} — changed since signed</span>`
    : `<span class="rv-signoff rv-current" data-signoff="${escapeHtml(s.id)}"><span aria-hidden="true">✓</span> Signed off${scope ? ` ${scope}` : ''}: ${who}</span>`;
}

/** Who is writing: every form carries it, filled in with the name used last. */
export function nameField(name: string): string {
  return `<input name="author" class="rv-author" value="${escapeHtml(name)}" placeholder="Your name" aria-label="Your name" size="12" autocomplete="off" spellcheck="false" required>`;
}

export interface PanelModel {
  doc: CalcDocument;
  latest?: Revision;
  comparison?: Comparison;
  onlyChanged: boolean;
  userName: string;
  today: string;
  results?: ResultLookup;
}

function signoffSection(m: PanelModel): string {
  const list = m.doc.review?.signoffs ?? [];
  const rows = list.map((s) => `<li>${signoffLine(m.doc, s, true, m.results)} <button type="button" class="rv-small" data-rv="withdraw" data-signoff="${
    escapeHtml(s.id)}">Withdraw</button></li>`).join('');
  const sections = m.doc.cells.filter((c) => c.kind === 'section');
  const options = ['<option value="document">The whole record</option>', ...sections.map((c) =>
    `<option value="${escapeHtml(c.id)}">Section: ${escapeHtml(c.kind === 'section' ? c.title : c.id)}</option>`)].join('');
  return `<h3>Sign-offs</h3>${rows ? `<ul class="rv-signoffs">${rows}</ul>` : '<p class="rv-none">Nothing signed off yet.</p>'}
<form class="rv-signoff-form" data-rv-form="signoff"><label>Sign off <select name="scope">${options}</select></label>
<label>by ${nameField(m.userName)}</label> <label>on <input name="date" value="${escapeHtml(m.today)}" size="10" aria-label="Date signed"></label>
<button type="submit">Sign off</button></form>`;
}

/** The review-mode panel above the sheet. */
export function panelHtml(m: PanelModel): string {
  const head = m.latest
    ? `against Rev ${escapeHtml(m.latest.label)}, issued ${escapeHtml(m.latest.date)} by ${escapeHtml(m.latest.by)}`
    : 'nothing issued yet';
  const tools = `<div class="rv-tools">
<label><input type="checkbox" data-rv="only-changed"${m.onlyChanged ? ' checked' : ''}> Only what changed</label>
<button type="button" data-rv="baseline"${m.comparison && m.comparison.inputs.some((r) => r.changed && r.before !== undefined && r.after !== undefined) ? '' : ' disabled'}>Return to baseline</button>
<button type="button" data-rv="compare-file">Compare with a record…</button>
${m.comparison ? `<span class="rv-count">Since Rev ${escapeHtml(m.latest!.label)}: ${escapeHtml(changeCount(m.comparison))}</span>` : ''}</div>`;
  const body = m.comparison
    ? comparisonHtml(m.comparison, `Issued (Rev ${m.latest!.label})`, 'Now', m.onlyChanged)
    : '<p class="rv-none">Issue a revision (Issue… in the toolbar) to freeze a baseline to review against. Comments and sign-offs work without one.</p>';
  return `<header class="rv-head"><h2>Review <span class="rv-against">${head}</span></h2></header>${tools}${body}${signoffSection(m)}`;
}

function commentHtml(c: Comment, userName: string): string {
  const replies = c.replies.map((r) => `<li><header><strong>${escapeHtml(r.author)}</strong> <time>${escapeHtml(r.time)}</time></header><p>${para(r.text)}</p></li>`).join('');
  const open = c.status === 'open';
  return `<article class="rv-comment ${open ? 'rv-open' : 'rv-resolved'}" data-comment="${escapeHtml(c.id)}">
<header><span class="rv-cstatus">${open ? 'OPEN' : 'RESOLVED'}</span> <strong>${escapeHtml(c.author)}</strong> <time>${escapeHtml(c.time)}</time></header>
<p>${para(c.text)}</p>${replies ? `<ul class="rv-replies">${replies}</ul>` : ''}
<form class="rv-reply" data-rv-form="reply" data-comment="${escapeHtml(c.id)}"><textarea name="text" rows="1" placeholder="Reply" aria-label="Reply to this comment"></textarea>
${nameField(userName)} <button type="submit">Reply</button> <button type="button" data-rv="${open ? 'resolve' : 'reopen'}" data-comment="${escapeHtml(c.id)}">${open ? 'Resolve' : 'Reopen'}</button></form>
</article>`;
}

/** The comment bar of a cell: a toggle with the counts, and the thread when it is open. */
export function threadHtml(cellId: string, comments: Comment[], expanded: boolean, reviewing: boolean, userName: string): string {
  const open = comments.filter((c) => c.status === 'open').length;
  if (comments.length === 0 && !reviewing) return '';
  const label = comments.length === 0
    ? 'Comment'
    : `${comments.length} comment${comments.length === 1 ? '' : 's'}${open ? `, ${open} open` : ', all resolved'}`;
  const cls = comments.length === 0 ? ' rv-empty' : open ? ' rv-has-open' : '';
  const toggle = `<button type="button" class="rv-toggle${cls}" data-rv="thread" data-cell="${escapeHtml(cellId)}" aria-expanded="${expanded}">${escapeHtml(label)}</button>`;
  if (!expanded) return toggle;
  return `${toggle}<div class="rv-thread">${comments.map((c) => commentHtml(c, userName)).join('')}
<form class="rv-new-comment" data-rv-form="comment" data-cell="${escapeHtml(cellId)}"><textarea name="text" rows="2" placeholder="Comment on this cell" aria-label="New comment on this cell"></textarea>
${nameField(userName)} <button type="submit">Add comment</button></form></div>`;
}

/** Line under the title block: open comments, and the whole-record sign-offs. */
export function titleExtrasHtml(doc: CalcDocument, results?: ResultLookup): string {
  const comments = doc.review?.comments ?? [];
  const open = comments.filter((c) => c.status === 'open').length;
  const parts: string[] = [];
  if (comments.length) parts.push(`<span class="rv-open-count${open ? ' rv-has-open' : ''}">Open comments: <b>${open}</b> of ${comments.length}</span>`);
  for (const s of doc.review?.signoffs ?? []) if (s.scope === 'document') parts.push(signoffLine(doc, s, true, results));
  return parts.join(' ');
}

function changedText(r: Revision): string {
  if (r.changedInputs.length === 0) return 'none';
  return r.changedInputs.map((c) => {
    const name = escapeHtml(c.name);
    if (c.from === undefined) return `${name}: new, ${escapeHtml(c.to ?? '')}`;
    if (c.to === undefined) return `${name}: removed (was ${escapeHtml(c.from)})`;
    return `${name}: ${escapeHtml(c.from)} → ${escapeHtml(c.to)}`;
  }).join('; ');
}

/** The revision log, printed with the sheet; '' before the first issue. */
export function logHtml(doc: CalcDocument): string {
  const revisions = doc.review?.revisions ?? [];
  if (revisions.length === 0) return '';
  const rows = revisions.map((r, i) => `<tr><td>${escapeHtml(r.label)}</td><td>${escapeHtml(r.date)}</td><td>${escapeHtml(r.by)}</td><td>${
    escapeHtml(r.checkedBy) || '—'}</td><td>${para(r.description) || '—'}</td><td>${i === 0 ? 'First issue' : changedText(r)}</td></tr>`).join('');
  return `<h2 class="rv-log-head">Revision log</h2><table class="rv-log-table"><thead><tr><th>Rev.</th><th>Date</th><th>By</th><th>Checked by</th><th>Description</th><th>Inputs changed from the previous revision</th></tr></thead><tbody>${
    rows}</tbody></table>`;
}
