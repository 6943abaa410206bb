// The working of a cell's library calls as HTML, DOM-free and written once for both faces:
// the live sheet passes KaTeX HTML as its `tex`, the record's static page MathML. Each call
// is a <details> element, so it folds and opens with JavaScript off too; a call inside it
// is a <details> of its own, folded, opened one level at a time. A step that governs says
// so in words, not by colour alone; its clause stands in the margin.

import { figureLibrary } from '../figures/functions';
import { renderFigure } from '../figures/render';
import type { LibValue } from '../library/types';
import { escapeHtml } from '../present/escape';
import type { UnitSystem } from '../units/systems';
import type { LibraryCall } from './calls';
import { presentWorking, type CallBlock, type WorkingLine } from './present';
import { workingOf } from './run';

export interface WorkingFace {
  /** TeX to HTML (inline math): KaTeX HTML on the live sheet, MathML in the record. */
  tex(tex: string): string;
  /** The sheet's unit system. */
  system: UnitSystem;
}

/** The words of a call's fold, without any math: cheap enough for every call on the sheet. */
export function callTitle(call: { lib: { name: string } }): string {
  return `Working of ${escapeHtml(call.lib.name)}`;
}

function figureHtml(fn: string, args: readonly LibValue[]): string {
  const f = figureLibrary.find((x) => x.name === fn);
  if (!f) return '';
  try {
    return `<figure class="lt-wk-fig">${renderFigure(f.fn(...args))}</figure>`;
  } catch {
    return ''; // a figure that cannot be drawn for these values is left out; the steps stand
  }
}

function lineHtml(line: WorkingLine, face: WorkingFace): string {
  switch (line.kind) {
    case 'step': {
      const cls = line.governs ? 'lt-wk-step lt-wk-gov' : 'lt-wk-step';
      const gov = line.governs ? '<span class="lt-wk-mark">governs</span>' : '';
      const note = line.note ? `<span class="lt-wk-note">${escapeHtml(line.note)}</span>` : '';
      const units = line.code ? '<span class="lt-wk-note">in the units the clause states</span>' : '';
      const ref = line.clause ? `<span class="lt-wk-ref">${escapeHtml(line.clause)}</span>` : '';
      return `<div class="${cls}"><span class="lt-wk-eq">${face.tex(line.tex)}</span>${gov}${note}${units}${ref}</div>`;
    }
    case 'call':
      return callHtml(line, face, false);
    case 'method':
      return `<p class="lt-wk-method">Method: ${escapeHtml(line.text)}. Reference: ${escapeHtml(line.reference)}.</p>`;
    case 'figure':
      return figureHtml(line.fn, line.args);
  }
}

/** One call as a fold: its head with the result, its inputs, then its lines. */
function callHtml(block: CallBlock, face: WorkingFace, open: boolean, title?: string, error?: string): string {
  const head = `${block.head}${block.result ? ` = ${block.result}` : ''}`;
  const summary = title ?? callTitle({ lib: { name: block.fn } });
  if (block.repeat) {
    return `<div class="lt-wk-step lt-wk-repeat"><span class="lt-wk-eq">${face.tex(head)}</span><span class="lt-wk-note">as above</span></div>`;
  }
  const inputs = block.inputs.length ? `<p class="lt-wk-in">${face.tex(block.inputs.join(',\\quad '))}</p>` : '';
  const body = block.lines.map((l) => lineHtml(l, face)).join('');
  const err = error ? `<p class="lt-wk-error">Stopped: ${escapeHtml(error)}</p>` : '';
  const ref = block.clause ? `<span class="lt-wk-ref">${escapeHtml(block.clause)}</span>` : '';
  return `<details class="lt-working"${open ? ' open' : ''}><summary>${summary}</summary><div class="lt-wk-body">` +
    `<div class="lt-wk-step lt-wk-call"><span class="lt-wk-eq">${face.tex(head)}</span>${ref}</div>${inputs}${body}${err}</div></details>`;
}

/** The working of one call, run now on its arguments, as an open or folded <details>. */
export function workingHtml(call: LibraryCall, face: WorkingFace, open: boolean): string {
  const w = presentWorking(workingOf(call.lib, call.args, call.units), face.system);
  return callHtml(w.block, face, open, callTitle(call), w.error).replace('<details class="lt-working"', '<details class="lt-working lt-wk-top"');
}

/** A folded call whose working is not made yet (the live sheet fills it when it is opened). */
export function foldedCallHtml(call: { lib: { name: string } }, index: number): string {
  return `<details class="lt-working lt-wk-top" data-call="${index}"><summary>${callTitle(call)}</summary></details>`;
}
