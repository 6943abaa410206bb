import { describe, expect, it } from 'vitest';
import { inlineHtml, markdownHtml } from '../../runtime/present/markdown-live';

describe('note Markdown subset', () => {
  it('renders paragraphs, emphasis, code and lists', () => {
    expect(markdownHtml('One **two** *three* `f_c`\nsame para\n\nnext')).toBe(
      '<p>One <strong>two</strong> <em>three</em> <code>f_c</code>\nsame para</p><p>next</p>',
    );
    expect(markdownHtml('- a\n- b\n\n1. c\n2. d')).toBe('<ul><li>a</li><li>b</li></ul><ol><li>c</li><li>d</li></ol>');
  });

  it('typesets inline math with KaTeX', () => {
    const html = inlineHtml('with $\\phi V_c$ here');
    expect(html).toContain('class="katex"');
    expect(html.startsWith('with <span class="note-math" role="img" aria-label="\\phi V_c">')).toBe(true);
  });

  it('escapes every HTML a note holds', () => {
    const html = markdownHtml('<img src=x onerror=alert(1)> <script>alert(2)</script> "q" & \'s\'');
    expect(html).not.toMatch(/<img|<script/);
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain('&quot;q&quot; &amp; &#39;s&#39;');
  });

  it('links only to http and https', () => {
    expect(inlineHtml('[code](https://example.org/aci?x=1&y=2)')).toBe(
      '<a href="https://example.org/aci?x=1&amp;y=2" rel="noopener noreferrer nofollow" target="_blank">code</a>',
    );
    for (const bad of ['javascript:alert(1)', 'JaVaScRiPt:alert(1)', 'data:text/html,x', 'vbscript:x', '/local', 'https://x"onmouseover="y']) {
      const html = inlineHtml(`[click](${bad})`);
      expect(html, bad).not.toContain('<a');
    }
  });

  it('keeps math from running TeX links or HTML', () => {
    const html = inlineHtml('$\\href{javascript:alert(1)}{x}$ $\\htmlData{a=b}{x}$');
    expect(html).not.toContain('href="javascript');
    expect(html).not.toContain('data-a');
  });
});
