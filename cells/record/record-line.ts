// The line under the toolbar that says what the open sheet is as a record (draft,
// issued revision, working copy from review) and, on a record page, what is known of
// the file it came from: its digest, being checked, verified (every part as written)
// or altered. It says "verified" only after the whole file was checked.

import type { RecordCheck } from '../../runtime/record/index';
import { SEAL_MEANING } from '../../runtime/record/index';
import { stateSentence, stateTitle } from '../../runtime/present/record-state';
import type { RecordState } from '../../runtime/review/index';
import { escapeHtml } from '../../runtime/present/escape';

export type SealStatus =
  | { kind: 'checking'; docDigest?: string }
  | { kind: 'done'; check: RecordCheck };

export interface LineModel {
  state: RecordState;
  /** On a record page, or for a sheet opened from a record file. */
  seal?: SealStatus;
  /** The sheet was changed since the record was opened. */
  changedSinceOpen: boolean;
}

const short = (hex: string | undefined) => (hex ? `${hex.slice(0, 16)}…` : '');

function sealHtml(seal: SealStatus, changed: boolean): string {
  if (seal.kind === 'checking') return '<span class="lt-rl-seal lt-rl-checking">Checking every part of the file against its seal…</span>';
  const c = seal.check;
  const digest = c.recordDigest ? ` <span class="lt-rl-digest" title="${escapeHtml(c.recordDigest)}">Record SHA-256 <code>${escapeHtml(short(c.recordDigest))}</code></span>` : '';
  if (c.verified) {
    return `<span class="lt-rl-seal lt-rl-verified" title="${escapeHtml(SEAL_MEANING)}"><b>✓ Verified:</b> every part of the file is as Loadtrace wrote it${
      changed ? ' (the sheet was changed since it was opened)' : ''}.</span>${digest}`;
  }
  if (c.version === 1) return `<span class="lt-rl-seal lt-rl-unsealed"><b>Not verifiable:</b> ${escapeHtml(c.problems[c.problems.length - 1] ?? '')}</span>`;
  return `<span class="lt-rl-seal lt-rl-altered" role="alert"><b>⚠ ALTERED:</b> ${escapeHtml(c.problems[0] ?? 'the file differs from its seal')}${
    c.problems.length > 1 ? ` (and ${c.problems.length - 1} more)` : ''}</span>${digest}`;
}

export function lineHtml(m: LineModel): string {
  const st = `<span class="lt-rl-state lt-rl-${m.state.kind}" data-state="${m.state.kind}" title="${escapeHtml(stateSentence(m.state))}"><b>${
    escapeHtml(stateTitle(m.state))}</b></span>`;
  return `${st}${m.seal ? ` ${sealHtml(m.seal, m.changedSinceOpen)}` : ''}`;
}

/** The element with `id`, placed under the toolbar the first time it is asked for. */
export function underToolbar(id: string, className: string, role: 'status' | 'alert'): HTMLElement {
  let el = document.getElementById(id);
  if (!el) {
    el = document.createElement('div');
    el.id = id;
    el.className = className;
    el.setAttribute('role', role);
    const toolbar = document.querySelector('.toolbar');
    if (toolbar) toolbar.after(el);
    else document.body.prepend(el);
  }
  return el;
}

/** The line's element. */
export const lineElement = (): HTMLElement => underToolbar('lt-record-line', 'lt-record-line', 'status');
