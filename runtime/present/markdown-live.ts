// The small Markdown subset notes use: paragraphs, **bold**, *italic*, `code`,
// bulleted and numbered lists, [links](https://...) and inline $math$. Output is
// built from escaped text and our own tags only; links other than http(s) stay text.
// The page still passes the result through DOMPurify before it is shown.

import { escapeHtml } from './escape';
import { texHtml } from './tex-live';

const SAFE_URL = /^https?:\/\/[^\s<>"'`]+$/i;

/** Inline formatting of one line of text. */
export function inlineHtml(text: string): string {
  let out = '';
  let i = 0;
  // Order matters: code and math first, so their contents are not read as Markdown.
  // No bracket inside a link's text or address: each try stops at the next one, so hostile
  // text ("[a](" repeated) is read in linear time, not quadratic.
  const re = /`([^`]+)`|\$([^$\n]+)\$|\*\*([^*]+)\*\*|\*([^*\s][^*]*)\*|\[([^[\]]+)\]\(([^()[\]\s]+)\)/g;
  for (let m = re.exec(text); m; m = re.exec(text)) {
    out += escapeHtml(text.slice(i, m.index));
    if (m[1] !== undefined) out += `<code>${escapeHtml(m[1])}</code>`;
    else if (m[2] !== undefined) out += `<span class="note-math" role="img" aria-label="${escapeHtml(m[2])}">${texHtml(m[2])}</span>`;
    else if (m[3] !== undefined) out += `<strong>${inlineHtml(m[3])}</strong>`;
    else if (m[4] !== undefined) out += `<em>${inlineHtml(m[4])}</em>`;
    else if (SAFE_URL.test(m[6])) {
      out += `<a href="${escapeHtml(m[6])}" rel="noopener noreferrer nofollow" target="_blank">${inlineHtml(m[5])}</a>`;
    } else {
      // Not a web link (javascript:, data:, a relative path): shown as the text it is.
      out += escapeHtml(m[0]);
    }
    i = m.index + m[0].length;
  }
  return out + escapeHtml(text.slice(i));
}

type Block = { type: 'p' | 'ul' | 'ol'; lines: string[] };

/** HTML for a note's text. */
export function markdownHtml(text: string): string {
  const blocks: Block[] = [];
  let current: Block | undefined;
  for (const raw of text.split('\n')) {
    const line = raw.trimEnd();
    const bullet = /^\s*[-*+]\s+(.*)$/.exec(line);
    const numbered = /^\s*\d+[.)]\s+(.*)$/.exec(line);
    if (line.trim() === '') {
      current = undefined;
    } else if (bullet || numbered) {
      const type = bullet ? 'ul' : 'ol';
      if (current?.type !== type) blocks.push((current = { type, lines: [] }));
      current.lines.push((bullet ?? numbered)![1]);
    } else if (current?.type === 'p') {
      current.lines.push(line.trim());
    } else {
      blocks.push((current = { type: 'p', lines: [line.trim()] }));
    }
  }
  return blocks
    .map((b) =>
      b.type === 'p'
        ? `<p>${b.lines.map(inlineHtml).join('\n')}</p>`
        : `<${b.type}>${b.lines.map((l) => `<li>${inlineHtml(l)}</li>`).join('')}</${b.type}>`,
    )
    .join('');
}
