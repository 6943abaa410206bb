// A calc package as one HTML file (runtime/package): the front (cover, contents, revision
// log, references), every sheet's static rendering with anchors of its own, the embedded
// documents, the manifest and its seal, the record's CSP with no script, and the check of
// a package file that finds a document or a rendering changed after it was written.

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import type { Engine } from '../../runtime/engine-types';
import { parse, serialize } from '../../runtime/format/index';
import { packageHtml, packageParts, type PackageSheet } from '../../runtime/package/build';
import type { PackageInfo } from '../../runtime/package/front';
import { checkPackage } from '../../runtime/package/manifest';
import { runnableScripts } from '../../runtime/record/layout';
import { CAUTION } from '../../runtime/record/static-html';
import { sha256Hex } from '../../runtime/record/seal';
import { issueRevision } from '../../runtime/review/revision';
import { callsOf } from '../../runtime/working/calls';

const ROOT = join(__dirname, '../..');
const FILES = ['spread-footing.lt', 'bearing-capacity.lt'];
const engines: Engine[] = [];
let sheets: PackageSheet[];
const info: PackageInfo = {
  title: 'Foundation calculations', writtenAt: '2027-03-01T10:00:00Z',
  meta: { project: 'Quayside Depot', job: 'LT-27-015', subject: '', preparedBy: 'A. Nwosu', checkedBy: 'B. Osei', revision: 'B', date: '2027-03-01' },
  engineer: { name: 'C. Marsh, PE', license: 'PE 40417', firm: 'Marsh Structural' },
};

async function sheet(doc: CalcDocument, file: string): Promise<PackageSheet> {
  const engine = createEngine(doc);
  engines.push(engine);
  await engine.settled();
  return { doc, state: (id) => engine.state(id), calls: callsOf(engine), file };
}

beforeAll(async () => {
  const docs = FILES.map((f) => parse(readFileSync(join(ROOT, 'docs-templates', f), 'utf8')).doc);
  const first = await sheet(docs[0], FILES[0]);
  // The footing issued once through review, so the revision log has a revision to list.
  const issued = issueRevision(docs[0], first.state, 'A. Nwosu', '2027-02-20', 'Issued for permit', { label: 'A' });
  sheets = [await sheet(issued, FILES[0]), await sheet(docs[1], FILES[1])];
});
afterAll(() => engines.forEach((e) => e.dispose()));

const build = async (numbers?: Parameters<typeof packageParts>[2]) =>
  packageHtml(await packageParts(sheets, info, numbers), info, FILES);

describe('a calc package', () => {
  it('is sealed: the manifest holds each document digest and each part as rendered, and checks out', async () => {
    const pkg = await build();
    const check = await checkPackage(pkg.html);
    expect(check.problems).toEqual([]);
    expect(check.ok).toBe(true);
    expect(check.manifest!.sheets.map((s) => s.file)).toEqual(FILES);
    for (const [i, s] of sheets.entries()) {
      expect(check.manifest!.sheets[i].document).toBe(await sha256Hex(serialize(s.doc)));
      expect(check.documents.get(i + 1)).toBe(serialize(s.doc));
    }
  });

  it('has the record CSP and no script to run: it reads with JavaScript off', async () => {
    const { html } = await build();
    expect(html).toContain('<meta http-equiv="Content-Security-Policy" content="default-src &#39;none&#39;; script-src &#39;none&#39;;');
    expect(runnableScripts(html)).toEqual([]);
    expect(html).not.toMatch(/\b(?:src|href)="(?:https?:)?\/\//);
  });

  it('gives every cell an anchor of its own sheet, and every summary link lands on one', async () => {
    const { html } = await build();
    const ids = [...html.matchAll(/ id="([^"]+)"/g)].map((m) => m[1]).filter((id) => id.includes('lt-c-') || id.startsWith('lt-sheet-'));
    expect(new Set(ids).size).toBe(ids.length);
    const links = [...html.matchAll(/ href="#([^"]+)"/g)].map((m) => m[1]);
    expect(links.length).toBeGreaterThan(10);
    for (const l of links) expect(ids, l).toContain(l);
  });

  it('has a cover, contents naming each calc, the revision log and the codes cited', async () => {
    const { html } = await build({ ranges: [[3, 12], [13, 19]], total: 19, paper: 'Letter' });
    for (const v of ['Foundation calculations', 'Quayside Depot', 'LT-27-015', 'C. Marsh, PE', 'PE 40417', 'Marsh Structural', 'Seal and signature']) expect(html).toContain(v);
    expect(html).toContain(`<p class="lt-caution" role="note">△ ${CAUTION}</p>`);
    for (const [i, s] of sheets.entries()) expect(html).toContain(`<a href="#lt-sheet-${i + 1}">${s.doc.meta.subject.replaceAll('&', '&amp;')}</a>`);
    expect(html).toContain('<td class="lt-pkg-at">3–12</td>');
    expect(html).toContain('<td class="lt-pkg-at">13–19</td>');
    expect(html).toContain('carries "sheet n of 19"');
    // The revision issued through review, with its description.
    expect(html).toMatch(/<td>1<\/td><td>A<\/td><td>2027-02-20<\/td><td>A. Nwosu<\/td><td>[^<]*<\/td><td>Issued for permit<\/td>/);
    // The footing cites ACI 318-19 and the bearing-capacity sheet Terzaghi (1943) among others.
    expect(html).toContain('Building Code Requirements for Structural Concrete (ACI 318-19)');
    expect(html).toContain('Terzaghi, K. (1943). Theoretical Soil Mechanics');
  });

  it('tells a document edited after packing, a sheet whose rendering was altered, and a manifest changed', async () => {
    const { html } = await build();
    const docStart = html.indexOf('id="lt-pkg-doc-1"');
    const editedDoc = html.slice(0, docStart) + html.slice(docStart).replace('PD = 180 kip', 'PD = 120 kip');
    expect((await checkPackage(editedDoc)).problems).toEqual([`Calc 1 (${FILES[0]}): its document differs from what was sealed.`]);

    const ratio = /<td class="lt-sum-r">(\d\.\d\d)<\/td>/.exec(html.slice(html.indexOf('<!--lt-pkg:sheet-2-->')))!;
    const at = html.indexOf(ratio[0], html.indexOf('<!--lt-pkg:sheet-2-->'));
    const editedView = html.slice(0, at) + '<td class="lt-sum-r">0.10</td>' + html.slice(at + ratio[0].length);
    expect((await checkPackage(editedView)).problems).toEqual([`Calc 2 (${FILES[1]}): its sheets as shown differ from what was sealed.`]);

    const editedManifest = html.replace('"title": "Foundation calculations"', '"title": "Other calculations"');
    expect((await checkPackage(editedManifest)).problems).toContain('The package manifest does not match its seal: the file was edited outside Loadtrace.');
    expect((await checkPackage('<!doctype html><p>hello')).ok).toBe(false);
  });
});
