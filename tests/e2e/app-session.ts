// One end-to-end file's session: the shared build served, a Chromium with a fresh
// profile, its first page; page errors and unexpected dialogs are collected, not shown.

import type { Page } from 'playwright-core';
import { inject } from 'vitest';
import { launch, serve, type Browser, type Served } from './harness';
import './global-setup';

export interface AppSession {
  server: Served;
  browser: Browser;
  page: Page;
  /** Page errors, and any dialog that opened (each is dismissed). */
  pageErrors: string[];
  close(): Promise<void>;
}

/** The folder of the app built once for all end-to-end files. */
export function appDist(): string {
  return inject('appDist');
}

export async function openApp(): Promise<AppSession> {
  const server = await serve(appDist());
  const browser = await launch();
  const page = browser.context.pages()[0] ?? (await browser.context.newPage());
  const pageErrors: string[] = [];
  page.on('pageerror', (e) => pageErrors.push(e.message));
  page.on('dialog', (d) => {
    pageErrors.push(`dialog opened: ${d.message()}`);
    void d.dismiss();
  });
  return {
    server, browser, page, pageErrors,
    close: async () => {
      await browser.close();
      server.stop();
    },
  };
}
