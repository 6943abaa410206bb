// The two review dialogs: issuing a revision (freezes the baseline) and comparing
// the open sheet with another record (e.g. the previous revision's .html).

import type { CalcDocument } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import { cellsInError, inErrorText, type CellInError } from '../../runtime/graph/in-error';
import { parse } from '../../runtime/format/index';
import { readDocumentSource } from '../../runtime/record/index';
import { compare, diffRecords, issueRevision, latestRevision, nextRevisionLabel } from '../../runtime/review/index';
import { escapeHtml } from '../../runtime/present/escape';
import { parseWithDom } from '../record/dom-reader';
import type { ReviewHost } from './host';
import { changeCount, comparisonHtml } from './tables';

/** A fresh dialog each time (the last one, with its listeners, is dropped). */
function dialog(id: string, label: string): HTMLDialogElement {
  document.getElementById(id)?.remove();
  const d = document.createElement('dialog');
  d.id = id;
  d.className = 'rv-dialog';
  d.setAttribute('aria-label', label);
  document.body.append(d);
  return d;
}

/** Today as YYYY-MM-DD, local time. */
export function today(now = new Date()): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${p(now.getMonth() + 1)}-${p(now.getDate())}`;
}

/** Now as YYYY-MM-DD HH:MM, local time. */
export function nowStamp(now = new Date()): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `${today(now)} ${p(now.getHours())}:${p(now.getMinutes())}`;
}

/** Opens the issue dialog; on Issue the sheet is issued as the next revision. */
export function openIssueDialog(host: ReviewHost, userName: string, remember: (name: string) => void): void {
  const doc = host.doc();
  const engine = host.engine();
  const latest = latestRevision(doc);
  const cmp = latest && engine ? compare(doc, (id) => engine.state(id)) : undefined;
  const since = latest
    ? `Since Rev ${escapeHtml(latest.label)}: ${escapeHtml(cmp ? changeCount(cmp) : '…')}.`
    : 'This is the first issue.';
  const d = dialog('rv-issue', 'Issue a revision');
  d.innerHTML = `<form method="dialog" class="rv-issue-form">
<h2>Issue a revision</h2>
${engine ? inErrorHtml(cellsInError(doc, (id) => engine.state(id))) : ''}
<p class="rv-note">Every input value and every result is frozen as the issued baseline, to review against. ${since}</p>
<div class="rv-grid">
<label>Revision <input name="label" value="${escapeHtml(nextRevisionLabel(doc.review))}" required pattern="[A-Za-z0-9_\\-]+" size="6"></label>
<label>Date <input name="date" value="${escapeHtml(today())}" required size="10"></label>
<label>Issued by <input name="by" value="${escapeHtml(doc.meta.preparedBy || userName)}" required></label>
<label>Checked by <input name="checkedBy" value="${escapeHtml(doc.meta.checkedBy)}"></label>
</div>
<label class="rv-wide">Description <textarea name="description" rows="3" placeholder="What this issue is for, what changed"></textarea></label>
<p class="rv-error" role="alert" hidden></p>
<menu><button type="button" value="cancel" data-close>Cancel</button> <button type="submit" value="issue" class="rv-primary">Issue</button></menu>
</form>`;
  const form = d.querySelector('form')!;
  const error = d.querySelector<HTMLElement>('.rv-error')!;
  d.querySelector('[data-close]')!.addEventListener('click', () => d.close());
  form.addEventListener('submit', async (e) => {
    e.preventDefault();
    const f = new FormData(form);
    const get = (k: string) => String(f.get(k) ?? '').trim();
    const eng = host.engine();
    if (!eng) return;
    await eng.settled();
    try {
      const issued = issueRevision(host.doc(), (id) => eng.state(id), get('by'), get('date'), get('description'), {
        label: get('label'),
        checkedBy: get('checkedBy'),
      });
      remember(get('by'));
      d.close();
      host.apply(issued);
      host.status(`Rev ${get('label')} issued: inputs and results frozen as the baseline`);
    } catch (err) {
      error.hidden = false;
      error.textContent = (err as Error).message;
    }
  });
  d.showModal();
}

/** The cells in error, listed before anything else is asked (issue 15: nothing taken silently). */
function inErrorHtml(list: CellInError[]): string {
  if (list.length === 0) return '';
  const items = list.slice(0, 12).map((c) => `<li><a href="#cell-${escapeHtml(c.id)}">${escapeHtml(c.title)}</a>: ${escapeHtml(c.message)}</li>`);
  return `<div class="rv-in-error" role="alert"><p><strong>${escapeHtml(inErrorText(list))}.</strong> Issuing freezes them as they are.</p><ul>${
    items.join('')}${list.length > 12 ? `<li>… and ${list.length - 12} more</li>` : ''}</ul></div>`;
}

/** Reads another record (.html or .lt) and shows it beside the open sheet. */
export async function openCompareDialog(host: ReviewHost, text: string, fileName: string): Promise<void> {
  const d = dialog('rv-compare', 'Compare two records');
  const source = await readDocumentSource(text, parseWithDom);
  const { doc: other, errors } = parse(source.docText);
  const problems = [...source.problems, ...errors.slice(0, 5).map((e) => `${fileName} line ${e.line}: ${e.message}`)];
  const mine = host.doc();
  const engine = host.engine();
  const theirs = createEngine(other);
  try {
    await Promise.all([theirs.settled(), engine?.settled()]);
    const cmp = diffRecords(
      { doc: mine, results: (id) => engine?.state(id) },
      { doc: other, results: (id) => theirs.state(id) },
    );
    const render = (all: boolean) => comparisonHtml(cmp, 'Open now', fileName, !all);
    d.innerHTML = `<h2>Compare two records</h2>
<p class="rv-note">Open now: <b>${escapeHtml(sheetName(mine, 'this sheet'))}</b>. ${escapeHtml(fileName)}: <b>${escapeHtml(sheetName(other, 'no title'))}</b>${
      source.record ? (source.check?.verified ? ', every part verified against its seal' : ', NOT verified (see below)') : ''}. ${escapeHtml(changeCount(cmp))}.</p>
${problems.length ? `<ul class="rv-problems">${problems.map((p) => `<li>${escapeHtml(p)}</li>`).join('')}</ul>` : ''}
<label><input type="checkbox" data-all> Show unchanged rows too</label>
<div class="rv-compare-body">${render(false)}</div>
<form method="dialog"><menu><button>Close</button></menu></form>`;
    const body = d.querySelector<HTMLElement>('.rv-compare-body')!;
    d.querySelector<HTMLInputElement>('[data-all]')!.addEventListener('change', (e) => {
      body.innerHTML = render((e.target as HTMLInputElement).checked);
    });
    d.addEventListener('click', (e) => {
      const id = (e.target as HTMLElement).closest<HTMLElement>('[data-goto]')?.dataset.goto;
      if (!id) return;
      e.preventDefault();
      d.close();
      host.select(id);
    });
  } finally {
    theirs.dispose();
  }
  d.showModal();
}

/** "LT-26-101 Rev 1, 2026-12-04" or the fallback. */
function sheetName(doc: CalcDocument, fallback: string): string {
  const m = doc.meta;
  const rev = m.revision ? `Rev ${m.revision}` : '';
  return [[m.job, rev].filter(Boolean).join(' '), m.date].filter(Boolean).join(', ') || fallback;
}
