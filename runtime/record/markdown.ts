// Notes in the static record: the Markdown subset the app shows (paragraphs, **bold**,
// *italic*, `code`, - and 1. lists, [text](https://...) links, $math$), written
// escape-first: every character of the note is escaped, then only our own tags are
// added. Links other than http(s) stay text. (The app's own renderer lives in cells/,
// which runtime/ may not import.)

import { escapeHtml } from './escape';
import { texHtml } from './tex';

const SAFE_URL = /^https?:\/\/[^\s<>"'`\\]+$/i;
/** A note longer than this is shown as plain escaped text, not parsed. */
const NOTE_LIMIT = 100_000;

function inline(text: string, depth = 0): string {
  if (depth > 4) return escapeHtml(text);
  let out = '';
  let i = 0;
  // No bracket inside a link's text or address: each try stops at the next one, so hostile
  // text ("[a](" repeated) is read in linear time, not quadratic.
  const re = /`([^`]+)`|\$([^$\n]+)\$|\*\*([^*]+)\*\*|\*([^*\s][^*]*)\*|\[([^[\]]+)\]\(([^()[\]\s]+)\)/g;
  for (let m = re.exec(text); m; m = re.exec(text)) {
    out += escapeHtml(text.slice(i, m.index));
    if (m[1] !== undefined) out += `<code>${escapeHtml(m[1])}</code>`;
    else if (m[2] !== undefined) out += `<span class="lt-math">${texHtml(m[2], false)}</span>`;
    else if (m[3] !== undefined) out += `<strong>${inline(m[3], depth + 1)}</strong>`;
    else if (m[4] !== undefined) out += `<em>${inline(m[4], depth + 1)}</em>`;
    else if (SAFE_URL.test(m[6])) {
      out += `<a href="${escapeHtml(m[6])}" rel="noopener noreferrer nofollow">${inline(m[5], depth + 1)}</a>`;
    } else out += escapeHtml(m[0]);
    i = m.index + m[0].length;
  }
  return out + escapeHtml(text.slice(i));
}

/** HTML for a note's text. */
export function noteHtml(text: string): string {
  if (text.length > NOTE_LIMIT) return `<p class="lt-long">${escapeHtml(text)}</p>`;
  const blocks: { type: 'p' | 'ul' | 'ol'; lines: string[] }[] = [];
  let current: (typeof blocks)[number] | undefined;
  for (const raw of text.split('\n')) {
    const line = raw.trimEnd();
    const item = /^\s*(?:([-*+])|\d+[.)])\s+(.*)$/.exec(line);
    if (line.trim() === '') current = undefined;
    else if (item) {
      const type = item[1] ? 'ul' : 'ol';
      if (current?.type !== type) blocks.push((current = { type, lines: [] }));
      current.lines.push(item[2]);
    } else if (current?.type === 'p') current.lines.push(line.trim());
    else blocks.push((current = { type: 'p', lines: [line.trim()] }));
  }
  return blocks
    .map((b) => (b.type === 'p'
      ? `<p>${b.lines.map((l) => inline(l)).join('\n')}</p>`
      : `<${b.type}>${b.lines.map((l) => `<li>${inline(l)}</li>`).join('')}</${b.type}>`))
    .join('');
}
