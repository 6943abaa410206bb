// Styles a package adds to the record's: the cover and front matter on screen and in
// print, and each part on sheets of its own (named pages carry each calc's title block).

export const PACKAGE_CSS = `
.lt-pkg-part + .lt-pkg-part { break-before: page; page-break-before: always; }
.lt-pkg-cover h1 { font-size: 1.9rem; margin: .3rem 0 1rem; overflow-wrap: anywhere; }
.lt-pkg-kicker { font: 600 12px system-ui, sans-serif; text-transform: uppercase; letter-spacing: .12em; color: var(--lt-soft); margin: 0; }
.lt-pkg-cover table, .lt-pkg-front table { border-collapse: collapse; width: 100%; font: 13px system-ui, sans-serif; margin-bottom: .8rem; }
.lt-pkg-front th, .lt-pkg-front td { text-align: left; padding: .2rem .45rem; border-bottom: 1px solid var(--lt-rule); vertical-align: top; overflow-wrap: anywhere; }
.lt-pkg-meta th, .lt-pkg-eor th { width: 9rem; color: var(--lt-soft); font-weight: 600; }
.lt-pkg-eor { border: 1.5px solid var(--lt-ink); padding: .5rem .8rem; margin: 1rem 0; display: grid; grid-template-columns: minmax(0, 1fr) 11rem; gap: 0 1rem; }
.lt-pkg-eor h2 { grid-column: 1 / -1; font-size: 1rem; margin: 0 0 .3rem; }
.lt-pkg-seal { border: 1px dashed var(--lt-soft); min-height: 9rem; display: flex; align-items: flex-end; justify-content: center; font: 11px system-ui, sans-serif; color: var(--lt-soft); padding: .3rem; }
.lt-pkg-front h2 { font-size: 1.15rem; margin: 1.2rem 0 .4rem; border-bottom: 1.5px solid var(--lt-ink); }
.lt-pkg-front h3 { font-size: 1rem; margin: .8rem 0 .3rem; }
.lt-pkg-front th { color: var(--lt-soft); border-bottom: 1.5px solid var(--lt-ink); }
.lt-pkg-n, .lt-pkg-at { font-variant-numeric: tabular-nums; white-space: nowrap; }
.lt-pkg-note, .lt-pkg-front small { font: 12px system-ui, sans-serif; color: var(--lt-soft); }
.lt-pkg-refs ul { font: 13px system-ui, sans-serif; padding-left: 1.2rem; }
.lt-pkg-refs li { margin: .25rem 0; }
.lt-pkg-items { color: var(--lt-soft); }
@media print {
  .lt-pkg-cover { break-after: page; page-break-after: always; }
  .lt-pkg-front h2, .lt-pkg-front h3, .lt-review h3 { break-after: avoid; page-break-after: avoid; }
  .lt-pkg-front tr, .lt-pkg-refs li { break-inside: avoid; page-break-inside: avoid; }
}
`;
