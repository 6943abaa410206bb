// Every structural function a formula can call, gathered from the topic groups.
import { gravityFunctions } from './group-gravity';
import { functions as plateFunctions } from './plate';
import { supportFunctions } from './group-support';
import type { LibFunction } from './types';

export const libraryFunctions: readonly LibFunction[] = [...gravityFunctions, ...supportFunctions, ...plateFunctions];
