// Calc records in the app: Export (button, Ctrl+S), Open a record or .lt file (button,
// Ctrl+O, drag and drop), a record page opening its own embedded document (seal
// checked), and printing a record as calc sheets from the live values.
// Hooked into the page with one call from cells/main.ts.

import type { CalcDocument } from '../../runtime/document';
import { startHistory } from '../../runtime/edit/index';
import { parse } from '../../runtime/format/index';
import {
  DOC_ID, STATIC_CSS, checkEmbedded, exportRecord, pageCss, readDocumentSource, staticHtml,
} from '../../runtime/record/index';
import type { App } from '../app';
import { escapeHtml } from '../../runtime/present/escape';
import { sheetTitle } from '../templates';
import { recordShell } from './shell';
import { callsOf } from '../../runtime/working/calls';

export interface RecordHooks {
  /** On a record page: opens the embedded document and returns true; elsewhere false. */
  openEmbedded(): Promise<boolean>;
  /** Writes the open sheet as a record and offers it as a download. */
  exportNow(): Promise<void>;
  /** The record HTML for the open sheet (for tests and scripts). */
  exportHtml(): Promise<string>;
  /** Opens the text of a record or .lt file as a new sheet. */
  openText(text: string, name: string): Promise<void>;
}

/** A file name from the title block, e.g. "LT-26-101-interior-column-C-4-rev0.html". */
export function recordFileName(doc: CalcDocument): string {
  const m = doc.meta;
  const base = [m.job, m.subject || m.project, m.revision && `rev${m.revision}`]
    .filter(Boolean).join('-')
    .normalize('NFKD').replace(/[^\w.-]+/g, '-').replace(/-+/g, '-').replace(/^-|-$/g, '')
    .slice(0, 100);
  return `${base || 'calc-record'}.html`;
}

function bannerEl(): HTMLElement {
  let el = document.getElementById('lt-record-banner');
  if (!el) {
    el = document.createElement('div');
    el.id = 'lt-record-banner';
    el.className = 'banner lt-record-banner';
    el.setAttribute('role', 'alert');
    const toolbar = document.querySelector('.toolbar');
    if (toolbar) toolbar.after(el);
    else document.body.prepend(el);
  }
  return el;
}

/** A plain message at the top of the page (empty list: none). */
function showProblems(title: string, problems: string[]): void {
  const el = bannerEl();
  el.hidden = problems.length === 0;
  el.innerHTML = problems.length
    ? `<p><strong>${escapeHtml(title)}</strong></p><ul>${problems.map((p) => `<li>${escapeHtml(p)}</li>`).join('')}</ul>
<button type="button" data-record="dismiss">Dismiss</button>`
    : '';
}

export function installRecord(app: App): RecordHooks {
  const isRecordPage = document.getElementById(DOC_ID) !== null;
  let sealWarning: string | undefined;

  async function exportHtml(): Promise<string> {
    const engine = app.engine!;
    await engine.settled();
    const shell = await recordShell();
    return (await exportRecord(app.doc, (id) => engine.state(id), shell, undefined, callsOf(engine))).html;
  }

  async function exportNow(): Promise<void> {
    app.setStatus('Writing the record…');
    try {
      const html = await exportHtml();
      const url = URL.createObjectURL(new Blob([html], { type: 'text/html' }));
      const a = document.createElement('a');
      a.href = url;
      a.download = recordFileName(app.doc);
      document.body.append(a);
      a.click();
      a.remove();
      setTimeout(() => URL.revokeObjectURL(url), 60_000);
      app.setStatus(`Record exported: ${a.download} (${(html.length / 1e6).toFixed(2)} MB)`);
    } catch (e) {
      app.setStatus('');
      showProblems('The record could not be exported.', [(e as Error).message]);
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
    const source = await readDocumentSource(text);
    if (source.record && source.docText === '') {
      showProblems(`${name}: nothing could be opened.`, source.problems);
      return;
    }
    const { doc, errors } = parse(source.docText);
    const problems = [...source.problems, ...errors.slice(0, 8).map((e) => `line ${e.line}: ${e.message}`)];
    if (errors.length > 8) problems.push(`…and ${errors.length - 8} more lines that could not be read`);
    const stem = name.replace(/\.[^.]*$/, '').replace(/[^A-Za-z0-9_.-]+/g, '-').slice(0, 40) || 'file';
    openDoc(doc, `${stem}-${Date.now().toString(36)}`, true);
    showProblems(`${name} was opened, with problems:`, problems);
    app.setStatus(`Opened ${name}${source.record ? (source.sealOk ? ' (record, seal intact)' : ' (record, seal broken)') : ''}`);
  }

  async function openEmbedded(): Promise<boolean> {
    const el = document.getElementById(DOC_ID);
    if (!el) return false;
    performance.mark('loadtrace:record-open');
    const checked = await checkEmbedded(el.textContent ?? '', el.dataset.sha256);
    const { doc, errors } = parse(checked.docText ?? '');
    const problems = [...checked.problems, ...errors.slice(0, 8).map((e) => `line ${e.line}: ${e.message}`)];
    sealWarning = checked.sealOk ? undefined : checked.problems[0];
    openDoc(doc, `record-${(checked.actualDigest ?? '').slice(0, 12)}-${Date.now().toString(36)}`, false);
    performance.mark('loadtrace:record-shown');
    await app.engine!.settled();
    performance.mark('loadtrace:record-computed');
    await app.view.whenShown();
    document.documentElement.classList.add('lt-live');
    performance.mark('loadtrace:record-live'); // every cell computed, those on screen typeset (read by bench:record)
    showProblems('This record may not be what was issued.', problems);
    app.setStatus(checked.sealOk ? 'Record opened as issued: seal intact' : 'Record opened: seal broken (see the message above)');
    return true;
  }

  /** Before printing a record page: the static sheets, redrawn from the live values. */
  function refreshStatic(): void {
    const old = document.getElementById('lt-static');
    const engine = app.engine;
    if (!old || !engine) return;
    const fresh = document.createElement('div');
    fresh.innerHTML = staticHtml(app.doc, (id) => engine.state(id), { warning: sealWarning, calls: callsOf(engine) });
    old.replaceWith(fresh.firstElementChild!);
    const style = document.getElementById('lt-static-style');
    if (style) style.textContent = `${STATIC_CSS}\n${pageCss(app.doc.meta)}`;
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

  const hooks: RecordHooks = { openEmbedded, exportNow, exportHtml, openText };
  (window as unknown as { loadtraceRecord: RecordHooks }).loadtraceRecord = hooks; // for the end-to-end tests and the benchmark
  return hooks;
}
