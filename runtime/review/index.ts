// Checker review carried in the record: revisions, comments, sign-offs, compare.

export * from './types';
export { snapshot, changedInputs, latestRevision, nextRevisionLabel, issueRevision } from './revision';
export type { ResultLookup, IssueOptions } from './revision';
export { addComment, reply, resolve, openComments, type Note } from './comments';
export { signOff, isStale, withdrawSignOff, type SignOffRequest } from './signoff';
export { signoffFindings, seenFingerprint, scopeCells } from './findings';
export { fingerprint, coverFingerprint, sheetFingerprint, sectionCells, upstreamCells } from './fingerprint';
export {
  recordState, changedSinceIssue,
  type RecordState, type RecordStateKind, type StateOptions,
} from './state';
export {
  compare, compareBaselines, changeName, diffRecords, onlyChanged, returnToBaseline,
  type Comparison, type InputChange, type ResultChange,
} from './compare';
export { diffText } from './diff-text';
export { diffReview, isEmptyReviewDiff, reviewDiffLines, type ReviewDiff, type MetaChange, type CommentChange, type SignOffChange } from './review-diff';
