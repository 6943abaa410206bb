// Recently solved unit plates, keyed by (b/a, edges, ν, mesh): formulas re-evaluate
// often with the same panel, and a solve costs milliseconds.

import type { EdgeCode } from './edges';
import { solveUnitPlate, type UnitPlate } from './unit';

/**
 * More than the points of a sweep (MAX_STEPS, 200, in runtime/graph/sweep-program.ts):
 * re-running a sweep over a panel's span then finds every plate again. A unit plate
 * kept is ~15 KiB at the default mesh (measured in Node), so a full cache is a few MB.
 */
export const PLATE_CACHE_LIMIT = 256;
const cache = new Map<string, UnitPlate>();

export function cachedUnitPlate(ratio: number, edges: EdgeCode, nu: number, n: number): UnitPlate {
  const key = `${ratio.toPrecision(12)}|${edges.join('')}|${nu}|${n}`;
  const hit = cache.get(key);
  if (hit) {
    cache.delete(key); // re-insert: Map order doubles as least-recently-used order
    cache.set(key, hit);
    return hit;
  }
  const sol = solveUnitPlate(ratio, edges, nu, n);
  cache.set(key, sol);
  if (cache.size > PLATE_CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
  return sol;
}

export function clearPlateCache(): void {
  cache.clear();
}
