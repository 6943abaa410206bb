// The page shell: one open sheet with its engine, undo history, view, editors and
// autosave. Every edit is a pure operation on the sheet, recorded in the history.

import { setTableValue } from '../runtime/edit/table-ops';
import type { CalcDocument, CellKind, DocMeta } from '../runtime/document';
import { cellName } from '../runtime/document';
import {
  EditError, SourceError, addCell, applySource, canRedo, canUndo, cellSource, deleteCell, duplicateCell, moveCell, record, redo,
  setCellFields, setInputValueKeepUnit, setMeta, startHistory, undo, type CellFields, type History,
} from '../runtime/edit/index';
import { createEngine } from '../runtime/engine';
import type { Engine } from '../runtime/engine-types';
import { sheetSystem, switchSystem, type UnitMemory } from '../runtime/units/systems';
import { Autosave } from './autosave';
import { CellEditor } from './cell-editor';
import { ComputingState } from './computing';
import { SheetView } from './sheet-view';
import { sheetTitle } from './templates';
import { TitleBlock } from './title-block';
import { functionEntries, unitNames, type Vocabulary } from './vocabulary';

export interface AppElements {
  sheet: HTMLElement;
  summary: HTMLElement;
  titleBlock: HTMLElement;
  status: HTMLElement;
  units: HTMLButtonElement;
  undo: HTMLButtonElement;
  redo: HTMLButtonElement;
}

/** Text typed in a field and not yet applied: an input's value, or a cell's source. */
export interface Draft {
  cellId: string;
  kind: 'value' | 'source';
  text: string;
}

export class App {
  key = '';
  history: History = startHistory({ meta: {} as DocMeta, cells: [] });
  engine?: Engine;
  readonly view: SheetView;
  private readonly title: TitleBlock;
  private editor?: CellEditor;
  private unitMemory: UnitMemory = {};
  private unsubscribe?: () => void;
  private readonly computing: ComputingState;
  /** Set while an edit made in the open editor is applied. */
  private fromEditor = false;
  /** Set by the page for tests and benchmarks: called after every re-render of engine changes. */
  onRendered?: (changed: readonly string[]) => void;

  constructor(private readonly el: AppElements, readonly autosave: Autosave | undefined) {
    this.view = new SheetView(el.sheet, el.summary, {
      commitValue: (id, value, at) => this.apply(at ? setTableValue(this.doc, id, at.row, at.col, value) : setInputValueKeepUnit(this.doc, id, value),
        at ? `value:${id}:${at.row}:${at.col}` : `value:${id}`),
      open: (id) => this.openEditor(id),
      select: (id) => this.view.select(id, false),
    });
    this.title = new TitleBlock(el.titleBlock, (key, value) => this.apply(setMeta(this.doc, key, value), `meta:${key}`));
    this.computing = new ComputingState({
      said: () => el.status.textContent ?? '',
      say: (text) => {
        el.status.textContent = text;
        el.status.title = text; // the toolbar may cut a long message short
      },
      mark: (on) => this.view.setComputing(on),
    });
  }

  get doc(): CalcDocument {
    return this.history.present;
  }

  /** Opens a sheet (from the store or a template) with its history and saved version. */
  open(key: string, history: History, version: number): void {
    this.closeEditor(false);
    this.key = key;
    this.history = history;
    this.unitMemory = {};
    this.unsubscribe?.();
    this.engine?.dispose();
    const engine = createEngine(this.doc);
    this.engine = engine;
    this.unsubscribe = engine.subscribe((changed) => this.onEngine(changed));
    this.view.show(this.doc, engine);
    this.title.show(this.doc.meta);
    this.autosave?.follow(key, version);
    this.watchComputing();
    this.updateChrome();
  }

  /** Records a new version of the sheet and runs it. `key` merges quick successive edits of one field. */
  apply(doc: CalcDocument, key?: string): void {
    if (doc === this.doc) return;
    this.history = record(this.history, doc, key);
    this.run();
  }

  undo(): void {
    if (!canUndo(this.history)) return;
    this.history = undo(this.history);
    this.run();
  }

  redo(): void {
    if (!canRedo(this.history)) return;
    this.history = redo(this.history);
    this.run();
  }

