// Each cell kind's source (read, written, applied as an edit) and live view (bound to
// the engine's state, rendered), from its description in runtime/kinds/.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CalcDocument, Cell } from '../../runtime/document';
import { emptyMeta } from '../../runtime/document';
import type { Engine } from '../../runtime/engine-types';
import { createEngine } from '../../runtime/engine';
import { applySource } from '../../runtime/edit/index';
import { bindCheck, check as checkKind, renderCheck, renderVerdict, type CheckView } from '../../runtime/kinds/check';
import { bindFormula, formula as formulaKind, renderFormula } from '../../runtime/kinds/formula';
import { bindInput, input as inputKind, renderInput } from '../../runtime/kinds/input';
import { bindNote, note as noteKind, renderNote } from '../../runtime/kinds/note';
import { bindSection, renderSection, section as sectionKind } from '../../runtime/kinds/section';
import type { ViewContext } from '../../runtime/present/cell-frame';
import { numberCells } from '../../runtime/present/numbering';

const sheet: CalcDocument = {
  meta: { ...emptyMeta(), project: 'Test sheet' },
  cells: [
    { id: 's1', kind: 'section', title: 'Floor loads' },
    { id: 'i1', kind: 'input', name: 'D', value: '120 psf', label: 'Dead load', clause: 'ASCE 7-22 §3.1' },
    { id: 'i2', kind: 'input', name: 'L', value: '50 psf' },
    { id: 'i3', kind: 'input', name: 'h', value: `1'-6"`, unit: 'in' },
    { id: 'f1', kind: 'formula', name: 'w_u', expr: '1.2 D + 1.6 L', unit: 'psf', clause: 'ASCE 7-22 §2.3.1' },
    { id: 'k1', kind: 'check', name: 'chk_w', expr: 'w_u <= 300 psf' },
    { id: 'k2', kind: 'check', expr: 'w_u <= 200 psf' },
    { id: 'n1', kind: 'note', text: 'Factored per **ASCE 7-22**.' },
    { id: 'f2', kind: 'formula', name: 'bad', expr: '1.2 * (D +' },
    { id: 'i4', kind: 'input', name: 'pos', value: 'interior', choices: ['interior', 'edge', 'corner'] },
  ],
};

let engine: Engine;
let ctx: (id: string) => ViewContext;

beforeAll(async () => {
  engine = createEngine(sheet);
  await engine.settled();
  const byName = new Map(sheet.cells.flatMap((c) => ('name' in c && c.name ? [[c.name, c.id] as const] : [])));
  const numbers = numberCells(sheet.cells);
  ctx = (id) => ({
    state: (i) => engine.state(i),
    scope: { isCell: (n) => byName.has(n), state: (n) => engine.state(byName.get(n) ?? '') },
    number: numbers.get(id) ?? '',
  });
});
afterAll(() => engine.dispose());

const cell = <K extends Cell['kind']>(id: string) => sheet.cells.find((c) => c.id === id) as Extract<Cell, { kind: K }>;

describe('section', () => {
  it('parses, serialises, binds, renders and edits', () => {
    expect(sectionKind.source.read('  Slab   design ')).toEqual({ ok: true, value: { title: 'Slab design' } });
    expect(sectionKind.source.read('  ')).toMatchObject({ ok: false, column: 1 });
    expect(sectionKind.source.write(cell<'section'>('s1'))).toBe('Floor loads');
    const v = bindSection(cell<'section'>('s1'), ctx('s1'));
    expect(v).toMatchObject({ number: '1', title: 'Floor loads', status: 'plain' });
    expect(renderSection({ ...v, title: '<b>x</b>' })).toContain('&lt;b&gt;x&lt;/b&gt;');
    expect(applySource(sheet, 's1', 'Loads').cells[0]).toMatchObject({ title: 'Loads' });
    expect(() => applySource(sheet, 's1', '')).toThrow(/needs a title/);
  });
});

