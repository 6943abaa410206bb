// The static rendering of a calc record: title block, caution, check summary, then
// every cell as a calc sheet reads (hand-calc equation, result column, clause), and
// the review state when the document has one. Plain HTML from escaped text and
// KaTeX output only, so it reads with JavaScript off and prints as calc sheets.

import type { CalcDocument, Cell, CheckCell, DocMeta, FormulaCell, InputCell } from '../document';
import { cellName } from '../document';
import type { CellState } from '../engine-types';
import { cellsInError, inErrorText } from '../graph/in-error';
import { checkTex, formulaTex, nameTex, quantityTex, ratioText, type HandCalcScope } from '../handcalc/index';
import { escapeHtml } from './escape';
import { noteHtml } from './markdown';
import { reviewHtml } from './static-review';
import { texHtml } from './tex';
// Figures and sweeps: the DOM-free SVG from runtime/figures (every text in it escaped).
import { cellSvg } from '../figures/render';
// The working of each library call, open or folded by the sheet's setting (runtime/working).
import type { LibraryCall } from '../working/calls';
import { cellWorkingsHtml, recordOpen } from '../working/sheet';
import { sheetSystem } from '../units/systems';
function recordWorkings(doc: CalcDocument, state: (id: string) => CellState | undefined, calls?: (id: string) => LibraryCall[]) {
  if (!calls) return () => '';
  const open = recordOpen(doc, state);
  const face = { tex: (t: string) => texHtml(t, false), system: sheetSystem(doc) };
  return (cell: Cell) => (cell.kind === 'formula' || cell.kind === 'check' ? cellWorkingsHtml(calls(cell.id), face, open(cell.id)) : '');
}
const figureHtml = (cell: Cell, s: CellState | undefined): string => {
  const svg = cellSvg(cell, s);
  return svg ? `<figure class="lt-figure">${svg}</figure>` : '';
};

export const CAUTION = "Results are an aid to, not a substitute for, a licensed engineer's judgement; local codes govern.";

/** Formulas longer than this are not typeset as a hand calc (the engine refuses them too). */
const HANDCALC_LIMIT = 2000;
/** Beyond this many characters of formula the hand calc is set one step a row (a printed line is narrow). */
const LONG_FORMULA = 24;
/** Or when the whole hand calc on one line is longer than this much TeX. */
const LONG_LINE = 110;
/** A text result longer than this is written under the hand calc, not in the result column. */
const LONG_TEXT = 28;

/** A text result too long for the result column. */
const longText = (s: CellState | undefined): boolean =>
  done(s) && typeof s!.display?.value === 'string' && s!.display.text.length > LONG_TEXT;

export interface StaticOptions {
  /** SHA-256 of the embedded document, shown in the footer so a printout names its file. */
  digest?: string;
  /** When the record was written (ISO text); shown in the footer. */
  exportedAt?: string;
  /** A plain message for the top of the page (e.g. a failed seal). */
  warning?: string;
  /** The library calls of a formula or check (Engine.libraryCalls), to print their working. */
  calls?: (id: string) => LibraryCall[];
}

export const META_LABELS: Record<keyof DocMeta, string> = {
  project: 'Project', job: 'Job no.', subject: 'Subject', preparedBy: 'Prepared by',
  checkedBy: 'Checked by', revision: 'Revision', date: 'Date',
};

/** Reference numbers as the app shows them: sections 1, 2; cells 1.1, 1.2; notes none. */
export function numberCells(cells: readonly Cell[]): Map<string, string> {
  const out = new Map<string, string>();
  let section = 0;
  let item = 0;
  for (const cell of cells) {
    if (cell.kind === 'section') {
      section++;
      item = 0;
      out.set(cell.id, String(section));
    } else if (cell.kind === 'note') out.set(cell.id, '');
    else out.set(cell.id, `${section}.${++item}`);
  }
  return out;
}

interface Ctx {
  state: (id: string) => CellState | undefined;
  scope: HandCalcScope;
  numbers: Map<string, string>;
  /** The working of a cell's library calls (runtime/working), '' when none. */
  workings: (cell: Cell) => string;
}

const done = (s: CellState | undefined): boolean => s?.status === 'ok' || s?.status === 'fail';

function titleBlockHtml(meta: DocMeta): string {
  const field = (k: keyof DocMeta, cls = '') =>
    `<div class="lt-tb-f${cls}"><span class="lt-tb-k">${META_LABELS[k]}</span><span class="lt-tb-v" data-meta="${k}">${
      escapeHtml(meta[k]) || '&#8212;'}</span></div>`;
  return `<header class="lt-tb" aria-label="Title block">${field('project')}${field('job')}${field('revision')}${field('date')}${
    field('subject')}${field('preparedBy')}${field('checkedBy', ' lt-span2')}</header>`;
}

