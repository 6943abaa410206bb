// The sheet on the page: one <article> per cell, rendered from the cell's view.
// Only cells whose state, content or number changed are rendered again, and a cell
// is first typeset when it comes near the viewport: until then it shows its source
// text (readable, searchable), so a long sheet opens quickly and stays small in
// memory. Printing typesets every cell.

import DOMPurify from 'dompurify';
import { cellName, type CalcDocument, type Cell } from '../runtime/document';
import type { Engine } from '../runtime/engine-types';
import { cellSource } from '../runtime/edit/index';
import { samePlaces } from '../runtime/graph/doc-diff';
import { describe } from '../runtime/kinds/index';
import type { ViewContext } from '../runtime/present/cell-frame';
import { escapeHtml } from '../runtime/present/escape';
import { numberCells } from '../runtime/present/numbering';
import { inSummary, writeSummary } from './summary';
import { writeCellContent } from './step-patch';
import { LaterBatches } from './later-batches';
import { listenToValueFields } from './value-fields';
import { RunTraces } from './run-trace';
import { WorkingFolds } from './working';

export interface SheetEvents {
  commitValue(id: string, value: string, at?: { row: number; col: number }): void;
  open(id: string): void;
  select(id: string): void;
}

interface Slot {
  cell: Cell;
  el: HTMLElement;
  content: HTMLElement;
  html?: string;
  number: string;
  /** Within NEAR of the viewport: typeset now rather than later. */
  near: boolean;
  /** In the viewport itself: typeset before the cells just beyond it. */
  onScreen?: boolean;
  /** Changed while far from view: typeset when it comes near. */
  stale: boolean;
}

/** How far beyond the viewport cells are typeset ahead of scrolling. */
const NEAR = '1200px 0px';
/** From this many cells on, off-screen cells also skip layout and paint (content-visibility). */
const LONG_SHEET = 300;
const STATUS_CLASSES = ['st-ok', 'st-fail', 'st-error', 'st-pending', 'st-plain'];

export class SheetView {
  private slots = new Map<string, Slot>();
  private doc: CalcDocument = { meta: {} as CalcDocument['meta'], cells: [] };
  private engine?: Engine;
  private numbers = new Map<string, string>();
  private byName = new Map<string, string>();
  /** name → ids of the cells whose hand calc shows that name's value. */
  private readers = new Map<string, Set<string>>();
  private restoring = false;
  /** Resolves when an opened sheet has values (cells are typeset from then on). */
  private opening: Promise<void> = Promise.resolve();
  private ready = false;
  private nearby?: IntersectionObserver;
  /** Cells near but not on screen, typeset after the screen itself has painted. */
  private readonly ahead = new LaterBatches((id) => {
    const s = this.slots.get(id);
    if (s?.near && (s.html === undefined || s.stale)) this.renderCell(id);
  });
  selected?: string;

  constructor(
    private readonly host: HTMLElement,
    private readonly summaryHost: HTMLElement,
    private readonly events: SheetEvents,
  ) {
    listenToValueFields(host, {
      inputOf: (t) => {
        const cell = this.slots.get(this.cellIdOf(t) ?? '')?.cell;
        if (cell?.kind === 'input') return cell;
        const data = (t as HTMLElement | null)?.dataset;
        if (cell?.kind !== 'table' || data?.row === undefined || data.col === undefined) return undefined;
        const at = { row: Number(data.row), col: Number(data.col) };
        return { id: cell.id, value: cell.rows[at.row]?.[at.col] ?? '', at };
      },
      commitValue: (place, value) => events.commitValue(place.id, value, place.at),
      restoring: () => this.restoring,
    });
    host.addEventListener('click', (e) => this.onClick(e));
    // Whatever has the focus is the selected cell (Tab, Esc out of a field, a click).
    host.addEventListener('focusin', (e) => {
      const id = this.cellIdOf(e.target);
      if (id && id !== this.selected && !(e.target as HTMLElement).closest('.cell-editor')) events.select(id);
    });
    host.addEventListener('dblclick', (e) => {
      const id = this.cellIdOf(e.target);
      if (id && !(e.target as HTMLElement).closest('.value-field, .cell-editor')) events.open(id);
    });
    // A printed sheet shows every cell typeset.
    window.addEventListener('beforeprint', () => this.renderAll());
    this.folds = new WorkingFolds(host, () => this.engine, () => this.doc);
    this.traces = new RunTraces(host, () => this.engine, () => this.doc);
  }

