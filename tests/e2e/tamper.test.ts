// Random single-byte edits of a record in every part of the file (issue 14), as
// `npm run test:tamper` makes them (tests/tamper/edits.ts), on a sample that fits CI's
// time: the CLI's whole-file check on 11 × 12 = 132 edits, 12 in each part, and the
// live app in Chromium on 33 of them, 3 in each part. `npm run test:tamper` runs the
// full count (550 edits, all of them also opened in Chromium) and prints the figures.
// Every edit that changes the page a browser builds must be reported by both (the app:
// by its check, or, when the edit keeps its code from running, by the static page's
// plain-HTML message), and no altered record may open under a "verified" line.

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from '../../runtime/format/index';
import { exportComputed } from '../../runtime/record/node';
import { appSays, applyEdit, cliSays, makeEdits, regions, REGIONS, treeText, type Edit } from '../tamper/edits';
import { CHROMIUM_ARGS, ROOT } from './harness';
import { appDist } from './app-session';

const PER_PART = 12;
const APP_PER_PART = 3;
const SEED = 1414; // another seed than the script's, so CI and the script cover different edits

let work: string;
let file: Buffer;
let original: string;
let edits: Edit[];
let browser: Browser;

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), 'loadtrace-tamper-'));
  const shell = readFileSync(join(appDist(), 'dist-record/record-shell.html'), 'utf8');
  const html = (await exportComputed(parse(readFileSync(join(ROOT, 'docs-templates/load-path.lt'), 'utf8')).doc, shell)).html;
  file = Buffer.from(html, 'utf8');
  original = treeText(html);
  edits = makeEdits(file, regions(html), PER_PART, SEED);
  browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
}, 240_000);

afterAll(async () => {
  await browser?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('random single-byte edits in every part of a record', () => {
  it(`the CLI reports every edit that changes the page (${REGIONS.length} parts × ${PER_PART})`, async () => {
    expect(edits).toHaveLength(REGIONS.length * PER_PART);
    const missed: string[] = [];
    let changed = 0;
    for (const e of edits) {
      const r = await cliSays(applyEdit(file, e).toString('utf8'), original);
      if (r.changed) changed++;
      if (r.changed && !r.reported) missed.push(`${e.region} byte ${e.at}: ${e.from} → ${e.to}`);
    }
    expect(missed).toEqual([]);
    expect(changed).toBeGreaterThan(edits.length * 0.8); // most single bytes change the page
  }, 600_000);

  it(`the live app reports them too, and none opens as verified (${REGIONS.length} parts × ${APP_PER_PART})`, async () => {
    const sample = REGIONS.flatMap((region) => edits.filter((e) => e.region === region).slice(0, APP_PER_PART));
    const missed: string[] = [];
    const path = join(work, 'edited.html');
    for (const e of sample) {
      const bytes = applyEdit(file, e);
      const cli = await cliSays(bytes.toString('utf8'), original);
      writeFileSync(path, bytes);
      const app = await appSays(browser, `file://${path}`);
      const where = `${e.region} byte ${e.at}: ${e.from} → ${e.to}`;
      if (cli.changed && !['reported', 'no-app-message'].includes(app.verdict)) missed.push(`app ${app.verdict}: ${where}`);
      if (cli.changed && app.claimsVerified) missed.push(`opened as verified: ${where}`);
    }
    expect(missed).toEqual([]);
  }, 600_000);
});
