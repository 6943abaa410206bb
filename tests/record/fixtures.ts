// Fixtures of the record tests: a minimal app shell, and a document with an attack
// in every text field it has.

import type { CalcDocument } from '../../runtime/document';
/** A minimal app shell: one inline script, as a single-file build has. */
export const STUB_SHELL = '<!doctype html><html lang="en"><head><meta charset="utf-8"><title>shell</title></head><body><p id="app">app</p><script type="module" id="lt-loader">document.getElementById("app").textContent = "ran";</script></body></html>';

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


/**
 * A shell with every part a real one has (tests/record/seal.test.ts): head markup,
 * toolbar, the app's styles in a template, the app, editor and KaTeX as packed blocks
 * (tiny programs, gzip + base64 as the build writes them) and the loader.
 */
export function partsShell(pack: (code: string) => string): string {
  const block = (id: string, code: string) => `<script type="application/x-loadtrace-app" id="${id}" data-encoding="gzip base64">${pack(code)}</script>`;
  return `<!doctype html>
<html lang="en">
<head>
  <meta charset="utf-8">
  <meta name="viewport" content="width=device-width, initial-scale=1">
  <title>Loadtrace</title>
</head>
<body>
  <header class="toolbar" role="toolbar"><span class="brand">Loadtrace</span> <button type="button" data-cmd="print">Print</button><span id="status"></span></header>
  <main class="paper"><section id="summary"></section><div id="cells"></div></main>
<template id="lt-app-css"><style>.toolbar{display:flex}</style><style>.paper{margin:0 auto}</style></template>
${block('lt-app', 'globalThis.appRan = "app";')}
${block('lt-editor', 'var __loadtraceEditor = { editor: "editor" };')}
${block('lt-katex', 'var __loadtraceKatex = { katex: "katex" };')}
<script type="module" id="lt-loader">document.getElementById("lt-app");</script>
</body>
</html>`;
}
