// `npm run bench:start`: `npm start` on a fresh clone, as a person meets it. Medians over
// RUNS starts (each with an empty record-shell folder, LOADTRACE_SHELL_DIR, as a clone has)
// of the time from typing the command
// - to the dev server answering,
// - to the app open in Chromium (the demo's cells on the page, the engine running),
// - to a record from the first Export (clicked as soon as the app is open, so it includes
//   waiting for the record shell the server builds).

import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { ROOT, launch } from '../tests/e2e/harness';

const RUNS = Number(process.env.RUNS ?? 5);
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const browser = await launch();
const served: number[] = [];
const open: number[] = [];
const exported: number[] = [];
for (let i = 0; i < RUNS; i++) {
  const shellDir = mkdtempSync(join(tmpdir(), 'loadtrace-bench-start-'));
  const port = 5600 + i;
  const t0 = performance.now();
  const child = spawn('npm', ['start', '--', '--port', String(port), '--strictPort', '--host', '127.0.0.1'], {
    cwd: ROOT, detached: true, stdio: 'ignore', env: { ...process.env, BROWSER: 'none', LOADTRACE_SHELL_DIR: shellDir },
  });
  try {
    const url = `http://127.0.0.1:${port}/`;
    while (!(await fetch(url).then((r) => r.ok, () => false))) await new Promise((r) => setTimeout(r, 25));
    served.push(performance.now() - t0);
    const page = await browser.context.newPage();
    await page.goto(url);
    await page.waitForFunction(() => (window as any).loadtrace?.engine && document.querySelectorAll('#cells article').length > 0, null, { timeout: 120_000 });
    open.push(performance.now() - t0);
    const download = page.waitForEvent('download', { timeout: 120_000 });
    await page.locator('.toolbar [data-record="export"]').click();
    await download;
    exported.push(performance.now() - t0);
    await page.close();
  } finally {
    process.kill(-child.pid!, 'SIGTERM'); // npm and the server under it: the group started here
    await new Promise((r) => setTimeout(r, 1000));
    rmSync(shellDir, { recursive: true, force: true });
  }
  console.error(`run ${i + 1}: served ${served.at(-1)!.toFixed(0)} ms, open ${open.at(-1)!.toFixed(0)} ms, exported ${exported.at(-1)!.toFixed(0)} ms`);
}
await browser.close();
console.log(`npm start, ${RUNS} runs (load average ${loadavg()[0].toFixed(1)}):`);
console.log(`  dev server answering   median ${median(served).toFixed(0)} ms`);
console.log(`  app open in Chromium   median ${median(open).toFixed(0)} ms`);
console.log(`  first Export written   median ${median(exported).toFixed(0)} ms (the record shell built meanwhile)`);