describe('input', () => {
  it('parses name = value and reports where it is incomplete', () => {
    expect(inputKind.source.read(`h = 1'-6"`)).toEqual({ ok: true, value: { name: 'h', value: `1'-6"` } });
    expect(inputKind.source.read('= 5')).toMatchObject({ ok: false, column: 1 });
    expect(inputKind.source.read('h 5')).toMatchObject({ ok: false, column: 3 });
    expect(inputKind.source.read('h =')).toMatchObject({ ok: false, column: 4 });
    for (const id of ['i1', 'i3', 'i4']) {
      const c = cell<'input'>(id);
      expect(inputKind.source.read(inputKind.source.write(c))).toEqual({ ok: true, value: { name: c.name, value: c.value } });
    }
  });

  it('binds the typed value and what the engine shows in the display unit', () => {
    const v = bindInput(cell<'input'>('i3'), ctx('i3'));
    // 1 ft = 12 in exactly (NIST SP 811, Appendix B): 1'-6" = 18 in
    expect(v).toMatchObject({ value: `1'-6"`, shown: '18 in', status: 'ok', number: '1.3' });
    const plain = bindInput(cell<'input'>('i1'), ctx('i1'));
    expect(plain.shown).toBeUndefined(); // typed and shown read the same
    expect(plain.refs).toEqual(['ASCE 7-22 §3.1']);
    const html = renderInput(v);
    expect(html).toContain('value="1&#39;-6&quot;"');
    expect(html).toContain('class="katex"');
    expect(html).toContain('= 18 in');
  });

  it('renders a pick-list as a select', () => {
    const html = renderInput(bindInput(cell<'input'>('i4'), ctx('i4')));
    expect(html).toMatch(/<select[^>]*data-act="value"/);
    expect(html).toContain('<option selected>interior</option>');
  });

  it('shows a bad value inline while the last good value keeps computing', async () => {
    const bad = applySource(sheet, 'i1', 'D = 12 furlongs!');
    const e = createEngine(sheet);
    await e.settled();
    e.update(bad);
    await e.settled();
    const byName = new Map([['D', 'i1'], ['L', 'i2'], ['w_u', 'f1']]);
    const v = bindInput(bad.cells[1] as any, {
      state: (i) => e.state(i), number: '1.1',
      scope: { isCell: (n) => byName.has(n), state: (n) => e.state(byName.get(n)!) },
    });
    expect(v.status).toBe('error');
    expect(v.error?.message).toMatch(/"furlongs" is not a unit \(type a number with a unit/);
    expect(renderInput(v)).toContain('role="alert"');
    expect(v.stale).toBe(true);
    expect(renderInput(v)).toContain('still computing with 120 psf');
    // the dependent still has a value: 1.2 × 120 + 1.6 × 50 = 224 psf (ASCE 7-22 §2.3.1, combination 2)
    expect(e.state('f1')).toMatchObject({ status: 'ok', display: { text: '224 psf' } });
    e.dispose();
  });

  it('edits rename the cell and its readers', () => {
    const d = applySource(sheet, 'i1', 'DL = 100 psf');
    expect(d.cells[1]).toMatchObject({ name: 'DL', value: '100 psf' });
    expect(d.cells[4]).toMatchObject({ expr: '1.2 DL + 1.6 L' });
    expect(() => applySource(sheet, 'i1', 'L = 3')).toThrow(/already names/);
  });
});

describe('formula', () => {
  it('parses and serialises name = expression', () => {
    const c = cell<'formula'>('f1');
    expect(formulaKind.source.read(formulaKind.source.write(c))).toEqual({ ok: true, value: { name: 'w_u', expr: '1.2 D + 1.6 L' } });
    expect(formulaKind.source.read('w_u == 3')).toMatchObject({ ok: false });
  });

  it('binds the hand calc with values and the result', () => {
    const v = bindFormula(cell<'formula'>('f1'), ctx('f1'));
    // 1.2 × 120 psf + 1.6 × 50 psf = 224 psf (ASCE 7-22 §2.3.1, combination 2)
    expect(v.symbol).toBe('{w_{\\mathrm{u}}}');
    expect(v.parts).toEqual([
      '1.2~{D}+1.6~{L}',
      '1.2~\\left(120\\,\\mathrm{psf}\\right)+1.6~\\left(50\\,\\mathrm{psf}\\right)',
      '224\\,\\mathrm{psf}',
    ]);
    expect(v.refs).toEqual(['ASCE 7-22 §2.3.1']);
    const html = renderFormula(v);
    expect(html.match(/class="hc-step"/g)).toHaveLength(2); // symbolic head, then values and result
    expect(html).toContain('aria-label="w_u = 1.2 D + 1.6 L = 224 psf"');
    expect(html).toContain('class="katex"');
    expect(html).toContain('ASCE 7-22 §2.3.1');
  });

  it('shows an engine error at its column', () => {
    const v = bindFormula(cell<'formula'>('f2'), ctx('f2'));
    expect(v.status).toBe('error');
    expect(v.error).toMatchObject({ kind: 'syntax', source: '1.2 * (D +' });
    expect(v.error!.column).toBeGreaterThan(0);
    expect(renderFormula(v)).toMatch(/<mark class="err-at"/);
  });

  it("marks an engine error in the editor's source where the expression has it", async () => {
    // The error's column counts in the expression; the editor's source starts with `name = `.
    const f: Cell = { id: 'f1', kind: 'formula', name: 'M_u', expr: '2 * no_such' };
    const d: CalcDocument = { meta: emptyMeta(), cells: [f] };
    const e = createEngine(d);
    await e.settled();
    const error = e.state('f1')!.error!;
    e.dispose();
    const source = formulaKind.source.write(f);
    expect(source).toBe('M_u = 2 * no_such');
    expect(source.slice(formulaKind.source.errorAt(source, error.column!))).toBe('no_such');
    // A check without a name: the source is the condition itself.
    expect(checkKind.source.errorAt('w_u <= q', 8)).toBe(7);
    expect(sectionKind.source.errorAt('Floor loads', 1)).toBeUndefined();
  });

  it('edits expression and name', () => {
    const d = applySource(sheet, 'f1', 'w = 1.4 D');
    expect(d.cells[4]).toMatchObject({ name: 'w', expr: '1.4 D' });
    expect(d.cells[5]).toMatchObject({ expr: 'w <= 300 psf' });
  });
});

describe('check', () => {
  it('parses an optional name', () => {
    expect(checkKind.source.read('V_u <= phi_Vc')).toEqual({ ok: true, value: { expr: 'V_u <= phi_Vc' } });
    expect(checkKind.source.read('chk = a == b')).toEqual({ ok: true, value: { name: 'chk', expr: 'a == b' } });
    expect(checkKind.source.read('a == b')).toEqual({ ok: true, value: { expr: 'a == b' } });
    expect(checkKind.source.read('chk = ')).toMatchObject({ ok: false });
    for (const id of ['k1', 'k2']) {
      const c = cell<'check'>(id);
      const p = checkKind.source.read(checkKind.source.write(c));
      expect(p).toEqual({ ok: true, value: c.name ? { name: c.name, expr: c.expr } : { expr: c.expr } });
    }
  });

  it('binds pass and fail with ratio, in words and glyphs', () => {
    // 224 / 300 = 0.747 ≤ 1 → OK; 224 / 200 = 1.12 > 1 → NOT OK (arithmetic on the combination above)
    const pass = bindCheck(cell<'check'>('k1'), ctx('k1'));
    expect(pass).toMatchObject({ verdict: 'pass', demand: '224 psf', capacity: '300 psf' });
    expect(pass.ratio).toBeCloseTo(224 / 300, 6);
    const fail = bindCheck(cell<'check'>('k2'), ctx('k2'));
    expect(fail.verdict).toBe('fail');
    const passHtml = renderCheck(pass);
    expect(passHtml).toContain('✓</span> OK');
    expect(passHtml).toContain('ratio 0.75');
    expect(passHtml).toContain('aria-valuenow="0.747"');
    expect(renderCheck(fail)).toContain('✗</span> NOT OK');
    expect(pass.symbol).toBe('{\\text{chk}_{\\mathrm{w}}}:');
    expect(pass.steps.map((s) => s.rel)).toEqual(['', '\\Rightarrow', '\\quad']);
    expect(pass.steps[1].tex).toBe('224\\,\\mathrm{psf} \\le 300\\,\\mathrm{psf}');
  });

  it('draws the bar to 1.25 at most and nothing before a verdict', () => {
    const base: CheckView = { id: 'k', kind: 'check', status: 'fail', number: '', refs: [], symbol: '', steps: [], reading: '', verdict: 'fail', ratio: 3 };
    expect(renderVerdict(base)).toContain('width:100.0%');
    expect(renderVerdict({ ...base, ratio: 0.5, verdict: 'pass' })).toContain('width:40.0%');
    expect(renderVerdict({ ...base, verdict: undefined })).toBe('');
  });

  it('edits the condition', () => {
    expect(applySource(sheet, 'k2', 'w_u <= 250 psf').cells[6]).toMatchObject({ expr: 'w_u <= 250 psf' });
    expect(applySource(sheet, 'k1', 'w_u <= 250 psf').cells[5]).not.toHaveProperty('name');
  });
});

describe('note', () => {
  it('keeps any text and renders the Markdown subset', () => {
    expect(noteKind.source.read('a\n\n')).toEqual({ ok: true, value: { text: 'a' } });
    const c = cell<'note'>('n1');
    expect(noteKind.source.write(c)).toBe(c.text);
    const html = renderNote(bindNote(c, ctx('n1')));
    expect(html).toContain('<strong>ASCE 7-22</strong>');
    expect(applySource(sheet, 'n1', 'new text\n').cells[7]).toMatchObject({ text: 'new text' });
  });
});

describe('numberCells', () => {
  it('numbers sections and the computing cells under them', () => {
    const n = numberCells(sheet.cells);
    expect([...n.values()]).toEqual(['1', '1.1', '1.2', '1.3', '1.4', '1.5', '1.6', '', '1.7', '1.8']);
  });
});