  /** The open row traces of runs (cells/run-trace.ts). */
  readonly traces: RunTraces;

  /** The working folds of library calls (cells/working.ts). */
  private readonly folds: WorkingFolds;

  /** Shows a whole new sheet (on open). */
  show(doc: CalcDocument, engine: Engine): void {
    this.engine = engine;
    this.nearby?.disconnect();
    this.nearby = typeof IntersectionObserver === 'function'
      ? new IntersectionObserver((entries) => this.onNear(entries), { rootMargin: NEAR })
      : undefined;
    this.host.textContent = '';
    this.slots.clear();
    this.readers.clear();
    this.doc = { meta: doc.meta, cells: [] };
    this.ready = false;
    this.sync(doc);
  }

  /** Typesets every cell not yet typeset or out of date (before printing). */
  renderAll(): void {
    for (const [id, slot] of this.slots) if (slot.html === undefined || slot.stale) this.renderCell(id, true);
  }

  /** Brings the page in line with a new version of the sheet. */
  sync(doc: CalcDocument): void {
    const prev = this.doc;
    this.doc = doc;
    if (prev.cells.length > 0 && samePlaces(prev.cells, doc.cells) !== undefined) {
      this.syncContent(doc);
      return;
    }
    this.numbers = numberCells(doc.cells);
    this.host.classList.toggle('long-sheet', doc.cells.length > LONG_SHEET);
    this.byName = new Map(doc.cells.flatMap((c) => (cellName(c) ? [[cellName(c)!, c.id] as const] : [])));
    const live = new Set(doc.cells.map((c) => c.id));
    for (const [id, slot] of this.slots) {
      if (!live.has(id)) {
        this.nearby?.unobserve(slot.el);
        slot.el.remove();
        this.slots.delete(id);
      }
    }
    const fresh: string[] = [];
    if (this.slots.size === 0) {
      // Opening: every placeholder in one pass of the HTML parser, far quicker than one by one.
      this.host.innerHTML = doc.cells.map(placeholderHtml).join('');
      let el = this.host.firstElementChild as HTMLElement | null;
      for (const cell of doc.cells) {
        const slot: Slot = {
          cell, el: el!, content: el!.firstElementChild as HTMLElement, number: this.numbers.get(cell.id) ?? '', near: false, stale: true,
        };
        this.nearby?.observe(slot.el);
        this.slots.set(cell.id, slot);
        fresh.push(cell.id);
        el = el!.nextElementSibling as HTMLElement | null;
      }
    }
    let before: Element | null = null;
    // Walk backwards so each element is placed before its successor.
    for (let i = doc.cells.length - 1; i >= 0; i--) {
      const cell = doc.cells[i];
      let slot = this.slots.get(cell.id);
      if (!slot) {
        slot = this.newSlot(cell);
        this.slots.set(cell.id, slot);
        fresh.push(cell.id);
        this.nearby?.observe(slot.el);
      }
      if (slot.el.nextElementSibling !== before || slot.el.parentElement !== this.host) this.host.insertBefore(slot.el, before);
      before = slot.el;
    }
    const dirty: string[] = [];
    for (const cell of doc.cells) {
      const slot = this.slots.get(cell.id)!;
      const number = this.numbers.get(cell.id) ?? '';
      if (slot.cell !== cell || slot.number !== number) {
        slot.cell = cell;
        slot.number = number;
        dirty.push(cell.id);
      }
    }
    if (prev.cells.length === 0 && this.engine) {
      // A sheet just opened: typeset once the engine has values, not twice (pending, then computed).
      const engine = this.engine;
      this.opening = engine.settled().then(() => {
        if (this.engine !== engine) return;
        this.ready = true;
        for (const [id, slot] of this.slots) if (slot.near) this.renderNear(id, slot);
        this.renderSummary();
      });
      return;
    }
    // New cells (added, duplicated) are typeset at once: the person is looking at them.
    fresh.forEach((id) => this.renderCell(id, true));
    dirty.forEach((id) => this.renderCell(id));
    this.renderSummary();
  }

