// What a sheet is, as a record: a draft never issued, a draft changed since its last
// revision, an issued revision as it was issued, or a checker's working copy from
// review. The record says so in the static page, in the live app and in its file
// name, so a changed copy never passes for the issued one.

import type { CalcDocument } from '../document';
import { compare } from './compare';
import { sheetFingerprint } from './fingerprint';
import { latestRevision, snapshot, type ResultLookup } from './revision';

export type RecordStateKind = 'draft' | 'changed' | 'issued' | 'review-copy';

export interface RecordState {
  kind: RecordStateKind;
  /** The latest issued revision, when there is one. */
  revision?: { label: string; date: string };
  /** A draft's title block names a revision that was typed, never issued. */
  typed?: string;
}

/**
 * Does the sheet differ from its latest revision? By the sheet fingerprint frozen
 * with the revision; a revision written before it had one is compared by its inputs
 * (and its results, when `results` is given).
 */
export function changedSinceIssue(doc: CalcDocument, results?: ResultLookup): boolean {
  const latest = latestRevision(doc);
  if (!latest) return false;
  if (latest.sheet !== undefined) return latest.sheet !== sheetFingerprint(doc);
  const values = new Map(latest.baseline.inputs.map((i) => [i.id, i.value]));
  const inputs = snapshot(doc, () => undefined).inputs; // inputs and table values, as a revision freezes them
  if (inputs.length !== values.size || inputs.some((i) => values.get(i.id) !== i.value)) return true;
  const cmp = results ? compare(doc, results) : undefined;
  return !!cmp && [...cmp.results, ...cmp.checks].some((r) => r.changed);
}

export interface StateOptions {
  results?: ResultLookup;
  /** The sheet is being changed in review (the checker's side): a changed sheet is a working copy. */
  reviewing?: boolean;
}

export function recordState(doc: CalcDocument, options: StateOptions = {}): RecordState {
  const latest = latestRevision(doc);
  if (!latest) return doc.meta.revision.trim() ? { kind: 'draft', typed: doc.meta.revision.trim().slice(0, 40) } : { kind: 'draft' };
  const revision = { label: latest.label, date: latest.date };
  if (!changedSinceIssue(doc, options.results)) return { kind: 'issued', revision };
  return { kind: options.reviewing ? 'review-copy' : 'changed', revision };
}
