// The words for what a record is and what a sign-off covered, said one way wherever
// they appear: the live app's record line, the static page, the review panel, the
// title block's sign-off line, the file name and the CLI's --verify.

import type { RecordState } from '../review/state';
import type { SignOffException } from '../review/types';

const rev = (s: RecordState): string => `Rev ${s.revision!.label}${s.revision!.date ? ` (issued ${s.revision!.date})` : ''}`;

/** The state in a few words, e.g. "Issued: Rev 0, 2026-12-01". */
export function stateTitle(s: RecordState): string {
  switch (s.kind) {
    case 'draft': return 'Draft: never issued';
    case 'issued': return `Issued: Rev ${s.revision!.label}${s.revision!.date ? `, ${s.revision!.date}` : ''}`;
    case 'changed': return `Draft: changed since Rev ${s.revision!.label}`;
    case 'review-copy': return `Working copy from review of Rev ${s.revision!.label}`;
  }
}

/** One plain sentence saying what the record is and is not. */
export function stateSentence(s: RecordState): string {
  switch (s.kind) {
    case 'draft': return `This sheet has never been issued${s.typed ? ` (the title block's revision “${s.typed}” was typed, not issued)` : ''}: its values are a draft, not an issued calculation.`;
    case 'issued': return `This is ${rev(s)} exactly as issued: inputs and results unchanged since.`;
    case 'changed': return `This sheet was changed after ${rev(s)}; the changes are not issued, so this is a draft, not ${rev(s)}.`;
    case 'review-copy': return `This is a checker's working copy: ${rev(s)} with changes made in review that are not issued. It is not the issued record.`;
  }
}

/** A file-name part for the state: a changed copy never takes the issued file's name. */
export function stateFileTag(s: RecordState): string {
  switch (s.kind) {
    case 'draft': return 'draft';
    case 'issued': return `rev${s.revision!.label}`;
    case 'changed': return `draft-after-rev${s.revision!.label}`;
    case 'review-copy': return `review-copy-of-rev${s.revision!.label}`;
  }
}

/** The state a sign-off names: "Rev 0", "Rev 0 + unissued changes", or a draft never issued. */
export function signedStateText(s: { revision?: string; unissued?: boolean }): string {
  if (s.revision === undefined) return 'a draft never issued';
  return s.unissued ? `Rev ${s.revision} + unissued changes` : `Rev ${s.revision}`;
}

/** Each kind of finding a sign-off was given with, one and many. */
export const FINDING_WORDS: Record<SignOffException['kind'], [string, string]> = {
  'not-ok': ['check NOT OK', 'checks NOT OK'],
  error: ['cell in error', 'cells in error'],
  'open-comment': ['open comment', 'open comments'],
};

/** One finding's kind in words ("check NOT OK"); undefined for a kind this version does not know. */
export function findingWord(kind: string): string | undefined {
  return Object.hasOwn(FINDING_WORDS, kind) ? FINDING_WORDS[kind as SignOffException['kind']][0] : undefined;
}

/** "1 check NOT OK and 2 open comments", or '' for none. */
export function findingsCount(list: readonly SignOffException[]): string {
  const parts = (Object.keys(FINDING_WORDS) as SignOffException['kind'][])
    .map((k) => [list.filter((x) => x.kind === k).length, k] as const)
    .filter(([n]) => n > 0)
    .map(([n, k]) => `${n} ${FINDING_WORDS[k][n === 1 ? 0 : 1]}`);
  return parts.length > 1 ? `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}` : (parts[0] ?? '');
}
