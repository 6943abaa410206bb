// The front of a calc package, before its sheets: the cover (project, job, revision, the
// engineer of record's block with room for the seal, the caution), the contents with each
// sheet's numbers, the revision log of every sheet, and the codes and references cited.

import type { CalcDocument, DocMeta } from '../document';
import type { CellState } from '../engine-types';
import { numberCells } from '../present/numbering';
import { escapeHtml } from '../present/escape';
import { summaryOf } from '../present/summary';
import { TITLE_LABELS } from '../present/title-block';
import { CAUTION } from '../record/static-html';
import type { Citation } from './citations';

/** The engineer of record, as the cover names them. */
export interface EngineerOfRecord {
  name: string;
  license: string;
  firm: string;
}

export interface PackageInfo {
  /** What the package is, e.g. "Gravity load path calculations". */
  title: string;
  /** The package's title block: project, job, revision, date (and who prepared and checked it). */
  meta: DocMeta;
  engineer: EngineerOfRecord;
  /** When it was written (ISO text). */
  writtenAt: string;
}

export interface FrontSheet {
  doc: CalcDocument;
  state: (id: string) => CellState | undefined;
  /** The file the sheet came from, as the contents names it. */
  file: string;
}

/** Where each part starts and how many sheets (printed pages) there are, once printed. */
export interface SheetNumbers {
  /** First and last sheet number of each calc sheet, in package order. */
  ranges: [number, number][];
  total: number;
  /** The paper these numbers hold for. */
  paper: string;
}

const orDash = (s: string) => escapeHtml(s) || '&#8212;';

function coverHtml(info: PackageInfo, sheets: readonly FrontSheet[], numbers?: SheetNumbers): string {
  const m = info.meta;
  const row = (k: keyof DocMeta) => `<tr><th>${TITLE_LABELS[k].label}</th><td data-meta="${k}">${orDash(m[k])}</td></tr>`;
  const e = info.engineer;
  const count = `${sheets.length} calc${sheets.length === 1 ? '' : 's'}${numbers ? `, ${numbers.total} sheets (${escapeHtml(numbers.paper)})` : ''}`;
  return `<section class="lt-pkg-cover" aria-label="Cover">
<p class="lt-pkg-kicker">Calculation package</p>
<h1>${orDash(info.title)}</h1>
<table class="lt-pkg-meta">${(['project', 'job', 'revision', 'date', 'preparedBy', 'checkedBy'] as const).map(row).join('')}
<tr><th>Contents</th><td>${count}</td></tr></table>
<div class="lt-pkg-eor" aria-label="Engineer of record">
<h2>Engineer of record</h2>
<table><tr><th>Name</th><td data-eor="name">${orDash(e.name)}</td></tr><tr><th>License</th><td data-eor="license">${orDash(e.license)}</td></tr><tr><th>Firm</th><td data-eor="firm">${orDash(e.firm)}</td></tr></table>
<div class="lt-pkg-seal">Seal and signature</div>
</div>
<p class="lt-caution" role="note">△ ${CAUTION}</p>
</section>`;
}

function contentsHtml(sheets: readonly FrontSheet[], numbers?: SheetNumbers): string {
  const rows = sheets.map((s, i) => {
    const summary = summaryOf(s.doc, s.state, numberCells(s.doc.cells));
    const range = numbers?.ranges[i];
    const at = range ? (range[0] === range[1] ? `${range[0]}` : `${range[0]}–${range[1]}`) : '—';
    return `<tr><td class="lt-pkg-n">${i + 1}</td><td><a href="#lt-sheet-${i + 1}">${orDash(s.doc.meta.subject || s.file)}</a><br><small>${
      escapeHtml(s.file)}</small></td><td>${orDash(s.doc.meta.job)}</td><td>${orDash(s.doc.meta.revision)}</td><td>${
      escapeHtml(summary?.count ?? 'no checks')}</td><td class="lt-pkg-at">${at}</td></tr>`;
  });
  const note = numbers
    ? `Sheet numbers as printed on ${escapeHtml(numbers.paper)}: every sheet of the package carries "sheet n of ${numbers.total}".`
    : 'Sheet numbers are given when the package is printed to PDF.';
  return `<section class="lt-pkg-contents" aria-label="Contents"><h2>Contents</h2>
<table><thead><tr><th>No.</th><th>Calc</th><th>Job no.</th><th>Rev.</th><th>Checks</th><th>Sheets</th></tr></thead><tbody>${rows.join('')}</tbody></table>
<p class="lt-pkg-note">${note}</p></section>`;
}

