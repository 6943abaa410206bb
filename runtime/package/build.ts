// A calc package: a project's sheets in one self-contained HTML file. The front (cover,
// contents, revision log, codes and references cited), then each sheet's static record
// rendering, each on sheets of its own with its title block in the page margins and
// "sheet n of m" counted across the whole package. Each sheet's document is embedded as
// data with its SHA-256; a manifest lists the digest of every document and of every part
// as rendered, and the manifest's own digest is the package's seal (runtime/package/seal.ts).
// The record's Content-Security-Policy with no script at all: it reads with JavaScript off.

import type { CalcDocument } from '../document';
import type { CellState } from '../engine-types';
import type { LibraryCall } from '../library/call';
import { serialize } from '../format/index';
import { encodeDataBlock, escapeHtml } from '../record/escape';
import { DOC_TYPE, recordCsp } from '../record/layout';
import { sha256Hex } from '../record/seal';
import { STATIC_CSS, pageCss } from '../record/static-css';
import { staticHtml } from '../record/static-html';
import { gatherCitations } from './citations';
import { PACKAGE_CSS } from './css';
import { frontHtml, type PackageInfo, type SheetNumbers } from './front';
import { MANIFEST_ID, MANIFEST_TYPE, PACKAGE_VERSION, fenced, sheetDocId, type PackageManifest } from './manifest';

export interface PackageSheet {
  doc: CalcDocument;
  state: (id: string) => CellState | undefined;
  calls?: (id: string) => LibraryCall[];
  /** The file the sheet came from (its name only). */
  file: string;
}

/** A package's parts as rendered, before they are put in one file. */
export interface PackageParts {
  front: string;
  sheets: string[];
  docTexts: string[];
  docDigests: string[];
  css: string;
}

/** A sheet's rendering with its cell anchors made its own (the package holds several sheets' cells). */
function ownAnchors(html: string, n: number): string {
  return html.replaceAll(' id="lt-c-', ` id="s${n}-lt-c-`).replaceAll(' href="#lt-c-', ` href="#s${n}-lt-c-`);
}

/** The page name a part prints on: its title block in the margins. */
const pageName = (n: number | 'front') => (n === 'front' ? 'lt-front' : `lt-sheet-${n}`);

/** Renders every part; `numbers` fills the contents' sheet numbers (absent before they are known). */
export async function packageParts(sheets: readonly PackageSheet[], info: PackageInfo, numbers?: SheetNumbers): Promise<PackageParts> {
  const docTexts = sheets.map((s) => serialize(s.doc));
  const docDigests = await Promise.all(docTexts.map((t) => sha256Hex(t)));
  const rendered = sheets.map((s, i) => ownAnchors(staticHtml(s.doc, s.state, {
    digest: docDigests[i], exportedAt: info.writtenAt, calls: s.calls, id: `lt-sheet-${i + 1}`,
  }), i + 1));
  const front = frontHtml(info, sheets, gatherCitations(sheets), numbers);
  const frontMeta = { ...info.meta, subject: `${info.title}: cover, contents, revisions, references` };
  const css = [
    STATIC_CSS, PACKAGE_CSS,
    pageCss(frontMeta, pageName('front')), `#lt-front { page: ${pageName('front')}; }`,
    ...sheets.map((s, i) => `${pageCss(s.doc.meta, pageName(i + 1))}\n#lt-sheet-${i + 1} { page: ${pageName(i + 1)}; }`),
  ].join('\n');
  return { front, sheets: rendered, docTexts, docDigests, css };
}

/**
 * One HTML file of the given parts: all of them (the package), or only some (the CLI
 * prints parts alone to learn how many sheets each takes). Async for the digests.
 */
export async function packageHtml(
  parts: PackageParts, info: PackageInfo, files: readonly string[],
  only: { front: boolean; sheets: readonly number[] } = { front: true, sheets: parts.sheets.map((_s, i) => i) },
): Promise<{ html: string; seal: string; manifest: PackageManifest }> {
  const manifest: PackageManifest = {
    format: 'loadtrace-package',
    version: PACKAGE_VERSION,
    title: info.title,
    project: info.meta.project,
    job: info.meta.job,
    revision: info.meta.revision,
    writtenAt: info.writtenAt,
    front: only.front ? await sha256Hex(parts.front) : undefined,
    sheets: await Promise.all(only.sheets.map(async (i) => ({
      n: i + 1, file: files[i] ?? '', document: parts.docDigests[i], rendering: await sha256Hex(parts.sheets[i]),
    }))),
  };
  const manifestText = JSON.stringify(manifest, null, 1);
  const seal = await sha256Hex(manifestText);
  const docs = only.sheets.map((i) =>
    `<script type="${DOC_TYPE}" id="${sheetDocId(i + 1)}" data-sha256="${parts.docDigests[i]}">${encodeDataBlock(parts.docTexts[i])}</script>`);
  const body = [
    only.front ? fenced('front', `<div class="lt-pkg-part">${parts.front}</div>`) : '',
    ...only.sheets.map((i) => fenced(`sheet-${i + 1}`, `<div class="lt-pkg-part lt-pkg-sheet">${parts.sheets[i]}</div>`)),
  ].filter(Boolean);
  const title = [info.meta.job, info.title].filter((s) => s.trim() !== '').join(' · ').slice(0, 200) || 'Calc package';
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="${escapeHtml(recordCsp([]))}">
<meta name="referrer" content="no-referrer">
<meta name="loadtrace-package" content="${PACKAGE_VERSION}">
<title>${escapeHtml(title)} — calc package</title>
<script type="${MANIFEST_TYPE}" id="${MANIFEST_ID}" data-sha256="${seal}">${encodeDataBlock(manifestText)}</script>
${docs.join('\n')}
<style>${parts.css}</style></head>
<body class="lt-pkg">
${body.join('\n')}
</body></html>
`;
  return { html, seal, manifest };
}
