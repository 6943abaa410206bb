// The working of a library call, opened in place on the sheet. A formula or check shows a
// fold per call (folded by default); opening one asks the engine for the call's arguments
// now and runs the function again under the recorder (runtime/working), so what it shows is
// the computation that gave the value. Folds stay open across re-renders, with fresh values.

import type { CalcDocument } from '../runtime/document';
import type { Engine } from '../runtime/engine-types';
import { sheetSystem } from '../runtime/units/systems';
import { workingHtml } from '../runtime/working/html';
import { callFor } from '../runtime/working/sheet';
import { texHtml } from '../runtime/present/tex-live';

export class WorkingFolds {
  /** Per cell, the calls (by index) whose fold is open. */
  private readonly open = new Map<string, Set<number>>();

  constructor(
    host: HTMLElement,
    private readonly engine: () => Engine | undefined,
    private readonly doc: () => CalcDocument,
  ) {
    // `toggle` does not bubble: listen on the way down.
    host.addEventListener('toggle', (e) => this.toggled(e.target), true);
  }

  private toggled(target: EventTarget | null): void {
    if (!(target instanceof HTMLDetailsElement) || !target.matches('.lt-wk-top[data-call]')) return;
    const id = (target.closest('article.cell') as HTMLElement | null)?.dataset.id;
    if (!id) return;
    const index = Number(target.dataset.call);
    let set = this.open.get(id);
    if (target.open) {
      if (!set) this.open.set(id, (set = new Set()));
      set.add(index);
      if (!target.dataset.filled) this.fill(target, id, index);
    } else set?.delete(index);
  }

  /** Writes the working of call `index` of cell `id` into its fold. */
  private fill(fold: HTMLDetailsElement, id: string, index: number): void {
    const engine = this.engine();
    const cell = this.doc().cells.find((c) => c.id === id);
    if (!engine?.libraryCalls || !cell || (cell.kind !== 'formula' && cell.kind !== 'check')) return;
    const call = callFor(engine.libraryCalls(id), cell.expr, index);
    if (!call) return;
    const t = document.createElement('template');
    t.innerHTML = workingHtml(call, { tex: (tex) => texHtml(tex), system: sheetSystem(this.doc()) }, true);
    const made = t.content.firstElementChild as HTMLDetailsElement | null;
    if (!made) return;
    fold.dataset.filled = '1';
    fold.replaceChildren(...made.childNodes);
  }

  /** After a cell is drawn again: its open folds open again, with the working of the values now. */
  restore(article: HTMLElement, id: string): void {
    const set = this.open.get(id);
    if (!set?.size) return;
    for (const fold of article.querySelectorAll<HTMLDetailsElement>('details.lt-wk-top[data-call]')) {
      if (!set.has(Number(fold.dataset.call))) continue;
      this.fill(fold, id, Number(fold.dataset.call));
      fold.open = true;
    }
  }
}
