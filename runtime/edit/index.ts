// Pure editing of a calc sheet: operations, undo history and saved-history deltas.

export * from './ops';
export * from './history';
export * from './delta';
export * from './source';
