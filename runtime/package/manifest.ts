// A package's manifest and seal: what the file holds (each sheet's document digest and
// the digest of each part as rendered), sealed by the SHA-256 of the manifest's text, and
// the check of a package file against it. Each rendered part sits between comment fences
// so the exact text that was hashed can be cut out again.

import { decodeDataBlock } from '../record/escape';
import { sha256Hex } from '../record/seal';

export const PACKAGE_VERSION = '1';
export const MANIFEST_ID = 'lt-package';
export const MANIFEST_TYPE = 'application/x-loadtrace-package';

/** The id of sheet n's embedded document (not lt-doc, so a package is never read as one record). */
export const sheetDocId = (n: number) => `lt-pkg-doc-${n}`;

export interface PackageManifest {
  format: 'loadtrace-package';
  version: string;
  title: string;
  project: string;
  job: string;
  revision: string;
  writtenAt: string;
  /** SHA-256 of the front matter as rendered (absent in a file of sheets only). */
  front?: string;
  sheets: { n: number; file: string; document: string; rendering: string }[];
}

const open = (name: string) => `<!--lt-pkg:${name}-->`;
const close = (name: string) => `<!--/lt-pkg:${name}-->`;

/** A part between its fences. */
export function fenced(name: string, html: string): string {
  return `${open(name)}${html}${close(name)}`;
}

/** The text between a part's fences, without the wrapper fenced() was given. */
function partText(html: string, name: string): string | undefined {
  const a = html.indexOf(open(name));
  const b = html.indexOf(close(name));
  if (a < 0 || b < a) return undefined;
  const inner = html.slice(a + open(name).length, b);
  const m = /^<div class="lt-pkg-part(?: lt-pkg-sheet)?">([\s\S]*)<\/div>$/.exec(inner);
  return m ? m[1] : undefined;
}

function dataBlock(html: string, id: string): { raw: string; digest?: string } | undefined {
  const m = new RegExp(`<script\\b([^>]*\\bid="${id}"[^>]*)>([^<]*)</script>`).exec(html);
  if (!m) return undefined;
  return { raw: m[2], digest: /\bdata-sha256="([0-9a-f]{64})"/.exec(m[1])?.[1] };
}

export interface PackageCheck {
  ok: boolean;
  manifest?: PackageManifest;
  /** Each document text, by sheet number, as found. */
  documents: Map<number, string>;
  /** Plain sentences for the reader; empty when the seal holds. */
  problems: string[];
}

/** Checks a package file: the manifest against its seal, then every document and part against the manifest. */
export async function checkPackage(html: string): Promise<PackageCheck> {
  const problems: string[] = [];
  const documents = new Map<number, string>();
  const block = dataBlock(html, MANIFEST_ID);
  if (!block) return { ok: false, documents, problems: ['This file holds no package manifest: it is not a calc package, or its data was removed.'] };
  const text = decodeDataBlock(block.raw);
  if (!block.digest || (await sha256Hex(text)) !== block.digest) {
    problems.push('The package manifest does not match its seal: the file was edited outside Loadtrace.');
  }
  let manifest: PackageManifest;
  try {
    manifest = JSON.parse(text) as PackageManifest;
    if (manifest.format !== 'loadtrace-package' || !Array.isArray(manifest.sheets)) throw new Error('not a manifest');
  } catch {
    return { ok: false, documents, problems: [...problems, 'The package manifest cannot be read.'] };
  }
  if (manifest.front !== undefined) {
    const front = partText(html, 'front');
    if (front === undefined || (await sha256Hex(front)) !== manifest.front) problems.push('The cover and contents differ from what was sealed.');
  }
  for (const s of manifest.sheets) {
    const doc = dataBlock(html, sheetDocId(s.n));
    const docText = doc && decodeDataBlock(doc.raw);
    if (docText === undefined) problems.push(`Calc ${s.n} (${s.file}): its document is missing.`);
    else {
      documents.set(s.n, docText);
      if ((await sha256Hex(docText)) !== s.document || doc!.digest !== s.document) problems.push(`Calc ${s.n} (${s.file}): its document differs from what was sealed.`);
    }
    const part = partText(html, `sheet-${s.n}`);
    if (part === undefined || (await sha256Hex(part)) !== s.rendering) problems.push(`Calc ${s.n} (${s.file}): its sheets as shown differ from what was sealed.`);
  }
  return { ok: problems.length === 0, manifest, documents, problems };
}
