// Fixtures of the record tests: a minimal app shell, and a document with an attack
// in every text field it has.

import type { CalcDocument } from '../../runtime/document';
/** A minimal app shell: one inline script, as a single-file build has. */
export const STUB_SHELL = '<!doctype html><html lang="en"><head><meta charset="utf-8"><title>shell</title></head><body><p id="app">app</p><script type="module">document.getElementById("app").textContent = "ran";</script></body></html>';

export const ATTACKS = [
  '<script>window.__pwned = 1</script>',
  '<img src=x onerror="window.__pwned = 2">',
  '"><svg onload="window.__pwned = 3">',
  "'><a href=\"javascript:window.__pwned = 4\">x</a>",
  'javascript:window.__pwned = 5',
  '[click](javascript:window.__pwned = 6)',
  '</script><script>window.__pwned = 7</script>',
  '<!-- <script>window.__pwned = 8</script> -->',
  '$\\href{javascript:window.__pwned = 9}{x}$ $\\url{javascript:alert(1)}$ $\\htmlClass{x}{y}$',
  '</style><script>window.__pwned = 10</script>',
  '"}*{background:url(https://example.invalid/x)} @import "x";',
  '<iframe srcdoc="<script>parent.__pwned=11</script>"></iframe><object data=x></object>',
];
const EVIL = ATTACKS.join(' ');

/** A document with an attack in every text field (title block, titles, labels, notes, units, names, choices, clauses). */
export function hostileDocument(): CalcDocument {
  return {
    meta: { project: EVIL, job: EVIL, subject: EVIL, preparedBy: EVIL, checkedBy: EVIL, revision: EVIL, date: EVIL },
    cells: [
      { id: 's1', kind: 'section', title: EVIL, label: EVIL, clause: EVIL },
      { id: 'n1', kind: 'note', text: ATTACKS.join('\n\n'), label: EVIL, clause: EVIL },
      { id: 'i1', kind: 'input', name: 'h', value: '9 in', unit: EVIL, label: EVIL, description: EVIL, clause: EVIL },
      { id: 'i2', kind: 'input', name: EVIL, value: EVIL, choices: ATTACKS, label: EVIL },
      { id: 'i3', kind: 'input', name: 'w', value: '<b>12</b> in', min: EVIL, max: EVIL },
      { id: 'f1', kind: 'formula', name: 'd', expr: 'h - 1 in', unit: 'in', label: EVIL, clause: EVIL },
      { id: 'f2', kind: 'formula', name: 'x', expr: EVIL, unit: EVIL, label: EVIL },
      { id: 'k1', kind: 'check', expr: 'd <= h', name: 'ok1', label: EVIL, clause: EVIL },
      { id: 'k2', kind: 'check', expr: EVIL, name: EVIL, label: EVIL },
    ],
  };
}

