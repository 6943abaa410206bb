// Calc records in the app: Export (button, Ctrl+S), Open a record or .lt file (button,
// Ctrl+O, drag and drop), a record page opening its own embedded document and checking
// the whole file against its seal, the record line (what the sheet is, what is known of
// its file), and printing a record as calc sheets from the live values.
// Hooked into the page with one call from cells/main.ts.

import './record.css';
import type { CalcDocument } from '../../runtime/document';
import { startHistory } from '../../runtime/edit/index';
import { parse, serialize } from '../../runtime/format/index';
import {
  DOC_ID, RECORD_LINES_CSS, STATIC_CSS, checkEmbedded, exportRecord, pageCss, readDocumentSource, staticHtml, type RecordCheck,
} from '../../runtime/record/index';
import { stateFileTag } from '../../runtime/present/record-state';
import { recordState, type RecordState } from '../../runtime/review/index';
import type { App } from '../app';
import { escapeHtml } from '../../runtime/present/escape';
import { callsOf } from '../../runtime/working/calls';
import { appHost } from '../review/host';
import { reviewMode } from '../review/mode';
import { sheetTitle } from '../templates';
import { parseWithDom } from './dom-reader';
import { lineElement, lineHtml, underToolbar } from './record-line';
import { checkLoadedPage, shellProblem } from './seal-check';
import { pageIsShell, recordShell } from './shell';
import { recordKey } from '../working-copy';

export interface RecordHooks {
  /** On a record page: opens the embedded document and returns true; elsewhere false. */
  openEmbedded(): Promise<boolean>;
  /** Writes the open sheet as a record and offers it as a download. */
  exportNow(): Promise<void>;
  /** The record HTML for the open sheet (for tests and scripts). */
  exportHtml(): Promise<string>;
  /** Opens the text of a record or .lt file as a new sheet. */
  openText(text: string, name: string): Promise<void>;
  /** On a record page: the check of the whole file against its seal, once done. */
  pageCheck(): Promise<RecordCheck | undefined>;
}

/**
 * A file name from the title block and the record's state, e.g.
 * "LT-26-101-interior-column-C-4-rev0.html"; a draft or a working copy from review
 * never takes the issued file's name ("…-review-copy-of-rev0.html").
 */
export function recordFileName(doc: CalcDocument, state: RecordState): string {
  const m = doc.meta;
  const base = [m.job, m.subject || m.project, stateFileTag(state)]
    .filter(Boolean).join('-')
    .normalize('NFKD').replace(/[^\w.-]+/g, '-').replace(/-+/g, '-').replace(/^-|-$/g, '')
    .slice(0, 120);
  return `${base || 'calc-record'}.html`;
}

const bannerEl = (): HTMLElement => underToolbar('lt-record-banner', 'banner lt-record-banner', 'alert');

/** A plain message at the top of the page (empty list: none). */
function showProblems(title: string, problems: string[]): void {
  const el = bannerEl();
  el.hidden = problems.length === 0;
  el.innerHTML = problems.length
    ? `<p><strong>${escapeHtml(title)}</strong></p><ul>${problems.map((p) => `<li>${escapeHtml(p)}</li>`).join('')}</ul>
<button type="button" data-record="dismiss">Dismiss</button>`
    : '';
}

const linesDropped = (n: number, name: string) => (n === 1
  ? `1 line of ${name} could not be read; it is not in this sheet, and a record written now would leave it out. Fix the file and open it again.`
  : `${n} lines of ${name} could not be read; they are not in this sheet, and a record written now would leave them out. Fix the file and open it again.`);

