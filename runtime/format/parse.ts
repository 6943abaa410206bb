// Text → document. Reads line by line; a broken block is reported and skipped,
// everything else still loads. Never throws, whatever the input.

import { emptyMeta, type CalcDocument, type Cell, type DocMeta } from '../document';
import { kindFormat, kindWords } from './kinds/index';
import { FORMAT_TAG, FORMAT_VERSION, metaField } from './meta';
import { WORKING_CHOICES, WORKING_KEYWORD, workingSetting, type WorkingSetting } from './settings';
import { decodeValue, isCellId } from './quote';
import { ReviewCollector, reviewBlockFormat } from './review/index';
import type { ReviewBlockFormat } from './review/block';
import type { AttrSpec, BodySpec, FormatError, KindFormat } from './types';

export interface ParseResult {
  doc: CalcDocument;
  errors: FormatError[];
}

/** A block being read (a cell, or a review block). A broken one is still read to the end, to report every fault. */
interface Draft {
  /** Kind keyword, for messages. */
  kind: string;
  attrs: Pick<AttrSpec<Cell>, 'key' | 'repeatable' | 'read'>[];
  text?: Pick<BodySpec<Cell>, 'read'>;
  /** The cell (or review item) the lines fill in. */
  cell: Cell;
  broken: boolean;
  /** Attribute key → line it first appeared on. */
  seen: Map<string, number>;
  body: string[];
  /** Stores the finished block. */
  keep(): void;
}

const firstWord = (text: string): string => /^[^ \t]*/.exec(text)![0];
const skipBlanks = (text: string, i: number): number => {
  while (text[i] === ' ' || text[i] === '\t') i++;
  return i;
};

class Reader {
  readonly errors: FormatError[] = [];
  readonly meta: DocMeta = emptyMeta();
  readonly cells: Cell[] = [];
  readonly review = new ReviewCollector();
  private readonly metaLines = new Map<string, number>();
  working: WorkingSetting | undefined;
  private readonly ids = new Map<string, number>();
  /** The current block: a draft, 'skip' after a header we could not read, null between blocks. */
  private block: Draft | 'skip' | null = null;
  private cellSeen = false;
  private orphanReported = false;
  private headerSeen = false;

  private report(line: number, column: number, message: string): void {
    this.errors.push({ line, column, message });
  }

  read(text: string): void {
    const lines = text.replace(/^\uFEFF/, '').replace(/\r\n/g, '\n').split('\n');
    lines.forEach((raw, i) => this.readLine(i + 1, raw.replace(/[ \t]+$/, '')));
    this.finishBlock();
    if (!this.headerSeen) this.errors.unshift({ line: 1, column: 1, message: `missing "${FORMAT_TAG} ${FORMAT_VERSION}" header` });
  }

  private readLine(n: number, text: string): void {
    if (text === '') {
      this.finishBlock();
      this.orphanReported = false;
      return;
    }
    if (text.startsWith('#')) return; // comment
    if (!this.headerSeen) {
      this.headerSeen = true;
      if (firstWord(text) === FORMAT_TAG) return this.readVersion(n, text);
      this.report(n, 1, `the first line must be "${FORMAT_TAG} ${FORMAT_VERSION}"`);
    }
    if (text[0] === ' ' || text[0] === '\t') return this.readBodyLine(n, text);
    this.orphanReported = false;
    this.finishBlock();
    const word = firstWord(text);
    const field = metaField(word);
    const format = kindFormat(word);
    const reviewFormat = format ? undefined : reviewBlockFormat(word);
    if (format) this.readCellHeader(n, text, word, format);
    else if (reviewFormat) this.readReviewHeader(n, text, word, reviewFormat);
    else if (field) this.readMeta(n, text, word, field);
    else if (word === WORKING_KEYWORD) this.readWorking(n, text);
    else {
      this.report(n, 1, word === FORMAT_TAG
        ? `the "${FORMAT_TAG}" header may appear only once, on the first line`
        : `unknown keyword "${word}" (a block starts with ${kindWords()})`);
      this.block = 'skip';
    }
  }

  private readVersion(n: number, text: string): void {
    const at = skipBlanks(text, FORMAT_TAG.length);
    const version = text.slice(at);
    if (version === '') this.report(n, at + 1, 'missing format version');
    else if (!/^[0-9]+$/.test(version)) this.report(n, at + 1, `bad format version "${version}"`);
    else if (Number(version) !== FORMAT_VERSION) {
      this.report(n, at + 1, `unsupported format version ${version} (this reader knows version ${FORMAT_VERSION})`);
    }
  }

  private readMeta(n: number, text: string, word: string, field: keyof DocMeta): void {
    if (this.cellSeen) {
      this.report(n, 1, `title-block line "${word}" must come before the first cell`);
      this.block = 'skip';
      return;
    }
    const at = skipBlanks(text, word.length);
    const value = decodeValue(text.slice(at), at + 1, word);
    if (!value.ok) return this.report(n, value.column, value.message);
    const first = this.metaLines.get(word);
    if (first !== undefined) return this.report(n, 1, `duplicate "${word}" line (first on line ${first})`);
    this.metaLines.set(word, n);
    this.meta[field] = value.value;
  }

