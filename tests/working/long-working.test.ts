// A working too long to list (the plate solver, a column's P–M interaction) shows its inputs,
// the method with its published reference, the key results and a figure: never the solver's
// thousands of operations. Counted here on the calls the main templates make.
import { describe, expect, it } from 'vitest';
import { libraryFunctions } from '../../runtime/library/index';
import type { LibValue } from '../../runtime/library/types';
import { workingOf, type Working } from '../../runtime/working/run';
import type { Entry, Group } from '../../runtime/working/recorder';
import { FIGURE_FUNCTIONS } from '../../runtime/figures/functions';
import { ft, inch, kip, kipFt, ksi, psi } from '../../runtime/units/si';

function run(name: string, ...args: LibValue[]): Working {
  const w = workingOf(libraryFunctions.find((f) => f.name === name)!, args);
  expect(w.error).toBeUndefined();
  return w;
}

function entries(g: Group, out: Entry[] = []): Entry[] {
  for (const e of g.entries as Entry[]) {
    out.push(e);
    if (e.kind === 'group') entries(e, out);
  }
  return out;
}

function expectShort(w: Working, reference: RegExp): void {
  const all = entries(w.root);
  const method = all.find((e) => e.kind === 'method');
  expect(method, 'the method is named').toBeDefined();
  expect(method && method.kind === 'method' && method.reference).toMatch(reference);
  const figure = all.find((e) => e.kind === 'figure');
  expect(figure, 'a figure is drawn').toBeDefined();
  if (figure?.kind === 'figure') expect(FIGURE_FUNCTIONS.some((f) => f.name === figure.fn), figure.fn).toBe(true);
  // Inputs, the method and the key results: a page at most, not one line per iteration.
  expect(all.filter((e) => e.kind === 'step').length).toBeLessThanOrEqual(40);
}

describe('long workings show the method, the key results and the figure', () => {
  it('plate coefficient of a 20 × 18 ft panel: the plate solver by its method and reference', () => {
    expectShort(run('plate_coef', 20 * ft, 18 * ft, 'SCCC', 'mx_max'), /Timoshenko/);
  });

  it('P–M interaction of a 20 × 20 in column, 12 #8, at Pu = 600 kip and Mu = 150 kip·ft: strain compatibility by its method', () => {
    const section = [5000 * psi, 60 * ksi, 20 * inch, 20 * inch, 4, 4, '#8', 2.5 * inch, '318-19'] as LibValue[];
    expectShort(run('col_pm_ratio', 600 * kip, 150 * kipFt, ...section), /ACI 318-19|§22\.2/);
    expectShort(run('col_phi_mn', 600 * kip, ...section), /ACI 318-19|§22\.2/);
  });
});
