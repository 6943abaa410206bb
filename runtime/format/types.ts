// Shapes shared by the text-format reader and writer, and the contract each
// cell kind fills in so that adding a kind is one small module under kinds/.

import type { Cell } from '../document';

/** A problem found while reading a document's text. Line and column are 1-based. */
export interface FormatError {
  line: number;
  /** 1-based, counted in UTF-16 code units (as editors report it). */
  column: number;
  message: string;
}

/** Outcome of reading one value: the decoded text, or why it could not be read. */
export type Decoded =
  | { ok: true; value: string }
  | { ok: false; message: string; column: number };

/** One attribute line kind (`unit`, `label`, `choice`, ...) of a cell kind. */
export interface AttrSpec<C extends Cell> {
  key: string;
  /** May appear more than once (values kept in order). */
  repeatable?: boolean;
  /** Plain values to write, in order; [] when the field is absent. */
  write(cell: C): string[];
  /** Stores one decoded value; returns a message when the value is not acceptable. */
  read(cell: C, value: string): string | undefined;
}

/** The part of the header line after `<kind> <id>`. */
export interface HeaderSpec<C extends Cell> {
  /** Encoded header text after the id, or '' when the kind has none. */
  write(cell: C): string;
  /**
   * Builds the cell (required fields only) from the header text after the id.
   * `column` is the 1-based column where `tail` starts on its line.
   */
  read(id: string, tail: string, column: number): { ok: true; cell: C } | { ok: false; message: string; column: number };
}

/** Free-text lines (`  | ...`) that belong to the cell, e.g. a note's text. */
export interface BodySpec<C extends Cell> {
  write(cell: C): string[];
  read(cell: C, lines: string[]): void;
}

/** Everything the reader and writer need to know about one cell kind. */
export interface KindFormat<C extends Cell> {
  kind: C['kind'];
  header: HeaderSpec<C>;
  /** Attribute lines, in the order they are written. */
  attrs: AttrSpec<C>[];
  body?: BodySpec<C>;
}
