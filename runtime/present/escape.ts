// Escaping document text for HTML content and attribute values: the one escape every
// view (the live sheet, the record's static page) writes text through.

const HTML_ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };
const HTML_SPECIAL = /[&<>"']/g;

/** Escapes text for HTML content and attribute values (quoted with " or '). */
export function escapeHtml(text: string): string {
  HTML_SPECIAL.lastIndex = 0;
  if (!HTML_SPECIAL.test(text)) return text;
  return text.replace(HTML_SPECIAL, (ch) => HTML_ENTITIES[ch]);
}