  /** Pushes the present sheet to the engine, the view, the editor and the store. */
  private run(): void {
    this.engine!.update(this.doc);
    this.view.sync(this.doc);
    this.title.show(this.doc.meta);
    // The open editor already shows what it applied; only other changes (undo) reach it.
    if (this.editor && !this.fromEditor) {
      const cell = this.doc.cells.find((c) => c.id === this.editor!.cell.id);
      if (cell) this.editor.reload(cell);
      else this.closeEditor(false);
    }
    this.watchComputing();
    this.updateChrome();
    this.autosave?.schedule(this.history, sheetTitle(this.doc, this.key));
  }

  private onEngine(changed: string[]): void {
    this.view.refresh(changed);
    if (this.editor && changed.includes(this.editor.cell.id)) {
      const cell = this.doc.cells.find((c) => c.id === this.editor!.cell.id);
      if (cell) this.editor.showState(this.engine!.state(cell.id), cellSource(cell));
    }
    this.onRendered?.(changed);
  }

  /** Shows "computing" only when the engine has not settled within about 100 ms (computing.ts). */
  private watchComputing(): void {
    this.computing.watch(this.engine!.settled());
  }

  setStatus(text: string): void {
    this.computing.status(text);
  }

  private updateChrome(): void {
    this.el.undo.disabled = !canUndo(this.history);
    this.el.redo.disabled = !canRedo(this.history);
    const system = sheetSystem(this.doc);
    this.el.units.textContent = system === 'US' ? 'Units: US' : 'Units: SI';
    this.el.units.setAttribute('aria-label', `Display units ${system}; switch to ${system === 'US' ? 'SI' : 'US'}`);
  }

  switchUnits(): void {
    const target = sheetSystem(this.doc) === 'US' ? 'SI' : 'US';
    const out = switchSystem(this.doc, target, this.unitMemory);
    this.unitMemory = out.memory;
    this.apply(out.doc);
    this.setStatus(`Display units: ${target}`);
  }

  // ----- cell commands -----

  private selectedOrLast(): string | undefined {
    return this.view.selected ?? this.doc.cells[this.doc.cells.length - 1]?.id;
  }

  add(kind: CellKind): void {
    const out = addCell(this.doc, kind, this.selectedOrLast());
    this.apply(out.doc);
    this.view.select(out.id);
    this.openEditor(out.id);
  }

  duplicate(): void {
    const id = this.view.selected;
    if (!id) return;
    const out = duplicateCell(this.doc, id);
    this.apply(out.doc);
    this.view.select(out.id);
  }

  move(delta: number): void {
    const id = this.view.selected;
    if (!id) return;
    this.apply(moveCell(this.doc, id, delta));
    this.view.select(id);
  }

  remove(): void {
    const id = this.view.selected;
    if (!id) return;
    const order = this.view.order();
    const i = order.indexOf(id);
    if (this.editor?.cell.id === id) this.closeEditor(false);
    this.apply(deleteCell(this.doc, id));
    this.view.select(order[i + 1] ?? order[i - 1]);
    this.setStatus('Cell deleted (Ctrl+Z brings it back)');
  }

  step(delta: number): void {
    const order = this.view.order();
    const i = this.view.selected ? order.indexOf(this.view.selected) : -1;
    const next = order[Math.max(0, Math.min(order.length - 1, i + delta))];
    if (next) this.view.select(next);
  }

  /** Enter on a cell: an input's value field, otherwise the editor panel. */
  edit(full = false): void {
    const id = this.view.selected;
    if (!id) return;
    const cell = this.doc.cells.find((c) => c.id === id);
    if (cell?.kind === 'input' && !full) {
      const field = this.view.element(id)?.querySelector<HTMLInputElement | HTMLSelectElement>('.value-field');
      if (field) {
        field.focus();
        if (field instanceof HTMLInputElement) field.select();
        return;
      }
    }
    this.openEditor(id);
  }

  openEditor(id: string): void {
    if (this.editor?.cell.id === id) {
      this.editor.focus();
      return;
    }
    this.closeEditor(false);
    const cell = this.doc.cells.find((c) => c.id === id);
    const slot = this.view.editorSlot(id);
    if (!cell || !slot) return;
    this.view.select(id, false);
    this.editor = new CellEditor(cell, slot, {
      applySource: (cid, source) => this.applySource(cid, source),
      applyFields: (cid, fields) => this.applyFields(cid, fields),
      close: (cid, refocus) => {
        if (this.editor?.cell.id === cid) this.editor = undefined;
        if (refocus) this.view.select(cid);
      },
      vocabulary: () => this.vocabulary(),
    });
    this.editor.showState(this.engine!.state(id), cellSource(cell));
    // Focus once the key or click that opened the editor is over, so it types nothing there.
    const editor = this.editor;
    setTimeout(() => editor === this.editor && editor.focus(), 0);
  }

