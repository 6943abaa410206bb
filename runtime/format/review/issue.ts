// `issue <label>`: one issued revision with its frozen baseline.
//   date / by / checker        who and when ('' fields have no line)
//   sheet    9f3c…              fingerprint of the sheet as issued (later edits show)
//   changed  i11 fc from="4000 psi" to="5000 psi"     one per input changed since the last issue
//   input    i11 fc = 5000 psi                        one per input, as typed
//   formula  f1 qu ok value=200 unit=psf text="200 psf"
//   check    k1 q_ok ok value=0.8 unit="" text=0.8 ratio=0.8
//   | description lines

import type { CellStatus } from '../../engine-types';
import type { InputRevised, IssuedResult, Revision } from '../../review/types';
import { decodeValue, encodeValue, isCellId, quote } from '../quote';
import { textBody, textLine, type ReviewAttr, type ReviewBlockFormat } from './block';
import { decodeNumber, encodeName, encodeNumber, encodeToken, Tokens } from './tokens';

const STATUSES: readonly CellStatus[] = ['ok', 'fail', 'error', 'pending'];

function checkedId(id: string, what: string): string {
  if (!isCellId(id)) throw new Error(`${what} id ${JSON.stringify(id)} is not [A-Za-z0-9_-]+`);
  return id;
}

/** Runs a line reader; a thrown message becomes the attribute's fault. */
function reading(run: () => void): string | undefined {
  try {
    run();
    return undefined;
  } catch (e) {
    if (typeof e === 'string') return e;
    throw e;
  }
}

function readId(t: Tokens, what: string): string {
  const tok = t.next(`${what} id`);
  if (tok.quoted || !isCellId(tok.text)) throw `bad ${what} id ${JSON.stringify(tok.text)} (use letters, digits, _ and -)`;
  return tok.text;
}

// ----- input lines: `<id> <name> = <value as typed>` -----

function writeInput(i: Revision['baseline']['inputs'][number]): string {
  return `${checkedId(i.id, 'input')} ${encodeName(i.name)} = ${encodeValue(i.value)}`;
}

function readInput(rev: Revision, line: string): string | undefined {
  return reading(() => {
    const t = new Tokens(line);
    const id = readId(t, 'input');
    const name = t.next('input name').text;
    const d = decodeValue(t.restAfterEquals(), 1, 'input value');
    if (!d.ok) throw d.message;
    rev.baseline.inputs.push({ id, name, value: d.value });
  });
}

// ----- changed lines: `<id> <name> [from=<v>] [to=<v>]` -----

function writeChanged(c: InputRevised): string {
  let s = `${checkedId(c.id, 'changed input')} ${encodeName(c.name)}`;
  if (c.from !== undefined) s += ` from=${encodeToken(c.from)}`;
  if (c.to !== undefined) s += ` to=${encodeToken(c.to)}`;
  return s;
}

function readChanged(rev: Revision, line: string): string | undefined {
  return reading(() => {
    const t = new Tokens(line);
    const c: InputRevised = { id: readId(t, 'input'), name: t.next('input name').text };
    const seen = new Set<string>();
    while (!t.done) {
      const { key, value } = t.pair();
      if (key !== 'from' && key !== 'to') throw `"${key}=" is not a part of a changed line (expected from=, to=)`;
      if (seen.has(key)) throw `${key}= given twice`;
      seen.add(key);
      c[key] = value.text;
    }
    rev.changedInputs.push(c);
  });
}

// ----- result lines: `<id> <name|-> <status> [value=] [unit=] [text=] [ratio=]` -----

function writeResult(r: IssuedResult): string {
  let s = `${checkedId(r.id, 'result')} ${r.name === undefined ? '-' : encodeName(r.name)} ${r.status}`;
  if (r.value !== undefined) {
    // A text value is always quoted, so it is never taken for a number or true/false.
    const v = r.value;
    s += ` value=${typeof v === 'number' ? encodeNumber(v) : typeof v === 'boolean' ? String(v) : quote(v)}`;
  }
  if (r.unit !== undefined) s += ` unit=${encodeToken(r.unit)}`;
  if (r.text !== undefined) s += ` text=${encodeToken(r.text)}`;
  if (r.ratio !== undefined) s += ` ratio=${encodeNumber(r.ratio)}`;
  return s;
}

function readResult(kind: IssuedResult['kind']) {
  return (rev: Revision, line: string): string | undefined =>
    reading(() => {
      const t = new Tokens(line);
      const id = readId(t, kind);
      const name = t.next(`${kind} name`);
      const status = t.next('status').text as CellStatus;
      if (!STATUSES.includes(status)) throw `status must be ${STATUSES.join(', ')}, not ${JSON.stringify(status)}`;
      const r: IssuedResult = { id, kind, status };
      if (name.quoted || name.text !== '-') r.name = name.text;
      const seen = new Set<string>();
      while (!t.done) {
        const { key, value } = t.pair();
        if (seen.has(key)) throw `${key}= given twice`;
        seen.add(key);
        if (key === 'unit' || key === 'text') r[key] = value.text;
        else if (key === 'value') {
          if (value.quoted) r.value = value.text;
          else if (value.text === 'true' || value.text === 'false') r.value = value.text === 'true';
          else r.value = number(value.text, 'value');
        } else if (key === 'ratio') {
          if (value.quoted) throw 'ratio must be a number';
          r.ratio = number(value.text, 'ratio');
        } else throw `"${key}=" is not a part of a ${kind} line (expected value=, unit=, text=, ratio=)`;
      }
      rev.baseline.results.push(r);
    });
}

function number(text: string, what: string): number {
  const n = decodeNumber(text);
  if (n === undefined) throw `${what} must be a number, true, false or a quoted text, not ${JSON.stringify(text)}`;
  return n;
}

const lines = (key: string, read: (rev: Revision, line: string) => string | undefined): ReviewAttr<Revision> =>
  ({ key, repeatable: true, read });

const date = textLine<Revision>('date', (r) => r.date, (r, v) => (r.date = v));
const by = textLine<Revision>('by', (r) => r.by, (r, v) => (r.by = v));
const checker = textLine<Revision>('checker', (r) => r.checkedBy, (r, v) => (r.checkedBy = v));
const sheet = textLine<Revision>('sheet', (r) => r.sheet ?? '', (r, v) => (r.sheet = v));

export const issueFormat: ReviewBlockFormat<Revision> = {
  keyword: 'issue',
  writeHeader: () => '',
  writeAttrs: (r) => [
    ...date.write(r),
    ...by.write(r),
    ...checker.write(r),
    ...sheet.write(r),
    ...r.changedInputs.map((c): [string, string] => ['changed', writeChanged(c)]),
    ...r.baseline.inputs.map((i): [string, string] => ['input', writeInput(i)]),
    ...r.baseline.results.map((x): [string, string] => [x.kind, writeResult(x)]),
  ],
  attrs: [
    date, by, checker, sheet,
    lines('changed', readChanged),
    lines('input', readInput),
    lines('formula', readResult('formula')),
    lines('check', readResult('check')),
  ],
  text: textBody<Revision>((r) => r.description, (r, v) => (r.description = v)),
};

export function newRevision(label: string): Revision {
  return { label, date: '', by: '', checkedBy: '', description: '', changedInputs: [], baseline: { inputs: [], results: [] } };
}
