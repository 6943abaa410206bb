// The static page alone, for printing calc sheets (npm run calc -- --pdf): the record's
// static rendering with its styles under the record's policy, no app and no seal. It
// says it is a printout, not the record file (only the file carries the seal).

import type { CalcDocument } from '../document';
import type { CellState } from '../engine-types';
import { recordState } from '../review/state';
import { escapeHtml } from './escape';
import { recordCsp } from './layout';
import { recordTitle } from './pack';
import { RECORD_LINES_CSS } from './record-lines';
import { STATIC_CSS, pageCss } from './static-css';
import { staticHtml } from './static-html';
import type { LibraryCall } from '../working/calls';

export function printPageHtml(
  doc: CalcDocument, state: (id: string) => CellState | undefined, digest: string, exportedAt: string, calls?: (id: string) => LibraryCall[],
): string {
  const rendered = staticHtml(doc, state, { digest, exportedAt, calls, record: { state: recordState(doc, { results: state }), known: { kind: 'printout' } } });
  const policy = recordCsp([]).replace(/&/g, '&amp;').replace(/"/g, '&quot;');
  return `<!doctype html>
<html lang="en">
<head><meta http-equiv="Content-Security-Policy" content="${policy}"><meta charset="utf-8">
<title>${escapeHtml(recordTitle(doc.meta))}</title>
<style id="lt-static-style">${STATIC_CSS}\n${RECORD_LINES_CSS}\n${pageCss(doc.meta)}</style>
</head>
<body>${rendered}</body>
</html>`;
}
