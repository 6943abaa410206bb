// `remark <id>  <cell id>`: a comment on a cell; `reply <remark id>`: an answer to it,
// written right after its remark (a reply names a remark read before it).
//   status open|resolved / by / time, then the text as `|` lines.

import type { Comment, Reply } from '../../review/types';
import { isCellId } from '../quote';
import { textBody, textLine, type ReviewBlockFormat } from './block';

const status = {
  key: 'status',
  read: (c: Comment, value: string) => {
    if (value !== 'open' && value !== 'resolved') return `status must be open or resolved, not ${JSON.stringify(value)}`;
    c.status = value;
    return undefined;
  },
};
const author = textLine<Comment>('by', (c) => c.author, (c, v) => (c.author = v));
const time = textLine<Comment>('time', (c) => c.time, (c, v) => (c.time = v));

export const remarkFormat: ReviewBlockFormat<Comment> = {
  keyword: 'remark',
  writeHeader: (c) => {
    if (!isCellId(c.cellId)) throw new Error(`comment ${c.id}: cell id ${JSON.stringify(c.cellId)} is not [A-Za-z0-9_-]+`);
    return c.cellId;
  },
  // The status is always written: a missing line reads as open.
  writeAttrs: (c) => [['status', c.status], ...author.write(c), ...time.write(c)],
  attrs: [status, author, time],
  text: textBody<Comment>((c) => c.text, (c, v) => (c.text = v)),
};

/** Reads the remark header's tail: the id of the cell commented on. */
export function readRemarkTail(tail: string): string | undefined {
  return isCellId(tail) ? tail : undefined;
}

const replyBy = textLine<Reply>('by', (r) => r.author, (r, v) => (r.author = v));
const replyTime = textLine<Reply>('time', (r) => r.time, (r, v) => (r.time = v));

export const replyFormat: ReviewBlockFormat<Reply> = {
  keyword: 'reply',
  writeHeader: () => '',
  writeAttrs: (r) => [...replyBy.write(r), ...replyTime.write(r)],
  attrs: [replyBy, replyTime],
  text: textBody<Reply>((r) => r.text, (r, v) => (r.text = v)),
};