  closeEditor(refocus: boolean): void {
    this.editor?.close(refocus);
    this.editor = undefined;
  }

  get editing(): boolean {
    return this.editor !== undefined;
  }

  private applySource(id: string, source: string): { message: string; column?: number } | undefined {
    const cell = this.doc.cells.find((c) => c.id === id);
    if (!cell) return { message: 'this cell is no longer in the sheet' };
    try {
      this.fromEditor = true;
      this.apply(applySource(this.doc, id, source), `src:${id}`);
      return undefined;
    } catch (e) {
      if (e instanceof SourceError) return { message: e.message, column: e.column };
      if (e instanceof EditError) return { message: e.message };
      throw e;
    } finally {
      this.fromEditor = false;
    }
  }

  private applyFields(id: string, fields: CellFields): string | undefined {
    const cell = this.doc.cells.find((c) => c.id === id);
    if (!cell) return 'this cell is no longer in the sheet';
    const allowed: CellFields = {};
    for (const [k, v] of Object.entries(fields)) {
      if (k in cell || (v !== '' && v !== undefined && !(Array.isArray(v) && v.length === 0))) {
        (allowed as Record<string, unknown>)[k] = v;
      }
    }
    try {
      this.fromEditor = true;
      this.apply(setCellFields(this.doc, id, allowed), `fields:${id}`);
      return undefined;
    } catch (e) {
      if (e instanceof EditError) return e.message;
      throw e;
    } finally {
      this.fromEditor = false;
    }
  }

  /** What is typed and not applied in `field` (the focused one by default): a value field, or the open editor's source. */
  draft(field: EventTarget | null = document.activeElement): Draft | undefined {
    if (field instanceof HTMLInputElement && field.classList.contains('value-field')) {
      const cell = this.doc.cells.find((c) => c.id === this.cellIdOf(field));
      if (cell?.kind === 'input' && field.value.trim() !== cell.value) return { cellId: cell.id, kind: 'value', text: field.value };
      return undefined;
    }
    const cell = this.editor && this.doc.cells.find((c) => c.id === this.editor!.cell.id);
    if (cell && this.editor!.typed !== cellSource(cell)) return { cellId: cell.id, kind: 'source', text: this.editor!.typed };
    return undefined;
  }

  /** The id of the cell an element stands in. */
  cellIdOf(el: Element): string | undefined {
    return el.closest<HTMLElement>('article.cell')?.id.replace(/^cell-/, '');
  }

  /** Whether the sheet already holds a draft's text (it was applied after all). */
  holds(d: Draft): boolean {
    const cell = this.doc.cells.find((c) => c.id === d.cellId);
    return !!cell && (d.kind === 'value' ? cell.kind === 'input' && cell.value === d.text.trim() : cellSource(cell) === d.text);
  }

  /** Puts a draft back where it was typed; false when its cell is gone. */
  restoreDraft(d: Draft): boolean {
    const cell = this.doc.cells.find((c) => c.id === d.cellId);
    if (!cell) return false;
    if (d.kind === 'value') {
      this.view.select(d.cellId); // draws the cell at once: it may not be typeset yet
      const field = this.view.element(d.cellId)?.querySelector<HTMLInputElement>('input.value-field');
      if (!field) return false;
      field.value = d.text;
      field.focus();
      return true;
    }
    this.openEditor(d.cellId);
    this.editor?.putBack(d.text);
    return this.editor !== undefined;
  }

  /** A cell as a message names it: its name, else its label, else its kind. */
  cellTitle(id: string): string {
    const cell = this.doc.cells.find((c) => c.id === id);
    return (cell && (cellName(cell) ?? cell.label)) ?? 'a cell';
  }

  vocabulary(): Vocabulary {
    const names = this.doc.cells.flatMap((c) => {
      const name = cellName(c);
      if (!name) return [];
      const s = this.engine?.state(c.id);
      return [{ name, value: s?.status === 'ok' || s?.status === 'fail' ? s.display?.text : undefined, label: c.label }];
    });
    return { names, functions: functionEntries(), units: unitNames() };
  }
}
