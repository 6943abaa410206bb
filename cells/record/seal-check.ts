// A record page checks its own file against the record's seal: the tree the browser
// parsed from the file (as loaded, before the app changed anything; capture.ts), read
// part by part as the CLI reads the file with parse5. Hashing uses WebCrypto.
//
// What this can and cannot show: the page's code is fixed by its policy, so when the
// policy is the head's first element nothing else ran before this check, and any
// change to the file shows here. A script put before the policy runs first and could
// fake anything the page shows (it is reported when it stays in the page); the CLI,
// which reads the file without running it, cannot be fooled that way.

import { pageParts, verifyParts, type PartName, type RecordCheck } from '../../runtime/record/index';
import { loadedTree } from './capture';

export function checkLoadedPage(): Promise<RecordCheck> {
  return verifyParts(pageParts(loadedTree()));
}

/** The parts exporting again takes from this page: its code, styles and markup. */
const SHELL_PARTS: readonly PartName[] = ['page', 'app-css', 'app', 'editor', 'katex', 'loader'];

/** Why this page's own code must not be written into a new record, or undefined when it may. */
export function shellProblem(check: RecordCheck): string | undefined {
  if (check.version !== 2) return 'This record was written before whole files were sealed, so its code cannot be checked; export from the current Loadtrace instead.';
  const bad = check.parts.filter((p) => SHELL_PARTS.includes(p.part) && !p.ok).map((p) => p.label);
  if (bad.length === 0 && check.tampering.length === 0) return undefined;
  return `This file's own code or markup was altered (${[...bad, ...check.tampering].join('; ')}); a record written from it would carry the change. Export from an unaltered record or from the Loadtrace app.`;
}
