// A run's row opened into its trace, in place under the result table: the trace's cells
// drawn by their own kinds' views with that row's states (engine.traceStates), so a mark's
// trace reads exactly as the single-column trace does. The inputs a row sets show the
// row's values; the fields are read-only here (edit the table, or the sheet's trace).
// The open row stays open across re-renders, with fresh values.

import type { CalcDocument, Cell, RunCell } from '../runtime/document';
import { cellName } from '../runtime/document';
import type { Engine } from '../runtime/engine-types';
import { traceCells } from '../runtime/graph/run-program';
import { describe } from '../runtime/kinds/index';
import { escapeHtml } from '../runtime/present/escape';

export class RunTraces {
  /** Per run, the row whose trace is open. */
  private readonly open = new Map<string, number>();

  constructor(
    host: HTMLElement,
    private readonly engine: () => Engine | undefined,
    private readonly doc: () => CalcDocument,
  ) {
    host.addEventListener('click', (e) => {
      const target = e.target as HTMLElement;
      const article = target.closest<HTMLElement>('article.cell');
      const id = article?.dataset.id;
      if (!article || !id) return;
      const key = target.closest<HTMLElement>('[data-act="trace"]');
      if (key) {
        const row = Number(key.dataset.row);
        if (this.open.get(id) === row) this.open.delete(id);
        else this.open.set(id, row);
        this.restore(article, id);
        article.querySelector('.run-trace')?.scrollIntoView({ block: 'nearest' });
      } else if (target.closest('[data-act="close-trace"]')) {
        this.open.delete(id);
        this.restore(article, id);
      }
    });
  }

  /** Opens the trace of the row whose key is `key` (a mark), as a click on its row does. */
  openKey(article: HTMLElement, id: string, key: string): boolean {
    const run = this.engine()?.state(id)?.run;
    const row = run?.traces.findIndex((t) => t.key === key) ?? -1;
    if (row < 0) return false;
    this.open.set(id, row);
    this.restore(article, id);
    return true;
  }

  /** After a run is drawn again: its open row's trace, with the values now. */
  restore(article: HTMLElement, id: string): void {
    const slot = article.querySelector<HTMLElement>('.run-trace');
    if (!slot) return;
    const row = this.open.get(id);
    const engine = this.engine();
    const doc = this.doc();
    const cell = doc.cells.find((c): c is RunCell => c.id === id && c.kind === 'run');
    const states = row === undefined || !engine?.traceStates ? undefined : engine.traceStates(id, row);
    if (!cell || row === undefined || !states) {
      slot.replaceChildren();
      return;
    }
    slot.innerHTML = traceHtml(doc, cell, row, engine!, states);
    for (const f of slot.querySelectorAll<HTMLInputElement | HTMLSelectElement>('.value-field')) f.disabled = true;
  }
}

function traceHtml(doc: CalcDocument, run: RunCell, row: number, engine: Engine, states: NonNullable<ReturnType<NonNullable<Engine['traceStates']>>>): string {
  const value = engine.state(run.id)?.run;
  const key = value?.traces[row]?.key ?? String(row + 1);
  const table = doc.cells.find((c) => c.kind === 'table' && c.name === run.table);
  const byName = new Map<string, string>();
  for (const c of doc.cells) {
    const n = cellName(c);
    if (n) byName.set(n, c.id);
  }
  const scope = { isCell: (n: string) => byName.has(n), state: (n: string) => states(byName.get(n) ?? '') };
  const cells = traceCells(doc.cells, run.trace).cells.map((c): Cell => {
    // An input the row sets shows the value typed in the table.
    if (c.kind !== 'input' || table?.kind !== 'table') return c;
    const k = table.columns.findIndex((col) => col.name === c.name);
    return k < 0 ? c : { ...c, value: table.rows[row]?.[k] ?? c.value };
  });
  const body = cells.map((c) => {
    const view = describe(c.kind).live(c as never, { state: states, scope, number: '' });
    return `<div class="cell kind-${c.kind} st-${view.status} in-trace" data-trace-cell="${escapeHtml(c.id)}"><div class="cell-content">${view.html}</div></div>`;
  }).join('');
  return `<div class="run-trace-head"><strong>Trace of ${escapeHtml(key)}</strong> (row ${row + 1} of ${escapeHtml(run.table)}): the cells of the trace computed with this row's values <button type="button" data-act="close-trace">Close</button></div>${body}`;
}
