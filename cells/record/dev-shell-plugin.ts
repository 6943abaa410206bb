// `npm start` (the dev server): the app exports records with no build step to know of.
// The record shell is built in the background once the first page has loaded (if it is
// missing or stale), and the app's request for it waits for that build, or starts one, so
// Export works on a fresh clone and always packs the app as its sources are now.

import { readFile } from 'node:fs/promises';
import type { Plugin } from 'vite';
import { buildShellAsync, shellStale, shellText } from '../../runtime/cli/record-shell';

/** Where the app asks for the shell (SHELL_PATH in ./shell.ts, which runs in the page and cannot be imported here). */
const SHELL_PATH = '/dist-record/record-shell.txt';
/** How long the server must hear nothing after its first request before it builds. */
const QUIET_MS = 1500;

export function recordShellOnDemand(): Plugin {
  let building: Promise<void> | undefined;
  /** One build at a time; a request during a build waits for it. */
  const ensure = (): Promise<void> => {
    if (!building && shellStale()) {
      building = buildShellAsync().finally(() => {
        building = undefined;
      });
    }
    return building ?? Promise.resolve();
  };
  return {
    name: 'loadtrace-record-shell-on-demand',
    apply: 'serve',
    configureServer(server) {
      // Built once the page has loaded (no request for a moment), so it is usually done
      // before anyone clicks Export without slowing the first open (5.6 → 8.5 s when built at once).
      let last = 0;
      server.middlewares.use((_req, _res, next) => {
        last = Date.now();
        next();
      });
      const idle = setInterval(() => {
        if (last === 0 || Date.now() - last < QUIET_MS) return;
        clearInterval(idle);
        ensure().catch((e: Error) => server.config.logger.error(e.message));
      }, 250);
      idle.unref();
      server.httpServer?.once('close', () => clearInterval(idle));
      server.middlewares.use(SHELL_PATH, (req, res, next) => {
        if (req.method !== 'GET' && req.method !== 'HEAD') return next();
        ensure().then(() => readFile(shellText(), 'utf8')).then((shell) => {
          res.setHeader('Content-Type', 'text/plain; charset=utf-8');
          res.setHeader('Cache-Control', 'no-store');
          res.end(req.method === 'HEAD' ? undefined : shell);
        }, (e: Error) => {
          server.config.logger.error(e.message);
          res.statusCode = 500;
          res.end(e.message);
        });
      });
    },
  };
}
