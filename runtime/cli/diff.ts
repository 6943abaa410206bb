// `npm run calc -- A --diff B`: two records (e.g. two revisions of one calc) side by
// side, only what differs: title block, inputs, results, checks, comments and sign-offs.
// Exit 0 whatever differs.

import type { CalcDocument } from '../document';
import { createEngine } from '../engine';
import { diffRecords, diffReview, diffText, isEmptyReviewDiff, onlyChanged, reviewDiffLines } from '../review/index';

export interface DiffSide {
  /** As the person named it on the command line. */
  name: string;
  doc: CalcDocument;
}

/** Runs both documents and prints what differs; the engines are disposed after. */
export async function printDiff(a: DiffSide, b: DiffSide, json: boolean, out: (s: string) => void): Promise<void> {
  const ea = createEngine(a.doc);
  const eb = createEngine(b.doc);
  try {
    await Promise.all([ea.settled(), eb.settled()]);
    const cmp = onlyChanged(diffRecords({ doc: a.doc, results: (id) => ea.state(id) }, { doc: b.doc, results: (id) => eb.state(id) }));
    const review = diffReview(a.doc, b.doc);
    if (json) {
      out(JSON.stringify({ a: a.name, b: b.name, ...cmp, ...review }, null, 2));
      return;
    }
    const cells = cmp.inputs.length + cmp.results.length + cmp.checks.length > 0;
    if (!cells && isEmptyReviewDiff(review)) {
      out(`no differences in the title block, inputs, results, checks, comments or sign-offs between ${a.name} and ${b.name}`);
      return;
    }
    const lines = reviewDiffLines(review, a.name, b.name);
    out([...(cells ? [diffText(cmp, a.name, b.name)] : []), ...lines.titleBlock, ...lines.notes].join('\n'));
  } finally {
    ea.dispose();
    eb.dispose();
  }
}