  /** The usual edit: same cells in the same order, a few of them changed. Numbers stay. */
  private syncContent(doc: CalcDocument): void {
    let checks = false;
    for (const cell of doc.cells) {
      const slot = this.slots.get(cell.id)!;
      if (slot.cell === cell) continue;
      const oldName = cellName(slot.cell);
      const name = cellName(cell);
      if (oldName !== name) {
        if (oldName && this.byName.get(oldName) === cell.id) this.byName.delete(oldName);
        if (name) this.byName.set(name, cell.id);
      }
      slot.cell = cell;
      checks ||= inSummary(cell);
      this.renderCell(cell.id);
    }
    if (checks) this.renderSummary();
  }

  /** Renders the cells whose engine state changed, and the hand calcs that show their values. */
  refresh(changed: readonly string[]): void {
    const todo = new Set<string>();
    for (const id of changed) {
      todo.add(id);
      const name = this.slots.get(id) && cellName(this.slots.get(id)!.cell);
      if (name) this.readers.get(name)?.forEach((r) => todo.add(r));
    }
    for (const id of todo) this.renderCell(id);
    if (changed.some((id) => inSummary(this.slots.get(id)?.cell))) this.renderSummary();
  }

  /** Marks pending cells while the engine takes long (called after ~100 ms). */
  setComputing(on: boolean): void {
    this.host.classList.toggle('computing', on);
  }

  element(id: string): HTMLElement | undefined {
    return this.slots.get(id)?.el;
  }

  /** The article's slot for an editor panel (kept when the cell is re-rendered). */
  editorSlot(id: string): HTMLElement | undefined {
    return this.slots.get(id)?.el.querySelector<HTMLElement>(':scope > .cell-editor-slot') ?? undefined;
  }

  select(id: string | undefined, focus = true): void {
    if (this.selected) this.slots.get(this.selected)?.el.classList.remove('selected');
    this.selected = id;
    const el = id ? this.slots.get(id)?.el : undefined;
    if (!el) return;
    const slot = this.slots.get(id!)!;
    if (slot.html === undefined || slot.stale) this.renderCell(id!, true); // so Enter finds its field at once
    el.classList.add('selected');
    if (focus && !el.contains(document.activeElement)) el.focus({ preventScroll: true });
    el.scrollIntoView({ block: 'nearest' });
  }

  /** Ids in sheet order. */
  order(): string[] {
    return this.doc.cells.map((c) => c.id);
  }

  /** Resolves when the cells near the viewport are typeset (for scroll restore, tests, benchmarks). */
  async whenRendered(): Promise<void> {
    await this.whenTypeset((s) => s.near);
  }

  /** Resolves when the cells in the viewport are typeset (those just beyond follow a frame later). */
  async whenShown(): Promise<void> {
    await this.whenTypeset((s) => s.near && s.onScreen === true);
  }

  private async whenTypeset(which: (s: Slot) => boolean): Promise<void> {
    await this.opening;
    const frame = () => new Promise<void>((r) => requestAnimationFrame(() => setTimeout(r, 0)));
    await frame(); // the observer reports what is near after a layout
    for (let i = 0; i < 120 && [...this.slots.values()].some((s) => which(s) && (s.html === undefined || s.stale)); i++) await frame();
  }

  private onNear(entries: IntersectionObserverEntry[]): void {
    for (const e of entries) {
      const id = (e.target as HTMLElement).dataset.id;
      const slot = id ? this.slots.get(id) : undefined;
      if (!slot) continue;
      slot.near = e.isIntersecting;
      slot.onScreen = e.isIntersecting && e.boundingClientRect.bottom > 0 && e.boundingClientRect.top < window.innerHeight;
      if (slot.near && (slot.html === undefined || slot.stale)) this.renderNear(id!, slot);
    }
  }