function refsHtml(cell: Cell, s: CellState | undefined): string {
  const refs = [...new Set([cell.clause, ...(s?.clauses ?? [])].filter((r): r is string => !!r && r.trim() !== ''))];
  return `<aside class="lt-ref">${refs.map((r) => `<span>${escapeHtml(r)}</span>`).join('')}</aside>`;
}

function errorHtml(s: CellState | undefined): string {
  if (s?.status !== 'error' || !s.error) return '';
  const lead = s.error.kind === 'upstream' ? 'Waiting on' : 'Problem';
  return `<p class="lt-err" role="alert">⚠ <strong>${lead}:</strong> ${escapeHtml(s.error.message)}</p>`;
}

function labelHtml(label: string | undefined): string {
  return label ? `<div class="lt-label">${escapeHtml(label)}</div>` : '';
}

/** A display text as the result column shows it: ft^2 → ft², kip*ft → kip·ft. */
export function resultText(text: string): string {
  return text.replace(/\^2(?![\d.])/g, '²').replace(/\^3(?![\d.])/g, '³').replace(/\s*\*\s*/g, '·');
}

/** The result column: the value as text, so every result reads without fonts or scripts. */
function resultHtml(s: CellState | undefined): string {
  if (s?.status === 'error') return '<span class="lt-res-err">error</span>';
  if (!done(s) || !s!.display) return '<span class="lt-res-none">—</span>';
  if (longText(s)) return '<span class="lt-res-none">see left</span>';
  return escapeHtml(resultText(s!.display.text));
}

function inputHtml(cell: InputCell, s: CellState | undefined): string {
  const value = done(s) && s!.display ? quantityTex(s!.display) : `\\text{${cell.value.replace(/[\\{}$&#^_%~]/g, '')}}`;
  const eq = texHtml(`${nameTex(cell.name)} = ${value}`, false);
  const extra: string[] = [];
  if (cell.choices?.length) extra.push(`one of: ${cell.choices.map(escapeHtml).join(' · ')}`);
  if (cell.min || cell.max) extra.push(`range ${escapeHtml(cell.min ?? '…')} to ${escapeHtml(cell.max ?? '…')}`);
  if (done(s) && s!.display && s!.display.text !== cell.value) extra.push(`as entered: ${escapeHtml(cell.value)}`);
  const about = cell.description ? `<p class="lt-about">${escapeHtml(cell.description)}</p>` : '';
  return `${labelHtml(cell.label)}<div class="lt-eq lt-eq-in">${eq}</div>${
    extra.length ? `<div class="lt-meta">${extra.join('; ')}</div>` : ''}${about}${errorHtml(s)}`;
}

function formulaHtml(cell: FormulaCell, s: CellState | undefined, ctx: Ctx): string {
  let eq: string;
  if (cell.expr.length > HANDCALC_LIMIT) {
    eq = `<code class="lt-tex-raw">${escapeHtml(cell.name)} = ${escapeHtml(cell.expr.slice(0, 200))}…</code>`;
  } else if (longText(s)) {
    // A long text result reads as a sentence under the formula, not as typeset math.
    const t = formulaTex(cell.name, cell.expr, undefined, ctx.scope);
    eq = `${texHtml(t.line, true)}<p class="lt-textres">= ${escapeHtml(s!.display!.text)}</p>`;
  } else {
    const t = formulaTex(cell.name, cell.expr, s, ctx.scope);
    // One step a line, each its own equation (MathML Core has no column alignment for `aligned`).
    eq = t.parts.length > 2 && (cell.expr.length > LONG_FORMULA || t.line.length > LONG_LINE)
      ? t.parts.map((p, i) => texHtml(i === 0 ? `${t.symbol} = ${p}` : `\\qquad = ${p}`, true)).join('')
      : texHtml(t.line, true);
  }
  return `${labelHtml(cell.label)}<div class="lt-eq">${eq}</div>${errorHtml(s)}`;
}

function verdictHtml(s: CellState | undefined): string {
  if (!done(s)) return '';
  const ok = s!.status === 'ok';
  const ratio = s!.ratio !== undefined ? ` <span class="lt-ratio">ratio ${escapeHtml(ratioText(s!.ratio))}</span>` : '';
  const dc = s!.demand && s!.capacity
    ? ` <span class="lt-dc">demand ${escapeHtml(resultText(s!.demand.text))} · capacity ${escapeHtml(resultText(s!.capacity.text))}</span>` : '';
  return `<p class="lt-verdict lt-${ok ? 'pass' : 'fail'}"><strong>${ok ? '✓ OK' : '✗ NOT OK'}</strong>${ratio}${dc}</p>`;
}

