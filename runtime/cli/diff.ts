// `npm run calc -- A --diff B`: two records (e.g. two revisions of one calc) side by
// side, only what differs in inputs, results and checks. Exit 0 whatever differs.

import type { CalcDocument } from '../document';
import { createEngine } from '../engine';
import { diffRecords, diffText, onlyChanged } from '../review/index';

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
    const cmp = diffRecords({ doc: a.doc, results: (id) => ea.state(id) }, { doc: b.doc, results: (id) => eb.state(id) });
    out(json ? JSON.stringify({ a: a.name, b: b.name, ...onlyChanged(cmp) }, null, 2) : diffText(cmp, a.name, b.name));
  } finally {
    ea.dispose();
    eb.dispose();
  }
}
