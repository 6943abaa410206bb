// Checker review in the page (issue 7): review mode (issued vs now, only what changed,
// return to baseline), comments on any cell, sign-offs with stale marks, the issue
// dialog, the revision log printed with the sheet, and comparing with another record.
// Hooked into the page with one call from cells/main.ts.

import './review.css';
import type { CalcDocument } from '../../runtime/document';
import {
  addComment, compare, latestRevision, reply, resolve, returnToBaseline, withdrawSignOff, type ResultLookup,
} from '../../runtime/review/index';
import type { App } from '../app';
import { nowStamp, openCompareDialog, openIssueDialog, today } from './dialogs';
import { appHost, type ReviewHost } from './host';
import { logHtml, panelHtml, signoffLine, threadHtml, titleExtrasHtml } from './render';
import { cellMarks } from './tables';
import { reviewMode } from './mode';
import { openSignoffDialog } from './signoff-dialog';

const NAME_KEY = 'loadtrace-reviewer';

export interface ReviewHooks {
  /** Review mode on or off (the toolbar's Review button). */
  setReviewing(on: boolean): void;
  readonly reviewing: boolean;
  /** Opens a comment thread under a cell. */
  openThread(cellId: string): void;
}

function element(tag: string, id: string, className: string): HTMLElement {
  const el = document.createElement(tag);
  el.id = id;
  el.className = className;
  return el;
}

/** Writes `html` into `el` only when it changed (so a half-typed comment is not wiped). */
function put(el: HTMLElement, html: string): void {
  if (el.dataset.html === html) return;
  el.dataset.html = html;
  el.innerHTML = html;
  el.hidden = html === '';
}

export function installReview(app: App): ReviewHooks {
  return installOn(appHost(app));
}