function checkHtml(cell: CheckCell, s: CellState | undefined, ctx: Ctx): string {
  let eq: string;
  if (cell.expr.length > HANDCALC_LIMIT) eq = `<code class="lt-tex-raw">${escapeHtml(cell.expr.slice(0, 200))}…</code>`;
  else {
    const t = checkTex(cell.expr, s, ctx.scope);
    const head = cell.name ? `${nameTex(cell.name)}:\\;` : '';
    eq = texHtml(head + [t.condition, t.substituted && `\\Rightarrow\\; ${t.substituted}`, t.ratio].filter(Boolean).join('\\qquad '), true);
  }
  return `${labelHtml(cell.label)}<div class="lt-eq">${eq}</div>${verdictHtml(s)}${errorHtml(s)}`;
}

function checkResult(s: CellState | undefined): string {
  if (s?.status === 'error') return '<span class="lt-res-err">error</span>';
  if (!done(s)) return '<span class="lt-res-none">—</span>';
  const word = s!.status === 'ok' ? '✓ OK' : '✗ NOT OK';
  return `${word}${s!.ratio !== undefined ? `<br>${escapeHtml(ratioText(s!.ratio))}` : ''}`;
}

function cellHtml(cell: Cell, ctx: Ctx): string {
  const s = ctx.state(cell.id);
  const no = escapeHtml(ctx.numbers.get(cell.id) ?? '');
  const id = `lt-c-${escapeHtml(cell.id)}`;
  const status = s?.status ?? (cell.kind === 'note' || cell.kind === 'section' ? 'plain' : 'pending');
  const open = `<div class="lt-cell lt-${cell.kind} lt-st-${status}" id="${id}" data-id="${escapeHtml(cell.id)}">`;
  switch (cell.kind) {
    case 'section':
      return `<h2 class="lt-sec" id="${id}" data-id="${escapeHtml(cell.id)}"><span class="lt-no">${no}</span> ${escapeHtml(cell.title)}${
        cell.clause ? ` <small class="lt-sec-ref">${escapeHtml(cell.clause)}</small>` : ''}</h2>${
        cell.label ? `<p class="lt-sec-label">${escapeHtml(cell.label)}</p>` : ''}`;
    case 'note':
      return `${open}<div class="lt-no"></div><div class="lt-body">${labelHtml(cell.label)}<div class="lt-note">${
        noteHtml(cell.text)}</div></div><div class="lt-res"></div>${refsHtml(cell, s)}</div>`;
    case 'input':
      return `${open}<div class="lt-no">${no}</div><div class="lt-body">${inputHtml(cell, s)}</div><div class="lt-res">${
        resultHtml(s)}</div>${refsHtml(cell, s)}</div>`;
    case 'formula':
      return `${open}<div class="lt-no">${no}</div><div class="lt-body">${formulaHtml(cell, s, ctx)}${ctx.workings(cell)}</div><div class="lt-res">${
        resultHtml(s)}</div>${refsHtml(cell, s)}</div>`;
    case 'check':
      return `${open}<div class="lt-no">${no}</div><div class="lt-body">${checkHtml(cell, s, ctx)}${ctx.workings(cell)}</div><div class="lt-res">${
        checkResult(s)}</div>${refsHtml(cell, s)}</div>`;
    default:
      return `${open}<div class="lt-no">${no}</div><div class="lt-body">${otherHtml(cell, s)}</div><div class="lt-res">${
        typeof s?.display?.text === 'string' ? escapeHtml(s.display.text) : ''}</div>${refsHtml(cell, s)}</div>`;
  }
}

/** Kinds with no static form of their own yet (figures, sweeps): label, source and state. */
function otherHtml(cell: Cell, s: CellState | undefined): string {
  const source = 'expr' in cell && typeof cell.expr === 'string' ? cell.expr : '';
  return `${labelHtml(cell.label)}<div class="lt-meta">${escapeHtml(cell.kind)}${
    source ? `: <code>${escapeHtml(source.slice(0, 2000))}</code>` : ''}</div>${figureHtml(cell, s)}${errorHtml(s)}`;
}

