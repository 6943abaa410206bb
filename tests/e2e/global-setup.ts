// Builds the app once for every end-to-end file (each used to build its own): the
// multi-file app, with the record shell in its dist-record/ (where the served app reads
// it for exporting, and where the record tests take it from).

import { rmSync } from 'node:fs';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { buildApp, buildRecordShell } from './harness';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The built app (see global-setup.ts). */
    appDist: string;
  }
}

export default function setup(project: TestProject): () => void {
  const dist = buildApp();
  buildRecordShell(join(dist, 'dist-record'));
  project.provide('appDist', dist);
  return () => rmSync(dist, { recursive: true, force: true });
}
