// `--pdf OUT.pdf`: the calc record's sheets printed by Debian's Chromium. What is printed
// is the record's static page (its static rendering and print styles, as an exported
// record holds them, without the app), so the PDF is laid out as the record prints:
// the title block with "sheet n of m" in every page's top margin, the summary first.
// JavaScript is off and every request is refused while it prints.

import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { CalcDocument } from '../document';
import type { CellState } from '../engine-types';
import type { LibraryCall } from '../working/calls';
import { serialize } from '../format/index';
import { sha256Hex } from '../record/index';
import { printPageHtml } from '../record/print-page';
import type { Paper } from './args';

/** Flags for a headless Chromium with nothing running in the background (the e2e tests use them too). */
export const CHROMIUM_ARGS = [
  '--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync',
];

/** Debian's Chromium, or the one named by LOADTRACE_CHROMIUM. */
export function chromiumPath(): string {
  return process.env.LOADTRACE_CHROMIUM || '/usr/bin/chromium';
}

export class PrintError extends Error {}

/** The record's static page for a computed document (what a record shows with JavaScript off). */
export async function sheetsPage(
  doc: CalcDocument, state: (id: string) => CellState | undefined, exportedAt = new Date().toISOString(), calls?: (id: string) => LibraryCall[],
): Promise<string> {
  const docText = serialize(doc);
  const digest = await sha256Hex(docText);
  return printPageHtml(doc, state, digest, exportedAt, calls);
}

export interface Printer {
  /** Prints a page (HTML text) to `out`; returns the PDF's size in bytes. */
  print(html: string, out: string, paper: Paper): Promise<number>;
  close(): Promise<void>;
}

/** Starts Chromium once, for one PDF or for a whole batch. */
export async function openPrinter(): Promise<Printer> {
  const exe = chromiumPath();
  if (!existsSync(exe)) {
    throw new PrintError(`printing to PDF needs Chromium at ${exe}, which is not there: install Debian's (apt-get install chromium), or name another with LOADTRACE_CHROMIUM=/path/to/chromium`);
  }
  const { chromium } = await import('playwright-core');
  let browser: Awaited<ReturnType<typeof chromium.launch>>;
  try {
    browser = await chromium.launch({ executablePath: exe, args: CHROMIUM_ARGS, headless: true });
  } catch (e) {
    throw new PrintError(`Chromium at ${exe} did not start: ${(e as Error).message.split('\n')[0]}`);
  }
  const context = await browser.newContext({ javaScriptEnabled: false });
  const dir = mkdtempSync(join(tmpdir(), 'loadtrace-print-'));
  const page = join(dir, 'sheets.html');
  const pageUrl = pathToFileURL(page).href;
  // Only the page itself loads; the record's CSP forbids the rest anyway.
  await context.route('**/*', (route) => (route.request().url() === pageUrl ? route.continue() : route.abort()));
  return {
    async print(html, out, paper) {
      writeFileSync(page, html);
      const tab = await context.newPage();
      try {
        await tab.goto(pageUrl, { waitUntil: 'load' });
        const pdf = await tab.pdf({ path: out, format: paper, printBackground: true, outline: true });
        return pdf.length;
      } finally {
        await tab.close();
      }
    },
    async close() {
      await browser.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
