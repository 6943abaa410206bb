// How a working reads in the record's static page (screen and print). The live sheet's
// rules for the same classes are in cells/styles.css.

export const WORKING_CSS = `
.lt-workings { margin: .15rem 0 .3rem; }
.lt-working { margin: .1rem 0; }
.lt-working > summary { cursor: pointer; font: 12px/1.5 system-ui, sans-serif; color: var(--lt-soft, #555); }
.lt-working[open] > summary { color: inherit; }
.lt-wk-body { border-left: 2px solid #c9c2b4; padding: .1rem 0 .2rem .6rem; margin-left: .2rem; }
.lt-wk-step { display: flex; flex-wrap: wrap; gap: .1rem .6rem; align-items: baseline; margin: .08rem 0; }
.lt-wk-eq { overflow-x: auto; overflow-y: hidden; max-width: 100%; }
.lt-wk-note, .lt-wk-ref, .lt-wk-mark { font: 11px/1.35 system-ui, sans-serif; }
.lt-wk-note { color: var(--lt-soft, #555); font-style: italic; }
.lt-wk-ref { color: var(--lt-soft, #555); margin-left: auto; }
.lt-wk-mark { font-weight: 700; border: 1px solid currentColor; border-radius: 3px; padding: 0 .25rem; }
.lt-wk-gov .lt-wk-eq { font-weight: 600; }
.lt-wk-in, .lt-wk-method, .lt-wk-error { font: 11.5px/1.4 system-ui, sans-serif; margin: .1rem 0; }
.lt-wk-fig svg { max-width: 100%; height: auto; }
@media print {
  .lt-cell:has(.lt-working[open]) { break-inside: auto; page-break-inside: auto; }
  .lt-wk-step { break-inside: avoid; page-break-inside: avoid; }
  .lt-working:not([open]) > summary { list-style: none; }
}
`;