export function installOn(host: ReviewHost): ReviewHooks {
  let reviewing = false;
  let onlyChanged = false;
  const expanded = new Set<string>();
  let userName = localStorage.getItem(NAME_KEY) ?? '';
  const remember = (name: string): void => {
    if (!name || name === userName) return;
    userName = name;
    localStorage.setItem(NAME_KEY, name);
  };

  // Places on the page: panel under the summary, log after the cells, a line in the title block.
  const panel = element('section', 'review-panel', 'rv-panel');
  panel.setAttribute('aria-label', 'Review');
  panel.hidden = true;
  document.getElementById('summary')?.after(panel);
  const log = element('section', 'revision-log', 'rv-log');
  log.setAttribute('aria-label', 'Revision log');
  document.getElementById('cells')?.after(log);
  const titleLine = element('div', 'review-title-line', 'rv-tb');
  document.getElementById('title-block')?.append(titleLine);

  const toolbarButtons = document.createElement('span');
  toolbarButtons.className = 'rv-buttons';
  toolbarButtons.innerHTML = '<button type="button" data-rv="review" aria-pressed="false" title="Review mode: issued vs now, comments, sign-off">Review</button> '
    + '<button type="button" data-rv="issue" title="Issue the sheet as a revision (freezes the baseline)">Issue…</button> ';
  document.querySelector('.toolbar [data-cmd="print"]')?.before(toolbarButtons);
  const reviewButton = toolbarButtons.querySelector<HTMLButtonElement>('[data-rv="review"]')!;

  const filePicker = document.createElement('input');
  filePicker.id = 'rv-compare-file';
  filePicker.type = 'file';
  filePicker.accept = '.html,.htm,.lt,.txt,text/html,text/plain';
  filePicker.hidden = true;
  document.body.append(filePicker);
  filePicker.addEventListener('change', () => {
    const file = filePicker.files?.[0];
    filePicker.value = '';
    if (file) void file.text().then((t) => openCompareDialog(host, t, file.name));
  });

  /** The marks under one cell: what changed (review mode), sign-offs (sections), comments. */
  const marked = new Map<string, { diff: HTMLElement; talk: HTMLElement }>();
  function markOf(id: string): { diff: HTMLElement; talk: HTMLElement } | undefined {
    const article = host.cellElement(id);
    if (!article) return undefined;
    let m = marked.get(id);
    if (!m || !article.contains(m.diff)) {
      const box = document.createElement('div');
      box.className = 'rv-mark';
      box.addEventListener('dblclick', (e) => e.stopPropagation()); // a double click here is not "edit the cell"
      m = { diff: document.createElement('div'), talk: document.createElement('div') };
      m.diff.className = 'rv-diff';
      m.talk.className = 'rv-talk';
      box.append(m.diff, m.talk);
      article.insertBefore(box, article.querySelector(':scope > .cell-editor-slot'));
      marked.set(id, m);
    }
    return m;
  }

  function render(): void {
    const doc = host.doc();
    const engine = host.engine();
    const latest = latestRevision(doc);
    const cmp = reviewing && latest && engine ? compare(doc, (id) => engine.state(id)) : undefined;
    // Results only once every cell has one: a sign-off is not called stale mid-recompute.
    const results: ResultLookup | undefined = engine && !doc.cells.some((c) => engine.state(c.id)?.status === 'pending')
      ? (id) => engine.state(id) : undefined;
    document.body.classList.toggle('rv-reviewing', reviewing);
    document.body.classList.toggle('rv-only-changed', reviewing && onlyChanged && !!cmp);
    put(panel, reviewing ? panelHtml({ doc, latest, comparison: cmp, onlyChanged, userName, today: today(), results }) : '');
    put(log, logHtml(doc));
    put(titleLine, titleExtrasHtml(doc, results));

    const diffs = cmp && latest ? cellMarks(cmp, latest.label) : new Map<string, string>();
    const changed = new Set(diffs.keys());
    const signoffs = doc.review?.signoffs ?? [];
    const comments = doc.review?.comments ?? [];
    for (const cell of doc.cells) {
      let diff = diffs.get(cell.id) ?? '';
      if (cell.kind === 'section') {
        diff += signoffs.filter((s) => s.scope === cell.id).map((s) => signoffLine(doc, s, false, results)).join(' ');
      }
      const own = comments.filter((c) => c.cellId === cell.id);
      const talk = threadHtml(cell.id, own, expanded.has(cell.id), reviewing, userName);
      if (diff === '' && talk === '' && !marked.has(cell.id)) continue;
      const m = markOf(cell.id);
      if (!m) continue;
      put(m.diff, diff);
      put(m.talk, talk);
      host.cellElement(cell.id)?.classList.toggle('rv-changed', changed.has(cell.id));
    }
    for (const id of marked.keys()) if (!doc.cells.some((c) => c.id === id)) marked.delete(id);
  }

  function apply(next: CalcDocument, message?: string): void {
    host.apply(next);
    if (message) host.status(message);
  }

  function act(action: string, el: HTMLElement): void {
    const doc = host.doc();
    switch (action) {
      case 'review': return setReviewing(!reviewing);
      case 'issue': return openIssueDialog(host, userName, remember);
      case 'thread': {
        const id = el.dataset.cell!;
        if (expanded.has(id)) expanded.delete(id);
        else expanded.add(id);
        render();
        if (expanded.has(id)) host.cellElement(id)?.querySelector<HTMLTextAreaElement>('.rv-new-comment textarea')?.focus();
        return;
      }
      case 'resolve':
      case 'reopen':
        return apply(resolve(doc, el.dataset.comment!, action === 'resolve'), action === 'resolve' ? 'Comment resolved' : 'Comment opened again');
      case 'baseline': {
        const rev = latestRevision(doc);
        return apply(returnToBaseline(doc), rev ? `Inputs returned to their Rev ${rev.label} values` : undefined);
      }
      case 'compare-file': return filePicker.click();
      case 'withdraw': return apply(withdrawSignOff(doc, el.dataset.signoff!), 'Sign-off withdrawn');
    }
  }

  function submit(form: HTMLFormElement): void {
    const f = new FormData(form);
    const get = (k: string) => String(f.get(k) ?? '').trim();
    const author = get('author');
    if (!author) {
      host.status('Write your name first');
      form.querySelector<HTMLInputElement>('[name="author"]')?.focus();
      return;
    }
    remember(author);
    const doc = host.doc();
    try {
      switch (form.dataset.rvForm) {
        case 'comment': {
          if (!get('text')) return;
          return apply(addComment(doc, form.dataset.cell!, { author, time: nowStamp(), text: get('text') }).doc, 'Comment added');
        }
        case 'reply':
          if (!get('text')) return;
          return apply(reply(doc, form.dataset.comment!, { author, time: nowStamp(), text: get('text') }), 'Reply added');
        case 'signoff':
          // Says what is signed and what is not in order before anything is recorded.
          return void openSignoffDialog(host, { scope: get('scope'), by: author, date: get('date') || today() });
      }
    } catch (e) {
      host.status((e as Error).message);
    }
  }

  document.addEventListener('click', (e) => {
    const target = e.target as HTMLElement;
    const goto = target.closest<HTMLElement>('.rv-panel [data-goto], .rv-log [data-goto]');
    if (goto) {
      e.preventDefault();
      host.select(goto.dataset.goto!);
      return;
    }
    const el = target.closest<HTMLElement>('[data-rv]');
    if (!el || el instanceof HTMLInputElement) return;
    act(el.dataset.rv!, el);
  });
  document.addEventListener('change', (e) => {
    const el = e.target as HTMLElement;
    if (el instanceof HTMLInputElement && el.dataset.rv === 'only-changed') {
      onlyChanged = el.checked;
      render();
    }
  });
  document.addEventListener('submit', (e) => {
    const form = (e.target as HTMLElement).closest<HTMLFormElement>('form[data-rv-form]');
    if (!form) return;
    e.preventDefault();
    submit(form);
  });
  document.addEventListener('keydown', (e) => {
    // Ctrl+Enter posts a comment or reply from its text box.
    const t = e.target as HTMLElement;
    if (e.key === 'Enter' && (e.ctrlKey || e.metaKey) && t instanceof HTMLTextAreaElement) {
      const form = t.closest<HTMLFormElement>('form[data-rv-form]');
      if (form) {
        e.preventDefault();
        form.requestSubmit();
      }
    }
  });

  function setReviewing(on: boolean): void {
    reviewing = on;
    reviewMode.set(on);
    reviewButton.setAttribute('aria-pressed', String(on));
    reviewButton.classList.toggle('rv-on', on);
    render();
  }

  host.onChange(render);
  render();
  const hooks: ReviewHooks = {
    setReviewing,
    get reviewing() {
      return reviewing;
    },
    openThread: (id) => {
      expanded.add(id);
      render();
    },
  };
  (window as unknown as { loadtraceReview: ReviewHooks }).loadtraceReview = hooks; // for the end-to-end tests
  return hooks;
}
