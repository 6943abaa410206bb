// The sign-off dialog: before a checker signs, it says exactly what is signed (Rev 0
// as issued, or the working state: Rev 0 + unissued changes, or a draft never issued)
// and lists the NOT OK checks, cells in error and open comments within the scope. If
// the checker goes ahead, they are recorded with the sign-off.
//
// Signing a changed sheet signs the working state under an "unissued changes" label;
// it does not ask to issue first: issuing is the preparer's act (it freezes a new
// baseline and sets the title block's revision), and a checker's what-if values must
// not become a revision just so that they can be signed.

import {
  changedSinceIssue, compare, latestRevision, signOff, signoffFindings, type SignOffException,
} from '../../runtime/review/index';
import { escapeHtml } from '../../runtime/present/escape';
import { findingsCount } from '../../runtime/present/record-state';
import type { ReviewHost } from './host';
import { scopeText } from './render';
import { changeCount } from './tables';

export interface SignoffAsk {
  scope: string;
  by: string;
  date: string;
}

const WORDS: Record<SignOffException['kind'], string> = { 'not-ok': 'NOT OK', error: 'Error', 'open-comment': 'Open comment' };

function findingsHtml(list: SignOffException[]): string {
  if (list.length === 0) return '<p class="rv-none">No check is NOT OK, no cell is in error and no comment is open within what you sign.</p>';
  const items = list.map((x) => `<li data-finding="${escapeHtml(x.kind)}"><b>${WORDS[x.kind]}</b> <code>${escapeHtml(x.id)}</code> ${escapeHtml(x.text)}</li>`).join('');
  return `<p class="rv-warn-head">Within what you sign: ${escapeHtml(findingsCount(list))}. Signing records them with the sign-off.</p><ul class="rv-findings">${items}</ul>`;
}

/** Opens the dialog; on "Sign off" the sign-off is added with what it covers and was given with. */
export async function openSignoffDialog(host: ReviewHost, ask: SignoffAsk): Promise<void> {
  const engine = host.engine();
  if (!engine) return;
  await engine.settled();
  const doc = host.doc();
  const results = (id: string) => engine.state(id);
  const latest = latestRevision(doc);
  const unissued = latest !== undefined && changedSinceIssue(doc, results);
  const cmp = unissued ? compare(doc, results) : undefined;
  const what = !latest
    ? 'a draft that was never issued (no revision to name).'
    : unissued
      ? `<b>the working state: Rev ${escapeHtml(latest.label)} + unissued changes</b> (${escapeHtml(cmp ? changeCount(cmp) : 'changed')} since Rev ${
        escapeHtml(latest.label)}). The sign-off will say so; it does not sign Rev ${escapeHtml(latest.label)} as issued. To sign Rev ${
        escapeHtml(latest.label)}, cancel and use Return to baseline first.`
      : `<b>Rev ${escapeHtml(latest.label)}</b> as issued on ${escapeHtml(latest.date)}.`;
  const found = signoffFindings(doc, results, ask.scope);
  document.getElementById('rv-signoff')?.remove();
  const d = document.createElement('dialog');
  d.id = 'rv-signoff';
  d.className = 'rv-dialog';
  d.setAttribute('aria-label', 'Sign off');
  d.innerHTML = `<form method="dialog">
<h2>Sign off ${escapeHtml(scopeText(doc, { id: '', scope: ask.scope, by: '', date: '', covered: '' }))}</h2>
<p class="rv-note">By ${escapeHtml(ask.by)} on ${escapeHtml(ask.date)}. You sign ${what}</p>
${findingsHtml(found)}
<menu><button type="button" data-close>Cancel</button> <button type="submit" value="sign" class="rv-primary">${found.length ? 'Sign off with these' : 'Sign off'}</button></menu>
</form>`;
  document.body.append(d);
  d.querySelector('[data-close]')!.addEventListener('click', () => d.close());
  d.querySelector('form')!.addEventListener('submit', (e) => {
    e.preventDefault();
    try {
      const signed = signOff(host.doc(), { scope: ask.scope, by: ask.by, date: ask.date, results });
      d.close();
      host.apply(signed.doc);
      host.status(unissued ? 'Signed off the working state (unissued changes)' : 'Signed off');
    } catch (err) {
      host.status((err as Error).message);
      d.close();
    }
  });
  d.showModal();
}
