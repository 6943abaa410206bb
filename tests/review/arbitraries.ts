// Generators of review states for the format's property tests. Takes the text
// generator from the caller (tests/format/arbitraries.ts), so every string field
// meets the same awkward characters the cells do.

import fc from 'fast-check';
import type { Comment, IssuedResult, ReviewState, Revision, SignOff } from '../../runtime/review/types';

const opts = { noNullPrototype: true } as const;

/** Ids as the format allows them ([A-Za-z0-9_-]+). */
export const reviewId = fc.string({ unit: fc.constantFrom(...'abcxyzABCXYZ0129_-'.split('')), minLength: 1, maxLength: 5 });

export function reviewStates(text: fc.Arbitrary<string>): fc.Arbitrary<ReviewState> {
  const identifier = fc.stringMatching(/^[A-Za-z_][A-Za-z0-9_]{0,7}$/);
  const name = fc.oneof({ weight: 3, arbitrary: identifier }, { weight: 1, arbitrary: text });
  const lines = fc.oneof(text, fc.array(text, { maxLength: 4 }).map((l) => l.join('\n')));
  const value = fc.oneof(fc.double(), fc.boolean(), text, fc.constantFrom(-0, 0, 1e21, 5e-324, Number.MAX_VALUE));

  const result: fc.Arbitrary<IssuedResult> = fc.record(
    {
      id: reviewId,
      kind: fc.constantFrom('formula' as const, 'check' as const),
      name,
      status: fc.constantFrom('ok' as const, 'fail' as const, 'error' as const, 'pending' as const),
      value,
      unit: text,
      text,
      ratio: fc.double(),
    },
    { ...opts, requiredKeys: ['id', 'kind', 'status'] },
  );
  const revision: fc.Arbitrary<Revision> = fc.record(
    {
      label: reviewId,
      date: text,
      by: text,
      checkedBy: text,
      description: lines,
      changedInputs: fc.array(
        fc.record({ id: reviewId, name, from: text, to: text }, { ...opts, requiredKeys: ['id', 'name'] }),
        { maxLength: 3 },
      ),
      baseline: fc.record(
        {
          inputs: fc.array(fc.record({ id: reviewId, name, value: text }, opts), { maxLength: 3 }),
          results: fc.array(result, { maxLength: 3 }),
        },
        opts,
      ),
      sheet: fc.stringMatching(/^[0-9a-f]{16}$/),
    },
    { ...opts, requiredKeys: ['label', 'date', 'by', 'checkedBy', 'description', 'changedInputs', 'baseline'] },
  );
  const reply = fc.record({ author: text, time: text, text: lines }, opts);
  const comment: fc.Arbitrary<Comment> = fc.record(
    {
      id: reviewId,
      cellId: reviewId,
      author: text,
      time: text,
      text: lines,
      status: fc.constantFrom('open' as const, 'resolved' as const),
      replies: fc.array(reply, { maxLength: 3 }),
    },
    opts,
  );
  const signoff: fc.Arbitrary<SignOff> = fc.record(
    {
      id: reviewId,
      scope: fc.oneof(fc.constant('document'), reviewId),
      by: text,
      date: text,
      covered: fc.oneof(text, fc.stringMatching(/^[0-9a-f]{16}$/)),
      revision: reviewId,
      unissued: fc.constant(true as const),
      seen: fc.stringMatching(/^[0-9a-f]{16}$/),
      exceptions: fc.array(fc.record({
        kind: fc.constantFrom('not-ok' as const, 'error' as const, 'open-comment' as const),
        id: reviewId,
        text,
      }, opts), { minLength: 1, maxLength: 3 }),
    },
    { ...opts, requiredKeys: ['id', 'scope', 'by', 'date', 'covered'] },
  );
  return fc
    .record(
      {
        revisions: fc.uniqueArray(revision, { selector: (r) => r.label, maxLength: 2 }),
        comments: fc.uniqueArray(comment, { selector: (c) => c.id, maxLength: 2 }),
        signoffs: fc.uniqueArray(signoff, { selector: (s) => s.id, maxLength: 2 }),
      },
      opts,
    )
    .filter((r) => r.revisions.length + r.comments.length + r.signoffs.length > 0) as fc.Arbitrary<ReviewState>;
}
