// Entry point: opens the store, picks the sheet to show (the one in the address,
// the last one open, or the demo record), wires keys, dialogs and autosave.

import 'katex/dist/katex.min.css';
import './styles.css';
import './print.css';
import type { CalcDocument } from '../runtime/document';
import { startHistory, type History } from '../runtime/edit/index';
import { App } from './app';
import { Autosave } from './autosave';
import { commandFor, helpHtml, type Command } from './keys';
import { SheetStore, unpackHistory, type SavedSheet } from './store';
import { TabGuard } from './tab-guard';
import { sheetTitle, templateByKey, templates } from './templates';
import { loadSourceEditor } from './source-editor-load';
import { escapeHtml } from '../runtime/present/escape';
import { texHtml } from '../runtime/present/tex-live';
import { installRecord } from './record/install';
import { DOC_ID } from '../runtime/record/index';
import { installReview } from './review/install';
import { installKeepWork, journalSheet, restoreJournal, sheetStored } from './keep-work';
import { showNotice } from './notice';
import { downloadSheet, isStorageFull } from './storage-full';
import { reopenWorkingCopy } from './working-copy';
import { restoreScroll } from './scroll-restore';

const $ = <T extends HTMLElement>(sel: string) => document.querySelector<T>(sel)!;

function keyFromHash(): string | undefined {
  const m = /^#sheet=([A-Za-z0-9_.-]+)/.exec(location.hash);
  return m?.[1];
}

function setHash(key: string): void {
  history.replaceState(null, '', `#sheet=${key}`);
}

/** The first sheet ever opened is the demo record. */
function fromTemplate(name: string): History {
  const t = templateByKey(name) ?? templates()[0];
  if (!t) return startHistory({ meta: { project: '', job: '', subject: 'Empty sheet', preparedBy: '', checkedBy: '', revision: '', date: '' }, cells: [] });
  return startHistory(t.doc);
}

