// The editor panel that opens under a cell: its source in CodeMirror (or a plain
// field for a section title) plus the cell's other fields. Edits apply as you type;
// problems are marked where they are. CodeMirror is loaded on first use: until it is
// there (a moment, or for good if it cannot load) the source is a plain text area, and
// what is typed there carries over.

import type { Cell } from '../runtime/document';
import { cellSource, type CellFields } from '../runtime/edit/index';
import type { CellState } from '../runtime/engine-types';
import { describe, type FieldSpec } from '../runtime/kinds/index';
import { escapeHtml } from '../runtime/present/escape';
import type { SourceEditor, SourceMark } from './source-editor';
import { loadSourceEditor } from './source-editor-load';
import type { Vocabulary } from './vocabulary';

export interface CellEditorHooks {
  /** Applies the edited source; returns a problem to mark, or undefined when applied. */
  applySource(id: string, source: string): { message: string; column?: number } | undefined;
  applyFields(id: string, fields: CellFields): string | undefined;
  close(id: string, refocus: boolean): void;
  vocabulary(): Vocabulary;
}

const DEBOUNCE_MS = 180;

function fieldText(cell: Cell, key: string): string {
  const v: unknown = Reflect.get(cell, key);
  if (Array.isArray(v)) return v.join(', ');
  return v === undefined ? '' : String(v);
}

/** The value a field's text stands for, as its kind's description reads it. */
function fieldValue(spec: FieldSpec<Cell> | undefined, text: string): unknown {
  if (spec?.type === 'list') return text.split(',').map((s) => s.trim()).filter(Boolean);
  if (spec?.type === 'integer') return text.trim() === '' ? undefined : Number(text.trim());
  return text.trim();
}

export class CellEditor {
  private source?: SourceEditor;
  /** The source as plain text while CodeMirror loads (or if it cannot). */
  private plain?: HTMLTextAreaElement;
  private marks: SourceMark[] = [];
  private closed = false;
  private titleField?: HTMLInputElement;
  private readonly message: HTMLElement;
  private timer?: ReturnType<typeof setTimeout>;
  private fieldTimer?: ReturnType<typeof setTimeout>;
  private problem?: { message: string; column?: number };

  constructor(readonly cell: Cell, private readonly host: HTMLElement, private readonly hooks: CellEditorHooks) {
    host.innerHTML = '';
    const panel = document.createElement('div');
    panel.className = 'cell-editor';
    panel.setAttribute('role', 'group');
    panel.setAttribute('aria-label', `Edit ${cell.kind}`);
    const srcHost = document.createElement('div');
    srcHost.className = 'src-host';
    this.message = document.createElement('div');
    this.message.className = 'editor-message';
    this.message.setAttribute('aria-live', 'polite');
    const fields = document.createElement('div');
    fields.className = 'editor-fields';
    fields.innerHTML = describe(cell.kind).fields
      .map((f) => `<label>${escapeHtml(f.label)} <input data-field="${escapeHtml(String(f.key))}" size="${f.size}" value="${
        escapeHtml(fieldText(cell, String(f.key)))}"${f.hint ? ` placeholder="${escapeHtml(f.hint)}"` : ''}></label>`)
      .join('');
    const bar = document.createElement('div');
    bar.className = 'editor-bar';
    bar.innerHTML = '<span class="editor-keys">Ctrl+Enter or Esc to close · Ctrl+Space completes</span><button type="button" data-editor="done">Done</button>';
    panel.append(srcHost, this.message, fields, bar);
    host.append(panel);

    const mode = describe(cell.kind).source.mode;
    if (mode === 'line') {
      const t = document.createElement('input');
      t.className = 'title-field';
      t.value = cellSource(cell);
      t.setAttribute('aria-label', 'Section title');
      t.addEventListener('input', () => this.schedule(t.value));
      t.addEventListener('keydown', (e) => this.onFieldKey(e));
      srcHost.append(t);
      this.titleField = t;
    } else {
      const label = mode === 'note' ? 'Note text' : `${cell.kind} source`;
      const plain = document.createElement('textarea');
      plain.className = 'src-plain';
      plain.value = cellSource(cell);
      // As tall as the editor that replaces it: a formula is one line, a note gets room to grow.
      plain.rows = Math.min(12, plain.value.split('\n').length + (mode === 'note' ? 1 : 0));
      plain.spellcheck = false;
      plain.setAttribute('aria-label', label);
      plain.addEventListener('input', () => this.schedule(plain.value));
      plain.addEventListener('keydown', (e) => {
        // As in the full editor: a formula is one line, so Enter finishes it.
        if (mode !== 'note' && e.key === 'Enter' && !e.shiftKey && !e.ctrlKey && !e.metaKey) {
          e.preventDefault();
          this.close(true);
        } else this.onFieldKey(e);
      });
      srcHost.append(plain);
      this.plain = plain;
      loadSourceEditor().then((Editor) => {
        if (this.closed) return;
        const focused = document.activeElement === plain;
        const { value: text, selectionStart, selectionEnd } = plain;
        plain.remove();
        this.plain = undefined;
        this.source = new Editor({
          parent: srcHost,
          text,
          mode,
          vocabulary: () => hooks.vocabulary(),
          label,
          onChange: (t) => this.schedule(t),
          onDone: () => this.close(true),
          onCancel: () => this.close(true),
        });
        this.source.setMarks(this.marks);
        if (focused) {
          this.source.focus();
          this.source.select(selectionStart, selectionEnd);
        }
      }, (e: unknown) => {
        if (!this.closed) this.setMessage(`The source editor could not load (${(e as Error).message}); editing goes on as plain text.`);
      });
    }
    fields.addEventListener('input', () => this.scheduleFields(fields));
    fields.addEventListener('keydown', (e) => this.onFieldKey(e));
    bar.querySelector('button')!.addEventListener('click', () => this.close(true));
  }

