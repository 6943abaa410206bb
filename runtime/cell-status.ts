// How a computed cell stands. A leaf of its own, so the document's review types and
// the engine's types can both name it without importing each other.

export type CellStatus = 'pending' | 'ok' | 'fail' | 'error';
