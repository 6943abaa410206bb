// Edge conditions of a rectangular panel and the 4-letter code that names them.
//
// Code order (counter-clockwise from the left edge): x = 0, y = 0, x = a, y = b.
// Letters: S simply supported (w = 0, M_n = 0), C clamped (w = 0, ∂w/∂n = 0), F free.
// Example: 'SSSF' is supported on three sides with the edge y = b free.

import { LibraryError } from '../library/types';

export type EdgeCondition = 'S' | 'C' | 'F';
export type EdgeName = 'x0' | 'y0' | 'xa' | 'yb';
export type EdgeCode = readonly [EdgeCondition, EdgeCondition, EdgeCondition, EdgeCondition];

/** Edge names in code order. */
export const EDGE_NAMES: readonly EdgeName[] = ['x0', 'y0', 'xa', 'yb'];

export const EDGE_DOC = 'edges: 4 letters S/C/F for the edges x=0, y=0, x=a, y=b (in that order)';

export function parseEdges(code: string): EdgeCode {
  const c = String(code).trim().toUpperCase();
  if (!/^[SCF]{4}$/.test(c)) {
    throw new LibraryError(`edge code "${code}" must be 4 letters S, C or F (${EDGE_DOC})`);
  }
  return c.split('') as unknown as EdgeCode;
}

export function edgeIndex(name: string): number {
  const i = EDGE_NAMES.indexOf(name as EdgeName);
  if (i < 0) throw new LibraryError(`edge "${name}" must be one of ${EDGE_NAMES.join(', ')}`);
  return i;
}

/** True when the edge carries load (w = 0 along it). */
export function supports(c: EdgeCondition): boolean {
  return c !== 'F';
}