  focus(): void {
    (this.source ?? this.plain ?? this.titleField)?.focus();
  }

  private sourceText(): string {
    return this.source?.text ?? this.plain?.value ?? this.titleField?.value ?? '';
  }

  /** The source as typed, applied or not (kept across a reload by cells/keep-work.ts). */
  get typed(): string {
    return this.sourceText();
  }

  /** Puts typed text back (after a reload) and applies it as typing would. */
  putBack(text: string): void {
    if (this.source) this.source.setText(text);
    else if (this.plain) this.plain.value = text;
    else if (this.titleField) this.titleField.value = text;
    this.schedule(text);
  }

  private setMarks(marks: SourceMark[]): void {
    this.marks = marks;
    this.source?.setMarks(marks);
  }

  /** Shows the engine's verdict on the applied source: an error marked at its column. */
  showState(state: CellState | undefined, source: string): void {
    if (this.problem) return; // a source problem is shown until it is fixed
    const e = state?.status === 'error' ? state.error : undefined;
    if (!e || e.kind === 'upstream') {
      this.setMessage(e ? `Waiting on ${e.upstream ?? 'an input'}: ${e.message}` : '');
      this.setMarks([]);
      return;
    }
    this.setMessage(e.message);
    const from = e.column === undefined ? undefined : describe(this.cell.kind).source.errorAt(source, e.column);
    if (from !== undefined) this.setMarks([{ from, to: from + 1, message: e.message }]);
  }

  /** After undo/redo the cell may read differently: show its current source. */
  reload(cell: Cell): void {
    (this as { cell: Cell }).cell = cell;
    const text = cellSource(cell);
    if (this.source) this.source.setText(text);
    else if (this.plain && this.plain.value !== text) this.plain.value = text;
    else if (this.titleField && this.titleField.value !== text) this.titleField.value = text;
  }

  close(refocus: boolean): void {
    this.flush();
    this.closed = true;
    this.source?.destroy();
    this.host.innerHTML = '';
    this.hooks.close(this.cell.id, refocus);
  }

  private onFieldKey(e: KeyboardEvent): void {
    if (e.key === 'Escape' || (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) || (e.key === 'Enter' && e.target === this.titleField)) {
      e.preventDefault();
      e.stopPropagation();
      this.close(true);
    }
  }

  private schedule(text: string): void {
    clearTimeout(this.timer);
    this.timer = setTimeout(() => this.apply(text), DEBOUNCE_MS);
  }

  private flush(): void {
    if (this.timer !== undefined) {
      clearTimeout(this.timer);
      this.timer = undefined;
      this.apply(this.sourceText());
    }
    if (this.fieldTimer !== undefined) {
      clearTimeout(this.fieldTimer);
      this.fieldTimer = undefined;
      this.applyFieldsNow(this.host.querySelector('.editor-fields')!);
    }
  }

  private apply(text: string): void {
    this.timer = undefined;
    this.problem = this.hooks.applySource(this.cell.id, text);
    if (this.problem) {
      this.setMessage(this.problem.message);
      const col = this.problem.column;
      if (col !== undefined) this.setMarks([{ from: col - 1, to: col, message: this.problem.message }]);
    } else {
      this.setMessage('');
      this.setMarks([]);
    }
  }

  private scheduleFields(fields: HTMLElement): void {
    clearTimeout(this.fieldTimer);
    this.fieldTimer = setTimeout(() => this.applyFieldsNow(fields), DEBOUNCE_MS);
  }

  private applyFieldsNow(fields: HTMLElement): void {
    this.fieldTimer = undefined;
    const patch: CellFields = {};
    const specs = describe(this.cell.kind).fields;
    fields.querySelectorAll<HTMLInputElement>('input[data-field]').forEach((inp) => {
      const key = inp.dataset.field ?? '';
      Reflect.set(patch, key, fieldValue(specs.find((f) => f.key === key), inp.value));
    });
    const problem = this.hooks.applyFields(this.cell.id, patch);
    this.setMessage(problem ?? '');
  }

  private setMessage(text: string): void {
    this.message.textContent = text;
    this.message.classList.toggle('has-problem', text !== '');
  }
}
