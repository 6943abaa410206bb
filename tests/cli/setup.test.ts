// Set-up that just works (issue 19): on Node 20, installing the locked packages gives no
// engine warning (KaTeX's command-line helper wanted a commander for Node 22; an override
// pins one for Node 20), and an older Node gets a plain message, not a stack of warnings.

import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const pkg = JSON.parse(readFileSync('package.json', 'utf8'));

describe('set-up', () => {
  it('npm ci on this Node resolves the lockfile with no warning at all', () => {
    const dir = mkdtempSync(join(tmpdir(), 'loadtrace-ci-'));
    try {
      copyFileSync('package.json', join(dir, 'package.json'));
      copyFileSync('package-lock.json', join(dir, 'package-lock.json'));
      // A dry run reads the lockfile and checks every package's engines; nothing is fetched or run.
      const r = spawnSync('npm', ['ci', '--dry-run', '--ignore-scripts', '--no-audit', '--no-fund'], { cwd: dir, encoding: 'utf8' });
      expect(r.status, r.stderr).toBe(0);
      expect(`${r.stdout}\n${r.stderr}`).not.toMatch(/EBADENGINE|npm warn/i);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 60_000);

  it('states Node 20 in engines and checks it before install and start', () => {
    expect(pkg.engines.node).toBe('>=20');
    expect(pkg.scripts.preinstall).toBe('node scripts/check-node.cjs');
    expect(pkg.scripts.prestart).toBe('node scripts/check-node.cjs');
  });

  it('an older Node is told plainly which Node to install, exit 1; this one passes silently', () => {
    const dir = mkdtempSync(join(tmpdir(), 'loadtrace-node-'));
    try {
      const old = join(dir, 'old-node.cjs'); // makes this Node report an older version
      writeFileSync(old, 'Object.defineProperty(process, "versions", { value: { ...process.versions, node: "18.19.1" } });');
      const r = spawnSync(process.execPath, ['--require', old, 'scripts/check-node.cjs'], { encoding: 'utf8' });
      expect(r.status).toBe(1);
      expect(r.stderr).toContain('Loadtrace needs Node 20 or newer (package.json engines: ">=20"); this is Node 18.19.1.');
      const now = spawnSync(process.execPath, ['scripts/check-node.cjs'], { encoding: 'utf8' });
      expect([now.status, now.stdout, now.stderr]).toEqual([0, '', '']);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
