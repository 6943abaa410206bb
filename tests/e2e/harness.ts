// Shared by the end-to-end tests and the UI benchmark: build the app once into a
// private folder, serve it with `vite preview`, drive the system Chromium.

import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, mkdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';

export const ROOT = resolve(import.meta.dirname, '../..');
export const ARTIFACTS = join(ROOT, 'test-artifacts');
const VITE = join(ROOT, 'node_modules/.bin/vite');

/** The CLI's PDF printing launches Chromium with the same flags. */
export { CHROMIUM_ARGS } from '../../runtime/cli/pdf';
import { CHROMIUM_ARGS } from '../../runtime/cli/pdf';

/** Builds the app into a fresh temporary folder and returns it. */
export function buildApp(extraEnv: Record<string, string> = {}): string {
  const outDir = mkdtempSync(join(tmpdir(), 'loadtrace-dist-'));
  const r = spawnSync(VITE, ['build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], {
    cwd: ROOT, encoding: 'utf8', env: { ...process.env, ...extraEnv },
  });
  if (r.status !== 0) throw new Error(`vite build failed:\n${r.stdout}\n${r.stderr}`);
  return outDir;
}

/** Builds the record shell (the single-file app) into `outDir`: record-shell.html and .txt. */
export function buildRecordShell(outDir: string): void {
  const r = spawnSync(VITE, ['build', '-c', 'cells/record/vite.config.ts', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'error'], {
    cwd: ROOT, encoding: 'utf8', env: { ...process.env, VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' },
  });
  if (r.status !== 0) throw new Error(`record shell build failed:\n${r.stdout}\n${r.stderr}`);
}

function freePort(): Promise<number> {
  return new Promise((res, rej) => {
    const srv = createServer();
    srv.once('error', rej);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => res(port));
    });
  });
}

export interface Served {
  url: string;
  stop(): void;
}

/** Serves a built folder with `vite preview` (its own binary, so no child outlives it). */
export async function serve(outDir: string): Promise<Served> {
  const port = await freePort();
  const child: ChildProcess = spawn(VITE, ['preview', '--outDir', outDir, '--port', String(port), '--strictPort', '--host', '127.0.0.1'], {
    cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'],
  });
  const url = `http://127.0.0.1:${port}/`;
  const deadline = Date.now() + 30_000;
  for (;;) {
    try {
      const r = await fetch(url);
      if (r.ok) break;
    } catch {
      /* not up yet */
    }
    if (child.exitCode !== null) throw new Error('vite preview exited early');
    if (Date.now() > deadline) throw new Error('vite preview did not start');
    await new Promise((r) => setTimeout(r, 150));
  }
  return {
    url,
    stop: () => {
      if (child.exitCode === null) child.kill('SIGTERM');
    },
  };
}

export interface Browser {
  context: BrowserContext;
  close(): Promise<void>;
}

/** Chromium with a fresh profile folder (IndexedDB lives there, so reloads keep it). */
export async function launch(): Promise<Browser> {
  const profile = mkdtempSync(join(tmpdir(), 'loadtrace-profile-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
    headless: true,
    viewport: { width: 1280, height: 900 },
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export function artifactsDir(): string {
  mkdirSync(ARTIFACTS, { recursive: true });
  return ARTIFACTS;
}
