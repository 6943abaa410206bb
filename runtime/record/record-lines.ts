// The lines at the top of the static page that say what the record is and what is
// known of it: the state (draft, issued revision, working copy from review), the
// record's digest with what it does and does not prove, and, in the file as written,
// a message that needs no script: visible until the app runs (the app marks the page
// lt-app-running), so with JavaScript off, or when the browser refused the file's
// altered code, the reader is told that nothing on the page was checked.
// The file as written never says "verified": only a check that reads the whole file can.

import type { CalcDocument } from '../document';
import type { ResultLookup } from '../review/revision';
import { stateSentence, stateTitle } from '../present/record-state';
import { recordState, type RecordState } from '../review/state';
import { escapeHtml } from './escape';
import { DIGEST_ID } from './seal-parts';

/** What the page in hand knows of its own file. */
export type SealKnown =
  /** The file as written: it cannot check itself. */
  | { kind: 'unchecked' }
  /** Printed from the live app, which checked the whole file when it opened it. */
  | { kind: 'checked'; verified: boolean; problem?: string; changedSince?: boolean }
  /** Calc sheets printed straight from a computed sheet (the CLI's --pdf): no file, no seal. */
  | { kind: 'printout' };

export interface RecordLines {
  state: RecordState;
  /** The record's digest (while packing, a placeholder the packer fills in). */
  recordDigest?: string;
  known: SealKnown;
}

/** Where the packer writes the record's digest. */
export const DIGEST_PLACEHOLDER = '0'.repeat(64);

export const VERIFY_COMMAND = 'npm run calc -- FILE --verify';

/** What the seal proves and does not, in the record's own words. */
export const SEAL_MEANING = 'The digest shows any change to the file by someone who did not recompute it; it is not a signature: anyone can write a new file with a digest of its own. To know this is the issued file, compare the digest with the one given with the issued record.';

const NO_APP = 'If this message stays, the live Loadtrace app did not start in this page: JavaScript is off, or the file was altered so that the browser refused its code. What follows is the copy written into the file, and nothing on this page has been checked.';

function sealLine(lines: RecordLines): string {
  const digest = `Record SHA-256 <code id="${DIGEST_ID}">${escapeHtml(lines.recordDigest ?? '')}</code>.`;
  const k = lines.known;
  let said: string;
  if (k.kind === 'printout') {
    return '<p class="lt-seal lt-seal-printout" id="lt-seal-line">Calc sheets printed by Loadtrace from the sheet as computed: a printout, with no seal of its own. The record file (.html) is what can be checked.</p>';
  }
  if (k.kind === 'unchecked') {
    said = `<strong>Not verified:</strong> this page cannot check itself. Open the file in Loadtrace with JavaScript on, or run <code>${
      VERIFY_COMMAND}</code>, to check that no byte of it changed since it was written.`;
  } else if (!k.verified) {
    said = `<strong>Altered:</strong> when this file was opened, Loadtrace found it was changed after it was written${k.problem ? ` (${escapeHtml(k.problem)})` : ''}.`;
  } else {
    said = k.changedSince
      ? '<strong>Verified when opened</strong>, but the sheet was changed since: this printout is not the record\'s content.'
      : '<strong>Verified</strong> by Loadtrace when this file was opened: every part as written.';
  }
  return `<p class="lt-seal lt-seal-${k.kind === 'unchecked' ? 'unchecked' : k.verified ? 'verified' : 'altered'}" id="lt-seal-line">${
    lines.recordDigest === undefined ? '' : `${digest} `}${said} <span class="lt-seal-means">${SEAL_MEANING}</span></p>`;
}

/** The state line, the seal line and (in the file as written) the no-app message, for the top of the static page. */
export function recordLinesHtml(lines: RecordLines): string {
  const s = lines.state;
  const noApp = lines.known.kind === 'unchecked' ? `<p class="lt-noapp" id="lt-noapp" role="alert">${NO_APP}</p>` : '';
  return `${noApp}<p class="lt-state lt-state-${s.kind}" data-state="${s.kind}"><strong>${escapeHtml(stateTitle(s))}.</strong> ${
    escapeHtml(stateSentence(s))}</p>${sealLine(lines)}`;
}

/** Styles of these lines, with the static rendering's. */
export const RECORD_LINES_CSS = `
.lt-noapp, .lt-state, .lt-seal { font: 13px/1.45 system-ui, sans-serif; margin: 0 0 .7rem; padding: .45rem .7rem; overflow-wrap: anywhere; }
.lt-noapp { border: 2px solid #8a5a00; background: #fff4d6; font-weight: 600; }
html.lt-app-running .lt-noapp { display: none; }
.lt-state { border: 1.5px solid #1b2129; }
.lt-state-issued { border-color: #1d6638; }
.lt-state-draft, .lt-state-changed, .lt-state-review-copy { border-color: #a0171b; background: #fbeeee; }
.lt-seal { color: #59606c; border-left: 3px solid #b9b09a; }
.lt-seal code { font-size: 11.5px; }
.lt-seal-altered { color: #1b2129; border-left-color: #a0171b; background: #fbeeee; }
.lt-seal-means { display: block; font-size: 12px; }
@media print { .lt-noapp { display: none; } .lt-state, .lt-seal { font-size: 8pt; padding: 1mm 2mm; } }
`;

/** The lines for a static page: as given, or the sheet's state with nothing known of a file. */
export function staticRecordLines(doc: CalcDocument, results: ResultLookup, lines?: RecordLines): string {
  return recordLinesHtml(lines ?? { state: recordState(doc, { results }), known: { kind: 'unchecked' } });
}