  /** On screen: typeset now. Just beyond it: after the screen has painted, a few cells a task. */
  private renderNear(id: string, slot: Slot): void {
    if (slot.onScreen || !this.ready) {
      this.renderCell(id);
      return;
    }
    this.ahead.add(id);
  }

  private newSlot(cell: Cell): Slot {
    const t = document.createElement('template');
    t.innerHTML = placeholderHtml(cell);
    const el = t.content.firstElementChild as HTMLElement;
    return { cell, el, content: el.firstElementChild as HTMLElement, number: this.numbers.get(cell.id) ?? '', near: false, stale: true };
  }

  private context(id: string): ViewContext {
    const engine = this.engine!;
    return {
      state: (i) => engine.state(i),
      scope: { isCell: (n) => this.byName.has(n), state: (n) => engine.state(this.byName.get(n) ?? '') },
      number: this.numbers.get(id) ?? '',
    };
  }

  /** Typesets a cell now when it is near the viewport (or `force`), else marks it for later. */
  private renderCell(id: string, force = false): void {
    const slot = this.slots.get(id);
    if (!slot || !this.engine) return;
    // Never typeset yet and far from view (or the engine still opening): later. A cell
    // once typeset is kept current wherever it is, so what the page shows is never stale.
    const later = !this.ready || (slot.html === undefined && !slot.near);
    if (!force && this.nearby && later) {
      slot.stale = true;
      return;
    }
    slot.stale = false;
    const state = this.engine.state(id);
    for (const name of state?.reads ?? []) {
      let set = this.readers.get(name);
      if (!set) this.readers.set(name, (set = new Set()));
      set.add(id);
    }
    const view = describe(slot.cell.kind).live(slot.cell, this.context(id));
    let html = view.html;
    if (view.fromMarkdown) {
      // Markdown comes from the document: one more pass, so no markup a sheet carries can run.
      html = DOMPurify.sanitize(html, { ALLOWED_URI_REGEXP: /^(?:https?:|#)/i, ADD_ATTR: ['target'] });
    }
    // Only this view's own classes change; others (selection, review marks) stay.
    slot.el.classList.remove('unrendered', ...STATUS_CLASSES.filter((c) => c !== `st-${view.status}`));
    slot.el.classList.add(`st-${view.status}`);
    if (html === slot.html) return;
    slot.html = html;
    this.writeContent(slot, html);
    this.folds.restore(slot.el, id);
    this.traces.restore(slot.el, id);
  }

  /**
   * Replaces the cell's content. A focused value field is kept in place (the parts around
   * it are replaced), so the person typing keeps the focus and the page is not laid out
   * again to restore it.
   */
  private writeContent(slot: Slot, html: string): void {
    writeCellContent(slot.content, html, () => {
      this.restoring = true; // a field swapped for another kind: let it go without committing
      slot.content.innerHTML = html;
      this.restoring = false;
    });
  }

  private renderSummary(): void {
    const engine = this.engine;
    if (engine) writeSummary(this.summaryHost, this.doc.cells, (id) => engine.state(id), this.numbers);
  }

  private cellIdOf(target: EventTarget | null): string | undefined {
    return (target as HTMLElement | null)?.closest?.<HTMLElement>('article.cell')?.dataset.id;
  }

  private onClick(e: MouseEvent): void {
    const target = e.target as HTMLElement;
    const id = this.cellIdOf(target);
    if (!id) return;
    // The first click selects; a click on the math of the selected cell opens its editor.
    if (id !== this.selected) this.events.select(id);
    else if (target.closest('[data-act="open"]') && !target.closest('.cell-editor')) this.events.open(id);
  }
}

/** A cell before it is typeset: its source as text, readable and searchable at once. */
function placeholderHtml(cell: Cell): string {
  const id = escapeHtml(cell.id);
  return `<article class="cell kind-${cell.kind} unrendered" id="cell-${id}" data-id="${id}" tabindex="-1"><div class="cell-content">${
    escapeHtml(cellSource(cell))}</div><div class="cell-editor-slot"></div></article>`;
}