export function installRecord(app: App): RecordHooks {
  const isRecordPage = document.getElementById(DOC_ID) !== null;
  // The app runs: the static page's "the app did not start" message goes (a class on the page, not an edit of the static rendering).
  document.documentElement.classList.add('lt-app-running');
  const host = appHost(app);
  /** Sheets opened from files with lines that could not be read: key → message. */
  const dropped = new Map<string, string>();
  /** Sheets opened from a working copy from review stay one. */
  const reviewCopies = new Set<string>();
  /** The record page's own sheet: its key, the document text as opened, and the check of its file. */
  let opened: { key: string; text: string } | undefined;
  let check: Promise<RecordCheck> | undefined;
  let checked: RecordCheck | undefined;

  const results = () => {
    const engine = app.engine;
    return engine && !app.doc.cells.some((c) => engine.state(c.id)?.status === 'pending') ? (id: string) => engine.state(id) : undefined;
  };
  const currentState = (): RecordState =>
    recordState(app.doc, { results: results(), reviewing: reviewMode.on || reviewCopies.has(app.key) });
  const changedSinceOpen = () => !!opened && (app.key !== opened.key || serialize(app.doc) !== opened.text);

  function drawLine(): void {
    const onRecord = !!opened && app.key === opened.key;
    lineElement().innerHTML = lineHtml({
      state: currentState(),
      seal: onRecord ? (checked ? { kind: 'done', check: checked } : { kind: 'checking' }) : undefined,
      changedSinceOpen: changedSinceOpen(),
    });
  }
  host.onChange(drawLine);
  reviewMode.onChange(drawLine);

  async function exportHtml(): Promise<string> {
    const problem = dropped.get(app.key);
    if (problem) throw new Error(problem);
    const engine = app.engine!;
    await engine.settled();
    // A record page's own code is written into the new record only if the file was checked as written.
    if (isRecordPage && pageIsShell()) {
      const why = shellProblem(await (check ?? checkLoadedPage()));
      if (why) throw new Error(why);
    }
    const shell = await recordShell();
    return (await exportRecord(app.doc, (id) => engine.state(id), shell, { parseHtml: parseWithDom, reviewing: currentState().kind === 'review-copy', calls: callsOf(engine) })).html;
  }

  async function exportNow(): Promise<void> {
    app.setStatus('Writing the record…');
    try {
      const html = await exportHtml();
      const url = URL.createObjectURL(new Blob([html], { type: 'text/html' }));
      const a = document.createElement('a');
      a.href = url;
      a.download = recordFileName(app.doc, currentState());
      document.body.append(a);
      a.click();
      a.remove();
      setTimeout(() => URL.revokeObjectURL(url), 60_000);
      app.setStatus(`Record exported: ${a.download} (${(html.length / 1e6).toFixed(2)} MB)`);
    } catch (e) {
      app.setStatus('Not exported (see the message above)');
      showProblems('The record was not exported.', [(e as Error).message]);
    }
  }

  function openDoc(doc: CalcDocument, key: string, keep: boolean): void {
    app.open(key, startHistory(doc), 0);
    if (keep) {
      history.replaceState(null, '', `#sheet=${key}`);
      app.autosave?.schedule(app.history, sheetTitle(doc, key));
    }
  }

  async function openText(text: string, name: string): Promise<void> {
    const source = await readDocumentSource(text, parseWithDom);
    if (source.record && source.docText === '') {
      showProblems(`${name}: nothing could be opened.`, source.problems);
      return;
    }
    const { doc, errors } = parse(source.docText);
    const problems = [...source.problems, ...errors.slice(0, 8).map((e) => `line ${e.line}: ${e.message}`)];
    if (errors.length > 8) problems.push(`…and ${errors.length - 8} more lines that could not be read`);
    const stem = name.replace(/\.[^.]*$/, '').replace(/[^A-Za-z0-9_.-]+/g, '-').slice(0, 40) || 'file';
    const key = `${stem}-${Date.now().toString(36)}`;
    if (errors.length) dropped.set(key, linesDropped(errors.length, name));
    if (source.check?.manifest?.state.kind === 'review-copy') reviewCopies.add(key);
    openDoc(doc, key, true);
    showProblems(`${name} was opened, with problems:`, problems);
    const what = !source.record ? '' : source.check?.verified ? ' (record: every part verified)' : ' (record: NOT verified, see the message above)';
    app.setStatus(`Opened ${name}${what}`);
  }

  async function openEmbedded(): Promise<boolean> {
    const el = document.getElementById(DOC_ID);
    if (!el) return false;
    performance.mark('loadtrace:record-open');
    const sealed = await checkEmbedded(el.textContent ?? '', el.dataset.sha256);
    const { doc, errors } = parse(sealed.docText ?? '');
    const problems = [...sealed.problems, ...errors.slice(0, 8).map((e) => `line ${e.line}: ${e.message}`)];
    // One key per record document, so a reload reopens the edits saved under it (cells/working-copy.ts).
    const key = recordKey(sealed.actualDigest ?? '');
    if (errors.length) dropped.set(key, linesDropped(errors.length, 'this record'));
    opened = { key, text: serialize(doc) };
    openDoc(doc, key, false);
    performance.mark('loadtrace:record-shown');
    await app.engine!.settled();
    performance.mark('loadtrace:record-computed');
    await app.view.whenShown();
    document.documentElement.classList.add('lt-live');
    performance.mark('loadtrace:record-live'); // every cell computed, those on screen typeset (read by bench:record)
    showProblems('This record may not be what was issued.', problems);
    app.setStatus('Record opened: checking the whole file against its seal…');
    // The whole file is checked once the live app has painted (it reads every part, ~1.3 MB:
    // done first, it held the live app's first frame back). A frame, or 100 ms with none (a hidden tab).
    check = new Promise<void>((done) => {
      requestAnimationFrame(() => setTimeout(done));
      setTimeout(done, 100);
    }).then(checkLoadedPage);
    checked = await check;
    performance.mark('loadtrace:record-checked');
    if (checked.manifest?.state.kind === 'review-copy') reviewCopies.add(key);
    if (!checked.verified) showProblems('This record is not as Loadtrace wrote it.', [...problems, ...checked.problems.filter((p) => !problems.includes(p))]);
    app.setStatus(checked.verified ? 'Record opened: every part of the file verified against its seal' : 'Record opened: NOT verified (see the message above)');
    drawLine();
    return true;
  }

  /** Before printing a record page: the static sheets, redrawn from the live values, saying what they are. */
  function refreshStatic(): void {
    const old = document.getElementById('lt-static');
    const engine = app.engine;
    if (!old || !engine) return;
    const fresh = document.createElement('div');
    fresh.innerHTML = staticHtml(app.doc, (id) => engine.state(id), {
      calls: callsOf(engine),
      warning: checked && !checked.verified ? checked.problems[0] : undefined,
      record: {
        state: currentState(),
        recordDigest: checked?.recordDigest,
        known: checked ? { kind: 'checked', verified: checked.verified, problem: checked.problems[0], changedSince: changedSinceOpen() } : { kind: 'unchecked' },
      },
    });
    old.replaceWith(fresh.firstElementChild!);
    const style = document.getElementById('lt-static-style');
    if (style) style.textContent = `${STATIC_CSS}\n${RECORD_LINES_CSS}\n${pageCss(app.doc.meta)}`;
  }
  if (isRecordPage) window.addEventListener('beforeprint', refreshStatic);

  // Toolbar buttons beside Print, and a hidden file picker.
  const picker = document.createElement('input');
  picker.type = 'file';
  picker.accept = '.html,.htm,.lt,.txt,text/html,text/plain';
  picker.hidden = true;
  document.body.append(picker);
  picker.addEventListener('change', () => {
    const file = picker.files?.[0];
    picker.value = '';
    if (file) void file.text().then((t) => openText(t, file.name));
  });
  const print = document.querySelector('.toolbar [data-cmd="print"]');
  const buttons = document.createElement('span');
  buttons.className = 'lt-record-buttons';
  buttons.innerHTML = '<button type="button" data-record="export" title="Export the calc record: one .html file (Ctrl+S)">Export</button> '
    + '<button type="button" data-record="open" title="Open a record (.html) or a sheet (.lt) (Ctrl+O)">Open…</button> ';
  if (print) print.before(buttons);
  document.addEventListener('click', (e) => {
    const act = (e.target as HTMLElement).closest?.<HTMLElement>('[data-record]')?.dataset.record;
    if (act === 'export') void exportNow();
    else if (act === 'open') picker.click();
    else if (act === 'dismiss') bannerEl().hidden = true;
  });
  document.addEventListener('keydown', (e) => {
    if (!(e.ctrlKey || e.metaKey) || e.altKey || e.shiftKey) return;
    const k = e.key.toLowerCase();
    if (k !== 's' && k !== 'o') return;
    e.preventDefault();
    if (k === 's') void exportNow();
    else picker.click();
  });
  // The help panel is filled by the page after this runs (and may be again): add our keys whenever it is.
  const addHelpRows = () => {
    const keys = document.querySelector('#help-body table.keys');
    if (!keys || keys.querySelector('[data-record-keys]')) return;
    keys.insertAdjacentHTML('beforeend', '<tr data-record-keys><td><kbd>Ctrl + S</kbd></td><td>Export the calc record (.html)</td></tr>'
      + '<tr data-record-keys><td><kbd>Ctrl + O</kbd></td><td>Open a record (.html) or sheet (.lt); or drop the file on the page</td></tr>');
  };
  const helpBody = document.getElementById('help-body');
  if (helpBody) new MutationObserver(addHelpRows).observe(helpBody, { childList: true });
  addHelpRows();

  // Drag and drop a record or sheet anywhere on the page.
  document.addEventListener('dragover', (e) => {
    if (e.dataTransfer?.types.includes('Files')) e.preventDefault();
  });
  document.addEventListener('drop', (e) => {
    const file = e.dataTransfer?.files[0];
    if (!file) return;
    e.preventDefault();
    void file.text().then((t) => openText(t, file.name));
  });

  const hooks: RecordHooks = { openEmbedded, exportNow, exportHtml, openText, pageCheck: async () => (check ? check : undefined) };
  (window as unknown as { loadtraceRecord: RecordHooks }).loadtraceRecord = hooks; // for the end-to-end tests and the benchmark
  return hooks;
}
