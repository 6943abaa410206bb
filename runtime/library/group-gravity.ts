// The gravity part of the function library (loads, concrete and steel, slabs, flexure),
// gathered in one list for the engine.

import type { LibFunction } from './types';
import { functions as combinations } from './loads-combinations';
import { functions as tributary } from './loads-tributary';
import { functions as reduction } from './loads-reduction';
import { functions as accumulation } from './loads-accumulation';
import { functions as concrete } from './concrete';
import { functions as rebar } from './rebar';
import { functions as limits } from './reinforcement-limits';
import { functions as phi } from './resistance-factors';
import { functions as action } from './slab-action';
import { functions as thickness } from './slab-thickness';
import { functions as selfWeight } from './slab-self-weight';
import { functions as ddm } from './slab-ddm';
import { functions as flexure } from './flexure';
import { functions as ribbed } from './slab-ribbed';
import { functions as slabOnewayShear } from './slab-oneway-shear';
import { functions as slabIntegrity } from './slab-integrity';

export const gravityFunctions: LibFunction[] = [
  ...combinations, ...tributary, ...reduction, ...accumulation,
  ...concrete, ...rebar, ...limits, ...phi,
  ...action, ...thickness, ...selfWeight, ...ddm, ...flexure, ...ribbed, ...slabOnewayShear, ...slabIntegrity,
];