async function boot(): Promise<void> {
  const guard = new TabGuard();
  // IndexedDB takes 20–250 ms to open in a fresh profile: a record page opens its own
  // document meanwhile, and its first save waits for the store.
  const opening = SheetStore.open().catch(() => undefined);
  const recordPage = document.getElementById(DOC_ID) !== null;
  let store = recordPage ? undefined : await opening;
  const banner = $('#banner');
  const autosave = store || recordPage
    ? new Autosave(store ?? opening, guard, {
      saving: () => {
        app.setStatus('Saving…');
        journalSheet(app, autosave);
      },
      conflict: (theirs) => showConflict(theirs),
      saved: () => {
        app.setStatus('Saved');
        if (!autosave?.dirty) sheetStored(app.key);
      },
      failed: (e) => notSaved(e),
    })
    : undefined;
  const app = new App({
    sheet: $('#cells'), summary: $('#summary'), titleBlock: $('#title-block'), status: $('#status'),
    units: $('#btn-units'), undo: $('#btn-undo'), redo: $('#btn-redo'),
  }, autosave);
  (window as unknown as { loadtrace: App }).loadtrace = app; // for the end-to-end tests and the benchmark
  const records = installRecord(app); // calc records (issue 5): export, open, a record page's own document
  installKeepWork(app, autosave); // the journal: unsaved work survives the tab closing (issue 15)

  /** A failed save: said in the status, and when storage is full in a banner offering to export. */
  function notSaved(e: unknown): void {
    app.setStatus(`Not saved: ${String(e)}`);
    if (!isStorageFull(e)) return;
    showNotice('storage-full', 'The browser\'s storage is full, so your latest changes are not being saved (they are kept in this tab). Export your work now, then free some space.', [
      { label: 'Export the record', run: () => void records.exportNow() },
      { label: 'Download the sheet (.lt)', run: () => downloadSheet(app) },
    ], 'alert');
  }
  installReview(app); // checker review (issue 7): review mode, comments, sign-off, revisions, compare

  // The app restores the view itself (after the sheet is typeset); the browser's own restore
  // on reload runs while the page is still short, lands short and would be saved as the view.
  history.scrollRestoration = 'manual';
  // Until the saved view is restored, scrolling is the page loading, not the reader.
  let restoringView = true;
  let openings = 0; // which openKey the restore belongs to, when sheets are opened in quick turn

  async function openKey(key: string): Promise<void> {
    const mine = ++openings;
    restoringView = true;
    const saved = store ? await store.load(key) : undefined;
    const h = saved ? unpackHistory(saved) : fromTemplate(key);
    app.open(key, h, saved?.version ?? 0);
    setHash(key);
    await store?.setSetting('last', key);
    const view = store ? await store.loadView(key) : undefined;
    await app.engine!.settled();
    await app.view.whenRendered();
    const restored = view ? restoreScroll(view.scrollY) : Promise.resolve();
    restoreJournal(app);
    void restored.then(() => { if (mine === openings) restoringView = false; });
  }

  function showConflict(theirs: SavedSheet | undefined): void {
    banner.hidden = false;
    banner.innerHTML = `<p role="alert"><strong>This sheet was changed in another tab${
      theirs ? ` (saved ${escapeHtml(new Date(theirs.savedAt).toLocaleTimeString())})` : ''}.</strong>
      Changes made here are not saved until you choose.</p>
      <button type="button" data-conflict="reload">Load the other tab's version</button>
      <button type="button" data-conflict="fork">Keep this version as a new copy</button>`;
  }

  banner.addEventListener('click', async (e) => {
    const act = (e.target as HTMLElement).dataset.conflict;
    if (!act || !store) return;
    banner.hidden = true;
    banner.innerHTML = '';
    if (act === 'reload') {
      await openKey(app.key);
    } else {
      const key = `${app.key.replace(/-copy\d*$/, '')}-copy${Date.now().toString(36)}`;
      const h = app.history;
      app.open(key, h, 0);
      setHash(key);
      await store.setSetting('last', key);
      autosave!.schedule(h, sheetTitle(h.present, key));
      app.setStatus(`Kept as a new copy (${key})`);
    }
  });

  // Template picker.
  const picker = $<HTMLDialogElement>('#picker');
  // Filled when first opened: reading every template is work a record being opened does not need.
  const openPicker = () => {
    const list = $('#picker-list');
    if (!list.childElementCount) {
      list.innerHTML = templates()
        .map((t) => `<li><button type="button" data-template="${escapeHtml(t.key)}"><strong>${escapeHtml(sheetTitle(t.doc, t.key))}</strong><span>${
          escapeHtml(t.doc.meta.project)} · ${t.doc.cells.length} cells</span></button></li>`)
        .join('');
    }
    picker.showModal();
  };
  /** Starts a new sheet under `key` (from a template or a document handed in) and saves it. */
  async function startSheet(key: string, h: History): Promise<void> {
    await autosave?.flushNow();
    app.open(key, h, 0);
    setHash(key);
    await store?.setSetting('last', key);
    autosave?.schedule(h, sheetTitle(h.present, key));
    window.scrollTo(0, 0);
  }

  picker.addEventListener('click', async (e) => {
    const key = (e.target as HTMLElement).closest<HTMLElement>('[data-template]')?.dataset.template;
    if (!key) return;
    picker.close();
    await startSheet(`${key}-${Date.now().toString(36)}`, fromTemplate(key));
  });

  // Opens a sheet handed in as data (used by the end-to-end tests and the benchmark).
  (window as unknown as { loadtraceOpen: (key: string, doc: CalcDocument) => Promise<void> }).loadtraceOpen =
    (key, doc) => startSheet(key, startHistory(doc));

  const help = $<HTMLDialogElement>('#help');
  $('#help-body').innerHTML = helpHtml();

  const run = (cmd: Command): void => {
    switch (cmd) {
      case 'next': return app.step(1);
      case 'prev': return app.step(-1);
      case 'edit': return app.edit(false);
      case 'editFull': return app.edit(true);
      case 'moveUp': return app.move(-1);
      case 'moveDown': return app.move(1);
      case 'duplicate': return app.duplicate();
      case 'delete': return app.remove();
      case 'addInput': return app.add('input');
      case 'addFormula': return app.add('formula');
      case 'addCheck': return app.add('check');
      case 'addNote': return app.add('note');
      case 'addSection': return app.add('section');
      case 'undo': return app.undo();
      case 'redo': return app.redo();
      case 'units': return app.switchUnits();
      case 'templates': return openPicker();
      case 'print': return window.print();
      case 'summary': return $('#summary').scrollIntoView();
      case 'help': return help.open ? help.close() : help.showModal();
    }
  };

  document.addEventListener('keydown', (e) => {
    if (e.defaultPrevented || (e.target as HTMLElement).closest?.('dialog')) return;
    const t = e.target as HTMLElement;
    const inField = t.matches?.('input, select, textarea, [contenteditable], [contenteditable] *') ?? false;
    const cmd = commandFor(e, inField);
    if (!cmd) {
      if (e.key === 'Escape' && app.editing) app.closeEditor(true);
      return;
    }
    // In a text field the browser's own undo applies to the text being typed.
    if ((cmd === 'undo' || cmd === 'redo') && inField) return;
    e.preventDefault();
    run(cmd);
  });

  // The banner sticks under the toolbar, which takes a second row on narrow windows.
  const toolbar = document.querySelector<HTMLElement>('.toolbar')!;
  const toolbarHeight = () => document.documentElement.style.setProperty('--toolbar-h', `${toolbar.offsetHeight}px`);
  toolbarHeight();
  if (typeof ResizeObserver === 'function') new ResizeObserver(toolbarHeight).observe(toolbar);
  document.querySelector('.toolbar')!.addEventListener('click', (e) => {
    const cmd = (e.target as HTMLElement).closest<HTMLElement>('[data-cmd]')?.dataset.cmd as Command | undefined;
    if (cmd) run(cmd);
  });
  $('#summary').addEventListener('click', (e) => {
    const id = (e.target as HTMLElement).closest<HTMLElement>('[data-goto]')?.dataset.goto;
    if (!id) return;
    e.preventDefault();
    app.view.select(id);
    app.view.element(id)?.scrollIntoView({ block: 'center' });
  });

  let scrollTimer: ReturnType<typeof setTimeout> | undefined;
  window.addEventListener('scroll', () => {
    clearTimeout(scrollTimer);
    if (restoringView) return;
    scrollTimer = setTimeout(() => void store?.saveView(app.key, { scrollY: window.scrollY }), 200);
  }, { passive: true });
  window.addEventListener('pagehide', () => void autosave?.flushNow());
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') void autosave?.flushNow();
  });
  window.addEventListener('hashchange', () => {
    const key = keyFromHash();
    if (key && key !== app.key) void autosave?.flushNow().then(() => openKey(key));
  });

  const cannotSave = () => app.setStatus('This browser cannot save (IndexedDB unavailable): changes last until the page closes.');
  const openedRecord = recordPage && (await records.openEmbedded());
  store ??= await opening;
  if (!store) cannotSave();
  if (openedRecord) {
    if (store) await reopenWorkingCopy(app, store);
    restoreJournal(app);
  }
  if (!openedRecord) await openKey(keyFromHash() ?? (store ? await store.getSetting<string>('last') : undefined) ?? 'demo');
  document.body.dataset.ready = 'true';
  // The source editor (CodeMirror) and, in a record, KaTeX load while the page is idle, so
  // the first edit or equation need not wait.
  const preload = () => {
    void loadSourceEditor().catch(() => undefined);
    texHtml('x');
  };
  if (typeof requestIdleCallback === 'function') requestIdleCallback(preload, { timeout: 3000 });
  else setTimeout(preload, 2000);
}

void boot();
