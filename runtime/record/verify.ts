// The record's seal: a manifest with the SHA-256 of every part of the file (canonical
// text, see canon.ts and seal-parts.ts), kept in the file itself; the record's digest
// is the SHA-256 of that manifest, and the static page shows it. Checking the record:
// every part's digest again, the digest shown against the manifest's, and nothing in
// the file that a record never holds.
//
// What it proves: that no byte a reader sees or that runs was changed since Loadtrace
// wrote the file, by anyone who did not recompute the digests. It is not a signature:
// anyone can write a new, consistent file. To know a file is the issued one, compare
// its record digest with the one given with the issued record (e.g. on the transmittal).

import type { RecordState } from '../review/state';
import { sha256Hex } from './seal';
import { PARTS, PART_NAMES, type PageParts, type PartName } from './seal-parts';

/** Said of a record written before whole files were sealed (it still opens and runs). */
export const OLDER_RECORD = 'This record was written before Loadtrace sealed whole files: only its embedded document is sealed, so nothing else in it can be checked.';

/** The record format whose whole file is sealed. */
export const SEAL_VERSION = 2;

export interface SealManifest {
  seal: string;
  /** When it was written (ISO text). */
  written: string;
  /** What the record is: draft, issued revision, or working copy from review. */
  state: RecordState;
  sha256: Record<PartName, string>;
}

export interface PartCheck {
  part: PartName;
  label: string;
  ok: boolean;
}

export interface RecordCheck {
  /** 2: the whole file is sealed; 1: an older record (only its document is sealed); 0: no record. */
  version: number;
  /** Every part as written, the digest shown is the seal's, and nothing a record never holds. */
  verified: boolean;
  /** SHA-256 of the seal as found. */
  recordDigest?: string;
  /** The record digest the static page shows. */
  shownDigest?: string;
  manifest?: SealManifest;
  parts: PartCheck[];
  /** What a record never holds (before the policy, a refresh, a base element...), in plain sentences. */
  tampering: string[];
  /** Plain sentences, the first difference first (the tampering ones lead). */
  problems: string[];
}

/** Digests of each part's canonical text. */
export async function partDigests(parts: PageParts): Promise<Record<PartName, string>> {
  const hexes = await Promise.all(PART_NAMES.map((p) => sha256Hex(parts.texts.get(p) ?? '')));
  return Object.fromEntries(PART_NAMES.map((p, i) => [p, hexes[i]])) as Record<PartName, string>;
}

/**
 * The manifest's text, as written into the file (its SHA-256 is the record's digest).
 * It sits in a script element, so < > & are written as JSON escapes: a title-block text
 * in it can never end the element.
 */
export function manifestText(m: SealManifest): string {
  return JSON.stringify({ seal: m.seal, written: m.written, state: m.state, sha256: m.sha256 })
    .replace(/[<>&]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

const KINDS = ['draft', 'issued', 'changed', 'review-copy'];

/** The state written in a seal, if it is one a record can be in. */
function readState(v: unknown): RecordState | undefined {
  const s = v as RecordState | null;
  if (typeof s !== 'object' || s === null || !KINDS.includes(s.kind)) return undefined;
  if (s.kind === 'draft') return typeof s.typed === 'string' ? { kind: 'draft', typed: s.typed } : { kind: 'draft' };
  const r = s.revision;
  return r && typeof r.label === 'string' && typeof r.date === 'string' ? { kind: s.kind, revision: { label: r.label, date: r.date } } : undefined;
}

function readManifest(text: string): SealManifest | undefined {
  try {
    const m = JSON.parse(text) as SealManifest;
    if (typeof m !== 'object' || m === null || typeof m.sha256 !== 'object' || m.sha256 === null) return undefined;
    const state = readState(m.state);
    if (!state || typeof m.written !== 'string') return undefined;
    return { ...m, state };
  } catch {
    return undefined;
  }
}

/** Checks a page's parts against its seal. */
export async function verifyParts(parts: PageParts): Promise<RecordCheck> {
  const problems = [...parts.tampering];
  if (parts.sealText === undefined) {
    const version = parts.doc ? 1 : 0;
    problems.push(version === 1 ? OLDER_RECORD : 'This file carries no Loadtrace seal.');
    return { version, verified: false, parts: [], tampering: parts.tampering, problems };
  }
  const recordDigest = await sha256Hex(parts.sealText);
  const manifest = readManifest(parts.sealText);
  const out: RecordCheck = { version: SEAL_VERSION, verified: false, recordDigest, shownDigest: parts.shownDigest, parts: [], tampering: parts.tampering, problems };
  if (!manifest) {
    problems.push('The record\'s seal cannot be read: it was edited outside Loadtrace.');
    return out;
  }
  out.manifest = manifest;
  const now = await partDigests(parts);
  out.parts = PARTS.map(([part, label]) => ({ part, label, ok: manifest.sha256[part] === now[part] }));
  for (const p of out.parts) if (!p.ok) problems.push(`The file was altered in ${p.label}: it is not as Loadtrace wrote it.`);
  if (parts.shownDigest !== recordDigest) {
    problems.push(parts.shownDigest === undefined
      ? 'The static rendering does not show the record\'s digest.'
      : 'The record digest shown in the page is not the digest of the record\'s seal: the seal or the page was altered.');
  }
  out.verified = problems.length === 0;
  return out;
}

