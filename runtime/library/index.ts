// Every structural function a formula can call, gathered from the topic groups.
import type { LibFunction } from './types';

export const libraryFunctions: readonly LibFunction[] = [];
