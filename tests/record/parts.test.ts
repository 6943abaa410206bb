// A record's packed code is written as many small data elements and its app styles as
// several style elements (cells/record/vite-plugin.ts): the HTML parser reads small
// text tokens faster. These check that the pieces put back together are exactly the
// original, and that a shell written before parts existed (one element) still reads.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { splitCss } from '../../cells/record/vite-plugin';
import { APP_ID, APP_TYPE, EDITOR_ID, PART_CHARS, PART_OF, packedBlock, packedElements } from '../../runtime/record/app-payload';

const BASE64 = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/=';

describe('packed blocks in parts', () => {
  it('a block is cut into parts of at most PART_CHARS characters, the first carrying the id', () => {
    const data = 'A'.repeat(PART_CHARS * 2 + 5);
    const html = packedElements(APP_ID, APP_TYPE, data);
    const texts = [...html.matchAll(/<script\b[^>]*>([^<]*)<\/script>/g)].map((m) => m[1]);
    expect(texts.map((t) => t.length)).toEqual([PART_CHARS, PART_CHARS, 5]);
    expect(html.match(new RegExp(`id="${APP_ID}"`, 'g'))).toHaveLength(1);
    expect(html.match(new RegExp(`${PART_OF}="${APP_ID}"`, 'g'))).toHaveLength(2);
  });

  it('reads back exactly what was written, with two blocks interleaved in a page', () => {
    fc.assert(fc.property(
      fc.string({ unit: fc.constantFrom(...BASE64), maxLength: PART_CHARS * 3 }),
      fc.string({ unit: fc.constantFrom(...BASE64), maxLength: PART_CHARS * 2 }),
      (app, editor) => {
        const page = `<body><p>x</p>${packedElements(APP_ID, APP_TYPE, app)}\n<style>p{}</style>${packedElements(EDITOR_ID, APP_TYPE, editor)}</body>`;
        expect(packedBlock(page, APP_ID)).toBe(app);
        expect(packedBlock(page, EDITOR_ID)).toBe(editor);
      },
    ), { numRuns: 200 });
  });

  it('a shell with the block in one element (records written before parts) reads as before', () => {
    const one = `<script type="${APP_TYPE}" id="${APP_ID}" data-encoding="gzip base64">QUJD</script>`;
    expect(packedBlock(`<body>${one}</body>`, APP_ID)).toBe('QUJD');
    expect(packedBlock('<body></body>', APP_ID)).toBeUndefined();
  });
});

describe('app styles cut at rule ends', () => {
  it('joins back to the same CSS, every piece whole rules', () => {
    const css = '@font-face{font-family:A;src:url(data:font/woff2;base64,AAAA)}.a{color:red}@media print{.b{color:blue}.c{x:y}}.d::after{content:"}{"}/* } */.e{}';
    for (const min of [1, 10, 40, 1000]) {
      const parts = splitCss(css, min);
      expect(parts.join('')).toBe(css);
      for (const p of parts) {
        // Whole rules: outside strings and comments, braces balance in every piece.
        const bare = p.replace(/"[^"]*"|\/\*[\s\S]*?\*\//g, '');
        expect(bare.split('{').length).toBe(bare.split('}').length);
      }
    }
    expect(splitCss(css, 1)).toHaveLength(5); // the comment goes with the rule after it
    expect(splitCss(css, 1000)).toEqual([css]);
  });
});
