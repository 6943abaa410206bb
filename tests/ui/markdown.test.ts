// The one Markdown renderer of notes (runtime/present/markdown.ts), live and record:
// the subset notes use, math through the caller's typesetter, and nothing a note holds
// can run or reach out: raw HTML is text, links are http(s) only, nesting and length capped.

import { describe, expect, it } from 'vitest';
import { markdownRenderer, NOTE_LIMIT } from '../../runtime/present/markdown';
import { texHtml } from '../../runtime/present/tex-live';

const render = markdownRenderer({ math: (tex) => `<m>${tex}</m>`, newTab: true, longClass: 'long' });

describe('note Markdown', () => {
  it('renders paragraphs, emphasis, code and lists', () => {
    expect(render('One **two** *three* `f_c`\nsame para\n\nnext')).toBe(
      '<p>One <strong>two</strong> <em>three</em> <code>f_c</code>\nsame para</p>\n<p>next</p>\n',
    );
    expect(render('- a\n- b\n\n1. c\n2. d')).toBe('<ul>\n<li>a</li>\n<li>b</li>\n</ul>\n<ol>\n<li>c</li>\n<li>d</li>\n</ol>\n');
  });

  it('hands inline math to the caller, and only math on one line', () => {
    expect(render('with $\\phi V_c$ here')).toBe('<p>with <m>\\phi V_c</m> here</p>\n');
    expect(render('a $x\ny$ b')).toBe('<p>a $x\ny$ b</p>\n');
    const live = markdownRenderer({ math: (tex) => texHtml(tex), longClass: 'long' });
    expect(live('$\\phi V_c$')).toContain('class="katex"');
  });

  it('keeps only the subset: no headings, quotes, images or tables', () => {
    const html = render('# Title\n> quote\n![x](https://example.org/a.png)\n\n| a | b |\n|---|---|');
    expect(html).toMatch(/^<p># Title\n&gt; quote\n!<a href="https:\/\/example.org\/a.png"/);
    expect(html).not.toMatch(/<h1|<blockquote|<img|<table/);
  });

  it('escapes every HTML a note holds', () => {
    const html = render('<img src=x onerror=alert(1)> <script>alert(2)</script> "q" & \'s\'');
    expect(html).not.toMatch(/<img|<script/);
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain('&quot;q&quot; &amp; \'s\'');
  });

  it('links only to http and https', () => {
    expect(render('[code](https://example.org/aci?x=1&y=2)')).toBe(
      '<p><a href="https://example.org/aci?x=1&amp;y=2" rel="noopener noreferrer nofollow" target="_blank">code</a></p>\n',
    );
    const record = markdownRenderer({ math: (tex) => tex, longClass: 'long' });
    expect(record('[code](https://example.org/)')).toBe('<p><a href="https://example.org/" rel="noopener noreferrer nofollow">code</a></p>\n');
    for (const bad of ['javascript:alert(1)', 'JaVaScRiPt:alert(1)', 'data:text/html,x', 'vbscript:x', '/local']) {
      expect(render(`[click](${bad})`), bad).not.toContain('<a');
    }
    // A quote in the address is percent-encoded: it cannot end the attribute.
    expect(render('[click](https://x"onmouseover="y)')).toContain('href="https://x%22onmouseover=%22y"');
  });

  it('keeps math from running TeX links or HTML', () => {
    const live = markdownRenderer({ math: (tex) => texHtml(tex), longClass: 'long' });
    const html = live('$\\href{javascript:alert(1)}{x}$ $\\htmlData{a=b}{x}$');
    expect(html).not.toContain('href="javascript');
    expect(html).not.toContain('data-a');
  });

  it('caps nesting and length', () => {
    const deep = `${'> '.repeat(0)}${'- '.repeat(200)}x`;
    expect(() => render(deep)).not.toThrow();
    expect(render(deep).split('<ul>').length - 1).toBeLessThanOrEqual(20);
    const long = 'a'.repeat(NOTE_LIMIT + 1);
    expect(render(`**${long}**`)).toBe(`<p class="long">**${long}**</p>`);
  });
});
