// The engine's front door: `createEngine(doc)` with the structural library loaded.
import type { CalcDocument } from './document';
import type { Engine } from './engine-types';
import { createEngine as create, type EngineOptions } from './graph/engine';
import { libraryFunctions } from './library/index';

export type { Engine, CellState } from './engine-types';

export function createEngine(doc: CalcDocument, options: EngineOptions = {}): Engine {
  return create(doc, { functions: libraryFunctions, ...options });
}