/** Governing first: failures, errors, pending, passes; within each the highest ratio first. */
function summaryHtml(doc: CalcDocument, ctx: Ctx): string {
  const rank = { fail: 0, error: 1, pending: 2, ok: 3 } as const;
  const rows = doc.cells
    .filter((c): c is CheckCell => c.kind === 'check')
    .map((c, order) => ({ c, s: ctx.state(c.id), order }))
    .sort((a, b) => rank[a.s?.status ?? 'pending'] - rank[b.s?.status ?? 'pending']
      || (b.s?.ratio ?? -Infinity) - (a.s?.ratio ?? -Infinity) || a.order - b.order);
  const inError = cellsInError(doc, ctx.state);
  if (rows.length === 0 && inError.length === 0) return '';
  const failing = rows.filter((r) => r.s?.status === 'fail').length;
  const broken = rows.filter((r) => r.s?.status === 'error' || !done(r.s)).length;
  const head = `${rows.length} check${rows.length === 1 ? '' : 's'}: ${failing ? `${failing} NOT OK` : 'none NOT OK'}${
    broken ? `, ${broken} without a result` : ''}${inError.length ? `; ${inErrorText(inError)}` : ''}`;
  const words = { ok: '✓ OK', fail: '✗ NOT OK', error: '⚠ ERROR', pending: '… pending' } as const;
  // Cells other than checks whose error is their own come first (summary of every cell in error).
  const sources = inError.filter((e) => e.source && e.kind !== 'check').map((e) => `<tr class="lt-st-error"><td class="lt-sum-v">${
    words.error}</td><td class="lt-sum-r">—</td><td class="lt-sum-no"><a href="#lt-c-${escapeHtml(e.id)}">${
    escapeHtml(ctx.numbers.get(e.id) ?? '')}</a></td><td>${escapeHtml(`${e.title}: ${e.message}`)}</td><td class="lt-sum-ref"></td></tr>`);
  const body = rows.map(({ c, s }) => {
    const st = s?.status ?? 'pending';
    return `<tr class="lt-st-${st}"><td class="lt-sum-v">${words[st]}</td><td class="lt-sum-r">${
      s?.ratio !== undefined ? escapeHtml(ratioText(s.ratio)) : '—'}</td><td class="lt-sum-no"><a href="#lt-c-${escapeHtml(c.id)}">${
      escapeHtml(ctx.numbers.get(c.id) ?? '')}</a></td><td>${escapeHtml(c.label || c.name || c.expr.slice(0, 200))}</td><td class="lt-sum-ref">${
      escapeHtml(c.clause ?? s?.clauses.join('; ') ?? '')}</td></tr>`;
  });
  return `<section class="lt-summary" aria-label="Summary of checks"><h2>Summary of checks <small>${escapeHtml(head)}</small></h2>
<table><thead><tr><th>Outcome</th><th>Ratio</th><th>No.</th><th>Check</th><th>Reference</th></tr></thead><tbody>${sources.join('')}${body.join('')}</tbody></table></section>`;
}

/** The whole static rendering (one element, id "lt-static") for the given engine states. */
export function staticHtml(
  doc: CalcDocument,
  state: (id: string) => CellState | undefined,
  options: StaticOptions = {},
): string {
  const byName = new Map<string, string>();
  for (const c of doc.cells) {
    const n = cellName(c);
    if (n !== undefined && !byName.has(n)) byName.set(n, c.id);
  }
  const ctx: Ctx = {
    state,
    numbers: numberCells(doc.cells),
    scope: { isCell: (n) => byName.has(n), state: (n) => state(byName.get(n) ?? '') },
    workings: recordWorkings(doc, state, options.calls),
  };
  const warning = options.warning ? `<p class="lt-warning" role="alert">${escapeHtml(options.warning)}</p>` : '';
  const foot = [
    'Calc record written by Loadtrace',
    options.exportedAt && `on ${escapeHtml(options.exportedAt)}`,
    options.digest && `· document SHA-256 <code>${escapeHtml(options.digest)}</code>`,
  ].filter(Boolean).join(' ');
  return `<div id="lt-static" class="lt-static" lang="en">${warning}${titleBlockHtml(doc.meta)}
<p class="lt-caution" role="note">△ ${CAUTION}</p>
<p class="lt-howto">This is the issued calc record. Open the file in a web browser with JavaScript on to edit and recompute it; the document it was computed from is kept inside the file.</p>
${summaryHtml(doc, ctx)}
<main class="lt-calc">${doc.cells.map((c) => cellHtml(c, ctx)).join('\n')}</main>
${reviewHtml(doc)}
<footer class="lt-foot">${foot}</footer></div>`;
}