type Obj = Record<string, unknown>;
const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null && !Array.isArray(v);
const str = (v: unknown) => (typeof v === 'string' ? v : typeof v === 'number' ? String(v) : '');

/** Every sheet's issued revisions (read defensively: a record is untrusted data), then each sheet's revision now. */
function revisionLogHtml(sheets: readonly FrontSheet[]): string {
  const rows: string[] = [];
  sheets.forEach((s, i) => {
    const review = (s.doc as { review?: unknown }).review;
    const revisions = isObj(review) && Array.isArray(review.revisions) ? review.revisions.filter(isObj) : [];
    for (const r of revisions) {
      rows.push(`<tr><td>${i + 1}</td><td>${orDash(str(r.label))}</td><td>${orDash(str(r.date))}</td><td>${orDash(str(r.by))}</td><td>${
        orDash(str(r.checkedBy))}</td><td>${orDash(str(r.description).slice(0, 2000))}</td></tr>`);
    }
    if (revisions.length === 0) {
      rows.push(`<tr><td>${i + 1}</td><td>${orDash(s.doc.meta.revision)}</td><td>${orDash(s.doc.meta.date)}</td><td>${
        orDash(s.doc.meta.preparedBy)}</td><td>${orDash(s.doc.meta.checkedBy)}</td><td>Not yet issued through review: the title block's revision</td></tr>`);
    }
  });
  return `<section class="lt-pkg-revlog" aria-label="Revision log"><div class="lt-keep"><h2>Revision log</h2>
<table><thead><tr><th>Calc</th><th>Rev.</th><th>Date</th><th>By</th><th>Checked</th><th>Description</th></tr></thead><tbody>${rows.join('')}</tbody></table></div></section>`;
}

function referencesHtml(citations: readonly Citation[]): string {
  const item = (c: Citation) => `<li><span class="lt-pkg-src">${escapeHtml(c.source.title)}</span>${
    c.items.length ? `<br><span class="lt-pkg-items">${escapeHtml(c.items.join(', '))}</span>` : ''}<br><small>cited in calc${
    c.sheets.length === 1 ? '' : 's'} ${c.sheets.join(', ')}</small></li>`;
  const codes = citations.filter((c) => c.source.code);
  const refs = citations.filter((c) => !c.source.code);
  const list = (title: string, cs: readonly Citation[]) => (cs.length ? `<div class="lt-keep"><h3>${title}</h3><ul>${cs.map(item).join('')}</ul></div>` : '');
  return `<section class="lt-pkg-refs" aria-label="Codes and references cited"><h2>Codes and references cited</h2>
<p class="lt-pkg-note">Gathered from the clauses the calcs use: each cell's own clause, the library functions it calls and the steps of their working.</p>
${list('Code editions', codes)}${list('Published references', refs)}${citations.length ? '' : '<p>No code or published reference is cited.</p>'}</section>`;
}

/** The front matter as one sheet-like element, printed before the calc sheets. */
export function frontHtml(info: PackageInfo, sheets: readonly FrontSheet[], citations: readonly Citation[], numbers?: SheetNumbers): string {
  return `<div class="lt-static lt-pkg-front" id="lt-front" lang="en">${coverHtml(info, sheets, numbers)}
${contentsHtml(sheets, numbers)}
${revisionLogHtml(sheets)}
${referencesHtml(citations)}</div>`;
}
