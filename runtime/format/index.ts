// The Loadtrace document text format: see FORMAT.md beside this file.

export { parse, type ParseResult } from './parse';
export { serialize, serializeCell } from './serialize';
export { FORMAT_TAG, FORMAT_VERSION } from './meta';
export type { FormatError, KindFormat, AttrSpec, HeaderSpec, BodySpec } from './types';
