// Shared by the CLI tests: `npm run calc` in-process, and a scratch folder with the stub
// app shell as LOADTRACE_SHELL (so exporting a record builds nothing).

import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { parseArgs } from '../../runtime/cli/args';
import { runCalc } from '../../runtime/cli/main';
import { STUB_SHELL } from '../record/fixtures';

export async function calc(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await runCalc(parseArgs(argv), (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

/** A scratch folder for the file's tests, with the stub shell in use; returns its path getter. */
export function scratchWithStubShell(name: string): () => string {
  let dir = '';
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), `loadtrace-${name}-`));
    writeFileSync(join(dir, 'shell.html'), STUB_SHELL);
    process.env.LOADTRACE_SHELL = join(dir, 'shell.html');
  });
  afterAll(() => {
    delete process.env.LOADTRACE_SHELL;
    rmSync(dir, { recursive: true, force: true });
  });
  return () => dir;
}
