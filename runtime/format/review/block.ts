// The contract each review block (issue, remark, reply, signoff) fills in. Same
// shape as a cell kind's (header, attribute lines, `|` text), so the one reader
// reads both; see FORMAT.md, "Review".

/** One attribute line kind of a review block. */
export interface ReviewAttr<T> {
  key: string;
  repeatable?: boolean;
  /** Stores one decoded value; returns a message when the value is not acceptable. */
  read(item: T, value: string): string | undefined;
}

export interface ReviewBlockFormat<T> {
  keyword: string;
  /** Encoded header text after `<keyword> <id>`, or ''. */
  writeHeader(item: T): string;
  /** Attribute lines in written order: [key, plain value] (the writer quotes as needed). */
  writeAttrs(item: T): [string, string][];
  attrs: ReviewAttr<T>[];
  /** `|` text lines, if the block has any. */
  text?: { write(item: T): string[]; read(item: T, lines: string[]): void };
}

/** An optional text field: no line when '', and '' when the line is absent. */
export function textLine<T>(key: string, get: (item: T) => string, set: (item: T, v: string) => void): ReviewAttr<T> & {
  write(item: T): [string, string][];
} {
  return {
    key,
    read: (item, value) => {
      set(item, value);
      return undefined;
    },
    write: (item) => (get(item) === '' ? [] : [[key, get(item)]]),
  };
}

/** Text held in `|` lines, as a note's: one line a line, '' has none. */
export function textBody<T>(get: (item: T) => string, set: (item: T, v: string) => void): NonNullable<ReviewBlockFormat<T>['text']> {
  return {
    write: (item) => (get(item) === '' ? [] : get(item).split('\n')),
    read: (item, lines) => set(item, lines.join('\n')),
  };
}
