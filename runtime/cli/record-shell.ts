// The app shell the CLI packs records into: dist-record/record-shell.html, built on
// demand (npm run build:record) when it is missing or older than the app's sources.
// LOADTRACE_SHELL=path uses a given shell instead.

import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
export const SHELL_FILE = join(ROOT, 'dist-record/record-shell.html');

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

export function buildShell(): void {
  const vite = join(ROOT, 'node_modules/.bin/vite');
  const r = spawnSync(vite, ['build', '--config', 'cells/record/vite.config.ts', '--logLevel', 'warn'], {
    cwd: ROOT, encoding: 'utf8', env: { ...process.env, VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' },
  });
  if (r.status !== 0) throw new Error(`building the record shell failed:\n${r.stdout}\n${r.stderr}`);
}

/** The shell's HTML; builds it first when needed (`note` hears about it). */
export function recordShellFile(note: (s: string) => void): string {
  const given = process.env.LOADTRACE_SHELL;
  if (given) return readFileSync(given, 'utf8');
  if (!existsSync(SHELL_FILE) || statSync(SHELL_FILE).mtimeMs < newestSource()) {
    note('building the record shell (npm run build:record)…');
    buildShell();
  }
  return readFileSync(SHELL_FILE, 'utf8');
}
