// The codes and references a package lists, gathered from the clauses its sheets use
// (runtime/package/citations.ts): which source a clause text names, the items cited, the
// edition an argument selects, and what a small sheet ends up citing.

import { describe, expect, it } from 'vitest';
import { createEngine } from '../../runtime/engine';
import { parse } from '../../runtime/format/index';
import { citationsIn, clauseItems, gatherCitations } from '../../runtime/package/citations';
import { callsOf } from '../../runtime/working/calls';

const keys = (text: string) => citationsIn(text).map((c) => `${c.source.key}: ${c.items.join(' ')}`);

describe('citations in a clause text', () => {
  it('files each item under the code named before it', () => {
    // Two-way shear of ACI 318-19 §22.6 with the reduced live load of ASCE 7-22 §4.7 (the clause text of a template).
    expect(keys('ACI 318-19 §22.6.4.1, §13.2.7; ASCE 7-22 §4.7')).toEqual(['ACI 318-19: §22.6.4.1 §13.2.7', 'ASCE 7-22: §4.7']);
    // ASCE 7-22 numbers its tables and equations with a hyphen (Table 4.3-1, Eq. 4.7-1).
    expect(keys('ASCE 7-22 Table 4.3-1, Eq. 4.7-1')).toEqual(['ASCE 7-22: Table 4.3-1 Eq. 4.7-1']);
    expect(clauseItems('Tables 7.6.1.1, 8.6.1.1; §24.4.3.2 and Fig. 8.7.4.1.3')).toEqual(['Table 7.6.1.1', 'Table 8.6.1.1', '§24.4.3.2', 'Fig. 8.7.4.1.3']);
    expect(clauseItems('ASCE 7-22 Ch. 2 and 4')).toEqual(['Ch. 2', 'Ch. 4']);
  });

  it('cites the edition named first; another edition named as the alternative is not cited', () => {
    // vc_oneway's clause names ACI 318-14 §22.5.5.1 as what the edition argument selects.
    expect(keys("ACI 318-19 Table 22.5.5.1(c) with λs, ≤ 5λ√f'c bw d; edition '318-14': §22.5.5.1 Vc = 2λ√f'c bw d; (ACI 318-19 §13.2.6.2)"))
      .toEqual(['ACI 318-19: Table 22.5.5.1(c)', 'ACI 318-19: §13.2.6.2']);
    expect(keys("ASCE 7-22 §2.3.1 (edition '7-16': ASCE 7-16 §2.3.1, 1.6S)")).toEqual(['ASCE 7-22: §2.3.1']);
    // A text naming one edition only is cited as it stands (the working of a 318-14 branch).
    expect(keys('ACI 318-14 §22.5.5.1')).toEqual(['ACI 318-14: §22.5.5.1']);
  });

  it('knows the published references by author and year, and ignores words that cite nothing', () => {
    expect(keys('Terzaghi (1943); Das §3.3').map((k) => k.split(':')[0])).toEqual(['Terzaghi (1943)', 'Das']);
    expect(keys('common practice')).toEqual([]);
    expect(keys('geometry (common practice)')).toEqual([]);
  });
});

const SHEET = (edition: string) => `loadtrace 1
project   Test
note n0
  | Codes followed: ASCE 7-16 is only mentioned here, in a note, and a note cites nothing.

input i1  fc = 4000 psi
input i2  B = 10 ft
input i3  d = 20 in
input i4  edition = ${edition}
  choice 318-19
  choice 318-14

formula f1  phiVc = 0.75 * vc_oneway(fc, B, d, 0.002, 1, edition)
  unit kip

check k1  100 kip <= phiVc
  label  One-way shear
  clause ACI 318-19 §22.5.1.1
`;

async function citedBy(text: string) {
  const doc = parse(text).doc;
  const engine = createEngine(doc);
  await engine.settled();
  try {
    return gatherCitations([{ doc, state: (id) => engine.state(id), calls: callsOf(engine) }]);
  } finally {
    engine.dispose();
  }
}

describe('what a sheet cites', () => {
  it("gathers the check's own clause and the library function's, not the notes' prose", async () => {
    const c = await citedBy(SHEET('318-19'));
    expect(c.map((x) => x.source.key)).toEqual(['ACI 318-19']);
    // The check's own clause (§22.5.1.1, one-way shear strength) and vc_oneway's table.
    expect(c[0].items).toEqual(expect.arrayContaining(['§22.5.1.1', 'Table 22.5.5.1(c)']));
    expect(c[0].sheets).toEqual([1]);
  });

  it('cites ACI 318-14 §22.5.5.1 when the edition argument took that branch (from the working)', async () => {
    const c = await citedBy(SHEET('318-14'));
    const aci14 = c.find((x) => x.source.key === 'ACI 318-14');
    expect(aci14?.items).toContain('§22.5.5.1');
    // ASCE 7-16 is only in the note's prose: not cited.
    expect(c.some((x) => x.source.key.startsWith('ASCE'))).toBe(false);
  });
});
