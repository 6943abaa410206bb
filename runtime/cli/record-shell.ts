// The app shell records are packed into: dist-record/record-shell.html (and a .txt copy
// that servers hand over untouched), built (npm run build:record) when it is missing or
// older than the app's sources: on demand by the CLI, and by the dev server (npm start)
// when the app first asks for it. LOADTRACE_SHELL=path uses a given shell instead;
// LOADTRACE_SHELL_DIR=folder builds and reads it elsewhere than dist-record/.

import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');

/** Where the shell is built. */
export function shellDir(): string {
  return process.env.LOADTRACE_SHELL_DIR || join(ROOT, 'dist-record');
}

export const shellFile = (): string => join(shellDir(), 'record-shell.html');
export const shellText = (): string => join(shellDir(), 'record-shell.txt');

/** Newest modification time of the files the shell is built from. */
function newestSource(): number {
  let newest = 0;
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (/\.(ts|css|lt|html)$/.test(e.name)) newest = Math.max(newest, statSync(p).mtimeMs);
    }
  };
  for (const d of ['cells', 'runtime', 'docs-templates']) if (existsSync(join(ROOT, d))) walk(join(ROOT, d));
  for (const f of ['index.html', 'vite.config.ts', 'package-lock.json']) {
    if (existsSync(join(ROOT, f))) newest = Math.max(newest, statSync(join(ROOT, f)).mtimeMs);
  }
  return newest;
}

/** Is there no shell, or one older than a source it is built from? */
export function shellStale(): boolean {
  const file = shellText();
  return !existsSync(file) || statSync(file).mtimeMs < newestSource();
}

const buildArgs = (): string[] => ['build', '--config', 'cells/record/vite.config.ts', '--outDir', shellDir(), '--emptyOutDir', '--logLevel', 'warn'];
const buildEnv = (): NodeJS.ProcessEnv => ({ ...process.env, VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' });
const VITE = join(ROOT, 'node_modules/.bin/vite');

export function buildShell(): void {
  const r = spawnSync(VITE, buildArgs(), { cwd: ROOT, encoding: 'utf8', env: buildEnv() });
  if (r.status !== 0) throw new Error(`building the record shell failed:\n${r.stdout}\n${r.stderr}`);
}

/** The same build without blocking (the dev server keeps serving meanwhile). */
export function buildShellAsync(): Promise<void> {
  return new Promise((res, rej) => {
    const child = spawn(VITE, buildArgs(), { cwd: ROOT, env: buildEnv(), stdio: ['ignore', 'pipe', 'pipe'] });
    let said = '';
    child.stdout.on('data', (d: Buffer) => (said += d));
    child.stderr.on('data', (d: Buffer) => (said += d));
    child.on('error', rej);
    child.on('close', (code) => (code === 0 ? res() : rej(new Error(`building the record shell failed:\n${said}`))));
  });
}

/** The shell's HTML; builds it first when needed (`note` hears about it). */
export function recordShellFile(note: (s: string) => void): string {
  const given = process.env.LOADTRACE_SHELL;
  if (given) return readFileSync(given, 'utf8');
  if (shellStale()) {
    note('building the record shell (npm run build:record)…');
    buildShell();
  }
  return readFileSync(shellFile(), 'utf8');
}
