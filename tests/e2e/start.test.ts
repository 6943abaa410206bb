// A fresh clone's start (issue 19): `npm start` with no record shell built, then Export
// in Chromium writes a record. The dev server builds the shell itself (here into a
// scratch folder, LOADTRACE_SHELL_DIR, as dist-record/ would be on a fresh clone).

import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { serialize } from '../../runtime/format/index';
import { unpack } from '../../runtime/record/index';
import type { CalcDocument } from '../../runtime/document';
import { ROOT, artifactsDir, launch, type Browser } from './harness';

let server: ChildProcess | undefined;
let browser: Browser | undefined;
const scratch = mkdtempSync(join(tmpdir(), 'loadtrace-start-'));

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

afterAll(async () => {
  await browser?.close();
  // npm and the dev server under it: their own process group, started here.
  if (server?.pid && server.exitCode === null) process.kill(-server.pid, 'SIGTERM');
  rmSync(scratch, { recursive: true, force: true });
});

describe('npm start on a fresh clone', () => {
  it('serves the app, and Export writes a record with no build step run by hand', async () => {
    const shellDir = join(scratch, 'dist-record');
    const port = await freePort();
    server = spawn('npm', ['start', '--', '--port', String(port), '--strictPort', '--host', '127.0.0.1'], {
      cwd: ROOT, detached: true, stdio: ['ignore', 'pipe', 'pipe'],
      env: { ...process.env, BROWSER: 'none', LOADTRACE_SHELL_DIR: shellDir },
    });
    let said = '';
    server.stdout!.on('data', (d: Buffer) => (said += d));
    server.stderr!.on('data', (d: Buffer) => (said += d));
    const url = `http://127.0.0.1:${port}/`;
    for (const deadline = Date.now() + 60_000; ;) {
      if (server.exitCode !== null) throw new Error(`npm start exited early:\n${said}`);
      if (await fetch(url).then((r) => r.ok, () => false)) break;
      if (Date.now() > deadline) throw new Error(`npm start did not serve the app:\n${said}`);
      await new Promise((r) => setTimeout(r, 200));
    }

    browser = await launch();
    const page = browser.context.pages()[0] ?? (await browser.context.newPage());
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    await page.goto(url);
    await page.waitForFunction(() => (window as any).loadtrace?.engine && document.querySelectorAll('#cells article').length > 0, null, { timeout: 90_000 });
    const doc = await page.evaluate(() => (window as any).loadtrace.doc) as CalcDocument;

    const download = page.waitForEvent('download', { timeout: 120_000 });
    await page.locator('.toolbar [data-record="export"]').click();
    // The download, or the message the app shows when it cannot export (then the test says it).
    const refused = page.locator('#lt-record-banner:not([hidden])').waitFor({ timeout: 120_000 })
      .then(async () => `not exported: ${await page.locator('#lt-record-banner').textContent()}`, () => new Promise<never>(() => {}));
    const first = await Promise.race([download, refused]);
    expect(typeof first === 'string' ? first : 'downloaded').toBe('downloaded');
    const file = join(scratch, 'exported.html');
    await (await download).saveAs(file);
    const html = readFileSync(file, 'utf8');
    const record = await unpack(html);
    expect(record.ok).toBe(true);
    expect(record.docText).toBe(serialize(doc));
    expect(html).toContain('id="lt-static"');
    expect(existsSync(join(shellDir, 'record-shell.txt'))).toBe(true); // built by the start path
    expect(errors).toEqual([]);
    await page.screenshot({ path: join(artifactsDir(), 'start-export.png') });
  }, 240_000);
});
