// An error that belongs to one cell, in words an engineer understands.
import type { CellError as CellErrorData, ErrorKind } from '../engine-types';

export class CellError extends Error implements CellErrorData {
  override name = 'CellError';
  constructor(
    readonly kind: ErrorKind,
    message: string,
    readonly column?: number,
    readonly upstream?: string,
  ) {
    super(message);
  }

  toData(): CellErrorData {
    const d: CellErrorData = { kind: this.kind, message: this.message };
    if (this.column !== undefined) d.column = this.column;
    if (this.upstream !== undefined) d.upstream = this.upstream;
    return d;
  }
}
