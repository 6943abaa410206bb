// Escaping for the places document text lands in a record besides HTML text (which
// runtime/present/escape.ts escapes): CSS strings (the printed title block) and the
// embedded data block.

// HTML text and attributes: the one escape of the presentation layer.
export { escapeHtml } from '../present/escape';

/**
 * A CSS string literal (with its quotes) that cannot end the string, the rule or the
 * <style> element it sits in: quotes, backslashes, line ends and `<` are escaped.
 */
export function cssString(text: string): string {
  let out = '"';
  for (const ch of text) {
    const code = ch.codePointAt(0)!;
    if (ch === '"' || ch === '\\' || ch === '<' || ch === '>' || ch === '&' || code < 0x20 || code === 0x7f
      || (code >= 0xd800 && code <= 0xdfff) || code === 0x2028 || code === 0x2029) {
      out += `\\${code.toString(16)} `;
    } else out += ch;
  }
  return `${out}"`;
}

// The embedded document sits in a <script type="application/x-loadtrace"> element,
// whose content the HTML parser does not decode. So we encode ourselves, with the
// entity spelling anyone reading the file knows: `&` and `<` (so no `</script>` or
// `<!--` can appear), and the characters the parser would alter (CR, NUL) or that
// UTF-8 cannot carry (lone surrogates) as numeric references.

/** Encodes text for a script data block; decodeDataBlock gives it back exactly. */
export function encodeDataBlock(text: string): string {
  return text.replace(/[&<\r\0]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g, (ch) => {
    if (ch === '&') return '&amp;';
    if (ch === '<') return '&lt;';
    return `&#x${ch.charCodeAt(0).toString(16).toUpperCase()};`;
  });
}

/** Decodes what encodeDataBlock wrote. Anything else that looks like a reference is left as it stands. */
export function decodeDataBlock(text: string): string {
  return text.replace(/&(amp|lt);|&#x([0-9A-Fa-f]{1,6});/g, (all, name: string | undefined, hex: string | undefined) => {
    if (name === 'amp') return '&';
    if (name === 'lt') return '<';
    const code = parseInt(hex!, 16);
    return code <= 0x10ffff ? String.fromCodePoint(code) : all;
  });
}
