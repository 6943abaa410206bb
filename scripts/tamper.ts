// `npm run test:tamper`: random single-byte edits of the main template's record, the
// same number in every part of the file, each checked by the CLI's whole-file check
// and opened in Chromium. Prints per part how many edits changed what a reader sees or
// what runs (the parsed page differs), and how many of those the CLI and the app
// reported; and how many records with altered content opened under a "verified" line.
// Exit 1 unless every such edit is reported by both and none opens as verified.
//   PER_PART=50 (edits per part; 11 parts)  SEED=14  APP=all|N (edits opened in Chromium,
//   spread over the parts; CI's e2e test opens a sample, see tests/e2e/tamper.test.ts)

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { recordShellFile, ROOT } from '../runtime/cli/record-shell';
import { parse } from '../runtime/format/index';
import { exportComputed } from '../runtime/record/node';
import { appSays, applyEdit, cliSays, makeEdits, regions, REGIONS, treeText, type AppVerdict, type Region } from '../tests/tamper/edits';

const PER_PART = Number(process.env.PER_PART ?? 50);
const SEED = Number(process.env.SEED ?? 14);
const APP = process.env.APP ?? 'all';
const ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync'];

const shell = recordShellFile((s) => console.error(s));
const { doc } = parse(readFileSync(join(ROOT, 'docs-templates/load-path.lt'), 'utf8'));
const html = (await exportComputed(doc, shell)).html;
const file = Buffer.from(html, 'utf8');
const original = treeText(html);
const edits = makeEdits(file, regions(html), PER_PART, SEED);
const appEvery = APP === 'all' ? 1 : Math.max(1, Math.floor(edits.length / Number(APP)));

interface Row { edits: number; changed: number; cli: number; app: number; appOpened: number; appChanged: number; noApp: number; verifiedAltered: number }
const rows = new Map<Region, Row>(REGIONS.map((r) => [r, { edits: 0, changed: 0, cli: 0, app: 0, appOpened: 0, appChanged: 0, noApp: 0, verifiedAltered: 0 }]));
const misses: string[] = [];
const dir = mkdtempSync(join(tmpdir(), 'loadtrace-tamper-'));
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ARGS });
const started = Date.now();
try {
  for (const [i, e] of edits.entries()) {
    const row = rows.get(e.region)!;
    const bytes = applyEdit(file, e);
    const text = bytes.toString('utf8');
    const cli = await cliSays(text, original);
    row.edits++;
    if (cli.changed) row.changed++;
    if (cli.changed && cli.reported) row.cli++;
    if (cli.changed && !cli.reported) misses.push(`CLI missed: ${e.region} byte ${e.at} ${e.from} → ${e.to}`);
    if (i % appEvery !== 0) continue;
    const path = join(dir, 'edited.html');
    writeFileSync(path, bytes);
    const app = await appSays(browser, `file://${path}`);
    row.appOpened++;
    if (!cli.changed) continue;
    row.appChanged++;
    const told: AppVerdict[] = ['reported', 'no-app-message'];
    if (told.includes(app.verdict)) row.app++;
    else misses.push(`app ${app.verdict}: ${e.region} byte ${e.at} ${e.from} → ${e.to}`);
    if (app.verdict === 'no-app-message') row.noApp++;
    if (app.claimsVerified) {
      row.verifiedAltered++;
      misses.push(`opened as verified though altered: ${e.region} byte ${e.at} ${e.from} → ${e.to}`);
    }
    if ((i + 1) % 50 === 0) console.error(`${i + 1} of ${edits.length} edits (${((Date.now() - started) / 1000).toFixed(0)} s)`);
  }
} finally {
  await browser.close();
  rmSync(dir, { recursive: true, force: true });
}

const pct = (a: number, b: number) => (b === 0 ? '   —  ' : `${((100 * a) / b).toFixed(1).padStart(5)} %`);
console.log(`record of docs-templates/load-path.lt, ${file.length} bytes; ${edits.length} random single-byte edits (seed ${SEED}), ${PER_PART} in each part`);
console.log('part            edits  changed page   CLI reported   app opened  app reported (of changed; no-app message)   opened as verified though altered');
const total: Row = { edits: 0, changed: 0, cli: 0, app: 0, appOpened: 0, appChanged: 0, noApp: 0, verifiedAltered: 0 };
for (const [region, r] of rows) {
  for (const k of Object.keys(total) as (keyof Row)[]) total[k] += r[k];
  console.log(`${region.padEnd(14)} ${String(r.edits).padStart(6)}  ${String(r.changed).padStart(6)}        ${pct(r.cli, r.changed)}   ${
    String(r.appOpened).padStart(6)}      ${pct(r.app, r.appChanged)} of ${String(r.appChanged).padStart(3)}; ${String(r.noApp).padStart(3)}              ${r.verifiedAltered}`);
}
console.log(`${'all'.padEnd(14)} ${String(total.edits).padStart(6)}  ${String(total.changed).padStart(6)}        ${pct(total.cli, total.changed)}   ${
  String(total.appOpened).padStart(6)}      ${pct(total.app, total.appChanged)} of ${String(total.appChanged).padStart(3)}; ${String(total.noApp).padStart(3)}              ${total.verifiedAltered}`);
console.log(`edits that changed nothing a browser builds (same parsed page): ${total.edits - total.changed}; records with altered content opened under a "verified" line: ${total.verifiedAltered}`);
console.log(`time: ${((Date.now() - started) / 1000).toFixed(0)} s`);
for (const m of misses) console.log(`  MISSED ${m}`);
process.exitCode = misses.length === 0 && total.cli === total.changed && total.app === total.appChanged ? 0 : 1;