  private readWorking(n: number, text: string): void {
    if (this.cellSeen) {
      this.report(n, 1, `setting line "${WORKING_KEYWORD}" must come before the first cell`);
      this.block = 'skip';
      return;
    }
    const at = skipBlanks(text, WORKING_KEYWORD.length);
    const value = text.slice(at);
    const setting = workingSetting(value);
    if (!setting) return this.report(n, at + 1, `"${WORKING_KEYWORD}" takes ${WORKING_CHOICES.join(', ')}; got "${value}"`);
    if (this.working !== undefined) return this.report(n, 1, `duplicate "${WORKING_KEYWORD}" line`);
    this.working = setting;
  }

  private readCellHeader(n: number, text: string, word: string, format: KindFormat<Cell>): void {
    this.cellSeen = true;
    this.block = 'skip';
    const idAt = skipBlanks(text, word.length);
    if (idAt === text.length) return this.report(n, word.length + 2, `missing id after "${word}"`);
    const id = /^[^ \t]*/.exec(text.slice(idAt))![0];
    if (!isCellId(id)) return this.report(n, idAt + 1, `bad id "${id}" (use letters, digits, _ and -)`);
    const tailAt = skipBlanks(text, idAt + id.length);
    const head = format.header.read(id, text.slice(tailAt), tailAt + 1);
    if (!head.ok) return this.report(n, head.column, head.message);
    const cell = head.cell;
    const draft: Draft = {
      kind: format.kind, attrs: format.attrs, text: format.body, cell, broken: false, seen: new Map(), body: [],
      keep: () => this.cells.push(cell),
    };
    const first = this.ids.get(id);
    if (first !== undefined) {
      this.report(n, idAt + 1, `duplicate id "${id}" (first on line ${first})`);
      draft.broken = true;
    } else this.ids.set(id, n);
    this.block = draft;
  }

  /** `issue`, `remark`, `reply`, `signoff`: same layout as a cell block, own ids (FORMAT.md, "Review"). */
  private readReviewHeader(n: number, text: string, word: string, format: ReviewBlockFormat<unknown>): void {
    this.cellSeen = true;
    this.block = 'skip';
    const idAt = skipBlanks(text, word.length);
    if (idAt === text.length) return this.report(n, word.length + 2, `missing id after "${word}"`);
    const id = /^[^ \t]*/.exec(text.slice(idAt))![0];
    if (!isCellId(id)) return this.report(n, idAt + 1, `bad id "${id}" (use letters, digits, _ and -)`);
    const tailAt = skipBlanks(text, idAt + id.length);
    const opened = this.review.open({ keyword: word, id, idColumn: idAt + 1, tail: text.slice(tailAt), tailColumn: tailAt + 1, line: n });
    if (!opened.ok) return this.report(n, opened.column, opened.message);
    this.block = {
      kind: word, attrs: format.attrs as unknown as Draft['attrs'], text: format.text as unknown as Draft['text'],
      cell: opened.target as Cell, broken: false, seen: new Map(), body: [], keep: opened.keep,
    };
  }

  private readBodyLine(n: number, text: string): void {
    const block = this.block;
    if (block === 'skip') return;
    if (block === null) {
      if (!this.orphanReported) {
        this.report(n, 1, 'indented line outside a cell (attributes and | text belong under a cell header, with no blank line between)');
      }
      this.orphanReported = true;
      return;
    }
    const indent = skipBlanks(text, 0);
    const content = text.slice(indent);
    const column = indent + 1;
    const fail = (col: number, message: string): void => {
      this.report(n, col, message);
      block.broken = true;
    };
    if (content.startsWith('|')) {
      if (!block.text) return fail(column, `a ${block.kind} has no text lines (| lines belong in a note)`);
      if (content === '|') {
        block.body.push('');
        return;
      }
      if (content[1] !== ' ') return fail(column + 1, 'expected a space after |');
      const line = content.slice(2);
      if (!line.startsWith('"')) {
        block.body.push(line);
        return;
      }
      const value = decodeValue(line, column + 2, 'text line');
      if (!value.ok) return fail(value.column, value.message);
      block.body.push(value.value);
      return;
    }
    const key = firstWord(content);
    const attr = block.attrs.find((a) => a.key === key);
    if (!attr) {
      const keys = block.attrs.map((a) => a.key).join(', ');
      return fail(column, `"${key}" is not an attribute of a ${block.kind} (expected ${keys})`);
    }
    const first = block.seen.get(key);
    if (first !== undefined && !attr.repeatable) return fail(column, `duplicate "${key}" (first on line ${first})`);
    if (first === undefined) block.seen.set(key, n);
    const at = skipBlanks(content, key.length);
    const value = decodeValue(content.slice(at), column + at, key);
    if (!value.ok) return fail(value.column, value.message);
    const problem = attr.read(block.cell, value.value);
    if (problem !== undefined) fail(column + at, problem);
  }

  private finishBlock(): void {
    const block = this.block;
    this.block = null;
    if (block === null || block === 'skip' || block.broken) return;
    block.text?.read(block.cell, block.body);
    block.keep();
  }
}

export function parse(text: string): ParseResult {
  const reader = new Reader();
  if (typeof text !== 'string') {
    return { doc: { meta: reader.meta, cells: [] }, errors: [{ line: 1, column: 1, message: 'input is not text' }] };
  }
  try {
    reader.read(text);
  } catch (e) {
    // Last line of defence: the fuzz tests assert this message never appears.
    reader.errors.push({ line: 1, column: 1, message: `internal error in the reader: ${String(e)}` });
  }
  const review = reader.review.result();
  const doc: CalcDocument = review ? { meta: reader.meta, cells: reader.cells, review } : { meta: reader.meta, cells: reader.cells };
  if (reader.working) doc.working = reader.working;
  return { doc, errors: reader.errors };
}
